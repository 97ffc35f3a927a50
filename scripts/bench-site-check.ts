// Benchmark: design-day site checks per second on one core (CPU time of this process, so a shared
// machine reads close to an idle one), for a 12-layer wall. Prints figures; asserts nothing.
// Run: npx tsx scripts/bench-site-check.ts (part of `npm run bench`).
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parse } from "yaml";
import { buildMaterialLibrary, runSiteCheck, type AssemblyInput, type SiteInput } from "../app/envelope/index.ts";

const dir = join(process.cwd(), "content", "materials");
const materials = buildMaterialLibrary(
  readdirSync(dir)
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => parse(readFileSync(join(dir, f), "utf8")) as unknown),
);

// 12 layers, with a framed cavity and two RH-dependent layers (plywood, variable retarder),
// so the permeance iteration is part of what is measured.
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
const sites: SiteInput[] = ["4A", "5A", "6A", "7", "3C"].map((zone) => ({ zone }));
let sink = 0;

/** Median rate per CPU-second over 5 rounds, after a warm-up. */
function rate(n: number, run: (i: number) => number): { median: number; min: number; max: number } {
  for (let i = 0; i < 2000; i++) sink += run(i); // warm-up (JIT)
  const rounds: number[] = [];
  for (let r = 0; r < 5; r++) {
    const start = process.cpuUsage();
    for (let i = 0; i < n; i++) sink += run(i);
    const used = process.cpuUsage(start);
    rounds.push(n / ((used.user + used.system) / 1e6));
  }
  rounds.sort((a, b) => a - b);
  return { median: rounds[2], min: rounds[0], max: rounds[4] };
}
const f = (v: number): string => Math.round(v).toLocaleString("en-US");
const designDay = { seasonal: false } as const;

// The same wall at five sites: what a detail page, a pack or the content re-check does.
const same = rate(20000, (i) => runSiteCheck(wall, sites[i % sites.length], materials, designDay).thermal.rsi);
// A different wall every check (a note that changes each time): nothing the assembly cache holds helps.
const fresh = rate(
  5000,
  (i) =>
    runSiteCheck(
      { ...wall, layers: [{ ...wall.layers[0], note: `n${i}` }, ...wall.layers.slice(1)] },
      sites[i % sites.length],
      materials,
      designDay,
    ).thermal.rsi,
);
// Anchor: a fixed arithmetic loop, so a run on a slower or busier machine can be compared as a ratio.
const anchor = rate(20000, (i) => {
  let s = 0;
  for (let k = 1; k <= 200; k++) s += Math.sqrt(k * (i + 1));
  return s;
});

console.log(
  `design-day site check, 12-layer wall at 5 sites: ${f(same.median)} checks/s on one core (median of 5 rounds; min ${f(same.min)}, max ${f(same.max)})`,
);
console.log(
  `design-day site check, a new 12-layer wall every check: ${f(fresh.median)} checks/s (min ${f(fresh.min)}, max ${f(fresh.max)})`,
);
console.log(
  `anchor (200 square roots): ${f(anchor.median)} loops/s; checks per anchor loop: ${(same.median / anchor.median).toFixed(3)} (same wall), ${(fresh.median / anchor.median).toFixed(3)} (new wall)`,
);
console.log(
  `target ≥ 100,000 design-day checks/s: ${same.median >= 100000 ? "met" : "NOT met on this machine"}${sink === 0 ? "" : ""}`,
);
