// Layer builders and flag lookups for the one-file-per-rule tests (real material library).
import { runSiteCheck } from "~/envelope";
import type { AssemblyInput, Flag, LayerInput, SiteInput } from "~/envelope/types";
import { loadLibrary } from "../library";

export const lib = loadLibrary();
export const layer = (
  role: string,
  material: string,
  thickness_mm: number,
  extra: Partial<LayerInput> = {},
): LayerInput => ({ role, material, thickness_mm, ...extra });
export const batt140 = layer("insulation", "fibreglass-batt", 139.7, {
  framing: { material: "softwood-lumber", fraction: 0.23 },
});
export const batt89 = layer("insulation", "fibreglass-batt", 88.9, {
  framing: { material: "softwood-lumber", fraction: 0.23 },
});
export const gyp = layer("interior-finish", "gypsum-board", 12.7);
export const paint = layer("interior-finish", "latex-paint", 0.1);
export const wall = (...layers: LayerInput[]): AssemblyInput => ({ kind: "above-grade-wall", layers });
export const of = (kind: AssemblyInput["kind"], ...layers: LayerInput[]): AssemblyInput => ({ kind, layers });

/** The flag with this id (or id prefix), or undefined. */
export function flag(a: AssemblyInput, id: string, site: SiteInput = { zone: "5A" }): Flag | undefined {
  return runSiteCheck(a, site, lib).flags.find((f) => f.id === id || f.id.startsWith(`${id}-`));
}
