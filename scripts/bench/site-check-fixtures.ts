// Shared by the site-check benchmarks: the material library, the 12-layer wall, and the rate of a
// loop per CPU-second (CPU time of this process, not wall time: the machine may be shared, and a
// check uses one core).
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parse } from "yaml";
import { buildMaterialLibrary, type AssemblyInput } from "../../app/envelope/index.ts";

const dir = join(process.cwd(), "content", "materials");
export const materials = buildMaterialLibrary(
  readdirSync(dir)
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => parse(readFileSync(join(dir, f), "utf8")) as unknown),
);

// 12 layers, with a framed cavity and two RH-dependent layers (plywood, variable retarder),
// so the permeance iteration is part of what is measured.
export const wall: AssemblyInput = {
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
let sink = 0;

/** Median rate of run() per CPU-second over 5 rounds of n calls, after a warm-up. */
export function rate(n: number, run: (i: number) => number): { median: number; min: number; max: number } {
  for (let i = 0; i < 2000; i++) sink += run(i); // warm-up (JIT)
  const rounds: number[] = [];
  for (let r = 0; r < 5; r++) {
    const start = process.cpuUsage();
    for (let i = 0; i < n; i++) sink += run(i);
    const used = process.cpuUsage(start);
    rounds.push(n / ((used.user + used.system) / 1e6));
  }
  rounds.sort((x, y) => x - y);
  // Reading sink keeps the engine from discarding the work.
  if (Number.isNaN(sink)) console.log("a benchmark produced NaN");
  return { median: rounds[2], min: rounds[0], max: rounds[4] };
}

export const thousands = (v: number): string => Math.round(v).toLocaleString("en-US");
