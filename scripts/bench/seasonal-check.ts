// Benchmark: full site checks with the 12-month ISO 13788 balance, per second on one core.
// Run: npx tsx scripts/bench/seasonal-check.ts (also part of `npm run bench`). Prints figures only.
import { runSiteCheck, type AssemblyInput, type SiteInput } from "../../app/envelope/index.ts";
import { materials, rate, thousands as f, wall } from "./site-check-fixtures.ts";

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

/** Checks per CPU-second, the two walls alternating over the five sites. */
const checks = (seasonal: boolean) =>
  rate(4000, (i) => runSiteCheck(walls[i % 2], sites[i % sites.length], materials, { seasonal }).thermal.rsi);
const designDay = checks(false);
const full = checks(true);
console.log(
  `design-day site check (same walls and sites, no monthly balance): ${f(designDay.median)} checks/s (min ${f(designDay.min)}, max ${f(designDay.max)})`,
);
console.log(
  `full 12-month site check (design day + ISO 13788 monthly balance): ${f(full.median)} checks/s (median of 5 rounds; min ${f(full.min)}, max ${f(full.max)}) per CPU-second`,
);
console.log(
  `a full 12-month check costs ${(designDay.median / full.median).toFixed(1)} design-day checks (the targets, 100,000 and 10,000/s, allow 10)`,
);
console.log(`target ≥ 10,000 full 12-month checks/s: ${full.median >= 10000 ? "met" : "NOT met on this machine"}`);
