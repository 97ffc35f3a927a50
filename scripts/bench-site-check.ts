// Benchmark: site checks per second for a 12-layer wall on one core.
// Run: npx tsx scripts/bench-site-check.ts
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parse } from "yaml";
import { buildMaterialLibrary, runSiteCheck, type AssemblyInput, type SiteInput } from "../app/envelope/index.ts";

const dir = join(process.cwd(), "content", "materials");
const materials = buildMaterialLibrary(readdirSync(dir).filter((f) => f.endsWith(".yaml")).map((f) => parse(readFileSync(join(dir, f), "utf8")) as unknown));

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
    { role: "insulation", material: "dense-pack-cellulose", thickness_mm: 139.7, framing: { material: "softwood-lumber", fraction: 0.23 } },
    { role: "vapour-retarder", material: "variable-permeance-retarder", thickness_mm: 0.2 },
    { role: "insulation", material: "mineral-wool-batt", thickness_mm: 38, framing: { material: "softwood-lumber", fraction: 0.12 } },
    { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    { role: "interior-finish", material: "latex-paint", thickness_mm: 0.1 },
  ],
};
const sites: SiteInput[] = ["4A", "5A", "6A", "7", "3C"].map((zone) => ({ zone }));

let sink = 0;
const run = (n: number): void => {
  for (let i = 0; i < n; i++) sink += runSiteCheck(wall, sites[i % sites.length], materials).thermal.rsi;
};
run(2000); // warm-up (JIT)
const rounds: number[] = [];
for (let r = 0; r < 5; r++) {
  const n = 20000;
  const start = process.hrtime.bigint();
  run(n);
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  rounds.push(n / seconds);
}
rounds.sort((a, b) => a - b);
const median = rounds[Math.floor(rounds.length / 2)];
console.log(`12-layer site check: ${Math.round(median).toLocaleString("en-US")} checks/s (median of 5 rounds; min ${Math.round(rounds[0]).toLocaleString("en-US")}, max ${Math.round(rounds[rounds.length - 1]).toLocaleString("en-US")}) on one core`);
console.log(`target ≥ 20,000 checks/s: ${median >= 20000 ? "met" : "NOT met"}${sink === 0 ? "" : ""}`);
