// Benchmark: design-day site checks per second on one core (CPU time of this process, so a shared
// machine reads close to an idle one), for a 12-layer wall. Prints figures; asserts nothing.
// Run: npx tsx scripts/bench-site-check.ts (part of `npm run bench`).
import { runSiteCheck, type SiteInput } from "../app/envelope/index.ts";
import { materials, rate, thousands as f, wall } from "./bench/site-check-fixtures.ts";

const sites: SiteInput[] = ["4A", "5A", "6A", "7", "3C"].map((zone) => ({ zone }));
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
console.log(`target ≥ 100,000 design-day checks/s: ${same.median >= 100000 ? "met" : "NOT met on this machine"}`);
