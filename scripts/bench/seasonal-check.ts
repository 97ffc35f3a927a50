// Benchmark: full site checks with the 12-month ISO 13788 balance, per second on one core.
// Run: npx tsx scripts/bench/seasonal-check.ts (also part of `npm run bench`). Prints figures only.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parse } from "yaml";
import { buildMaterialLibrary, runSiteCheck, type AssemblyInput, type SiteInput } from "../../app/envelope/index.ts";

const dir = join(process.cwd(), "content", "materials");
const materials = buildMaterialLibrary(
  readdirSync(dir)
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => parse(readFileSync(join(dir, f), "utf8")) as unknown),
);

// The design-day benchmark's 12-layer wall: a framed cavity and two humidity-dependent layers
// (plywood, variable retarder), so the monthly permeance iteration is part of what is measured.
const wall: AssemblyInput = {
  kind: "above-grade-wall",
  layers: [
    { role: "cladding", material: "fibre-cement-lap-siding", thickness_mm: 8 },
    { role: "drainage-gap", material: "vented-air-space", thickness_mm: 19 },
    { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
    { role: "insulation", material: "mineral-wool-board", thickness_mm: 38 },
    { role: "insulation", material: "xps-board", thickness_mm: 25.4, joints: "taped" },
    { role: "sheathing", material: "plywood", thickness_mm: 12.7 },
    { role: "air-barrier", material: "self-adhered-vapour-open-membrane", thickness_mm: 0.5 },
    {
      role: "insulation",
      material: "dense-pack-cellulose",
      thickness_mm: 139.7,
      framing: { material: "softwood-lumber", fraction: 0.23 },
    },
    { role: "vapour-retarder", material: "variable-permeance-retarder", thickness_mm: 0.2 },
    {
      role: "insulation",
      material: "mineral-wool-batt",
      thickness_mm: 38,
      framing: { material: "softwood-lumber", fraction: 0.12 },
    },
    { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    { role: "interior-finish", material: "latex-paint", thickness_mm: 0.1 },
  ],
};
// A wall that condenses, so the month-by-month accumulation and drying run too.
const wet: AssemblyInput = {
  kind: "above-grade-wall",
  layers: [
    { role: "cladding", material: "vinyl-siding", thickness_mm: 2 },
    { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
    { role: "sheathing", material: "osb", thickness_mm: 11 },
    {
      role: "insulation",
      material: "fibreglass-batt",
      thickness_mm: 140,
      framing: { material: "softwood-lumber", fraction: 0.23 },
    },
    { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    { role: "interior-finish", material: "latex-paint", thickness_mm: 0.1 },
  ],
};
const typedYear = {
  months: [-10, -8, -2, 6, 13, 18, 21, 20, 15, 8, 1, -6].map((t_c, i) => ({ t_c, rh: 70 + (i % 4) * 4 })),
};
const sites: SiteInput[] = [
  { zone: "5A" },
  { zone: "6A", hdd18: 4500, cdd10: 900 },
  { province: "MB" },
  { zone: "4C" },
  { zone: "7", year: typedYear },
];
const walls = [wall, wet];

let sink = 0;
/** Median checks per CPU-second over 5 rounds, after a warm-up. */
function rate(seasonal: boolean): { median: number; min: number; max: number } {
  const run = (n: number): void => {
    for (let i = 0; i < n; i++)
      sink += runSiteCheck(walls[i % 2], sites[i % sites.length], materials, { seasonal }).thermal.rsi;
  };
  run(1000); // warm-up (JIT)
  const rounds: number[] = [];
  for (let r = 0; r < 5; r++) {
    const n = 4000;
    // CPU time of this process, not wall time: the machine may be shared, and a check uses one core.
    const start = process.cpuUsage();
    run(n);
    const used = process.cpuUsage(start);
    rounds.push(n / ((used.user + used.system) / 1e6));
  }
  rounds.sort((x, y) => x - y);
  return { median: rounds[2], min: rounds[0], max: rounds[4] };
}
const f = (v: number): string => Math.round(v).toLocaleString("en-US");
const designDay = rate(false);
const full = rate(true);
console.log(
  `design-day site check (same walls and sites, no monthly balance): ${f(designDay.median)} checks/s (min ${f(designDay.min)}, max ${f(designDay.max)})`,
);
console.log(
  `full 12-month site check (design day + ISO 13788 monthly balance): ${f(full.median)} checks/s (median of 5 rounds; min ${f(full.min)}, max ${f(full.max)}) per CPU-second`,
);
console.log(
  `a full 12-month check costs ${(designDay.median / full.median).toFixed(1)} design-day checks (the targets, 100,000 and 10,000/s, allow 10)`,
);
console.log(
  `target ≥ 10,000 full 12-month checks/s: ${full.median >= 10000 ? "met" : "NOT met on this machine"}${sink < 0 ? "" : ""}`,
);
