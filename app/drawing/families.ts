// How each material family is drawn: ordinary drafting conventions (diagonal hatch for masonry and
// concrete, wavy batt lines for fibrous insulation, grain for wood, dots for aggregate), in our palette.

export type HatchKind =
  | "none"
  | "diagonal"
  | "cross"
  | "batt"
  | "grain"
  | "dots"
  | "gravel"
  | "stipple"
  | "foam"
  | "dash"
  | "solid";

export interface FamilyStyle {
  label: string;
  fill: string;
  stroke: string;
  hatch: HatchKind;
}

export const FAMILY_STYLES: Record<string, FamilyStyle> = {
  cladding: { label: "Cladding", fill: "#e9dfcb", stroke: "#6b5a3a", hatch: "dash" },
  roofing: { label: "Roofing", fill: "#d9d2c4", stroke: "#4a463e", hatch: "dash" },
  masonry: { label: "Masonry", fill: "#e7c9b5", stroke: "#8a4b2f", hatch: "diagonal" },
  concrete: { label: "Concrete", fill: "#dcdad4", stroke: "#55534d", hatch: "stipple" },
  "wood-panel": { label: "Wood panel", fill: "#ecd9b2", stroke: "#8a6a2c", hatch: "grain" },
  lumber: { label: "Lumber", fill: "#e8d2a4", stroke: "#8a6a2c", hatch: "cross" },
  gypsum: { label: "Gypsum", fill: "#f2efe8", stroke: "#77756f", hatch: "dots" },
  "foam-board": { label: "Foam board", fill: "#dfeee9", stroke: "#3c7a69", hatch: "foam" },
  "spray-foam": { label: "Spray foam", fill: "#f1ecd2", stroke: "#8d7d33", hatch: "foam" },
  "fibrous-insulation": { label: "Fibrous insulation", fill: "#f6e7d2", stroke: "#a5733b", hatch: "batt" },
  "loose-fill": { label: "Loose fill", fill: "#efe4cc", stroke: "#8f7548", hatch: "dots" },
  membrane: { label: "Membrane", fill: "#2d6f8e", stroke: "#1f4e64", hatch: "solid" },
  "sheet-retarder": { label: "Sheet retarder", fill: "#1d7474", stroke: "#155656", hatch: "solid" },
  coating: { label: "Coating", fill: "#6d8aa0", stroke: "#4b6475", hatch: "solid" },
  "air-space": { label: "Air space", fill: "#fbf8f1", stroke: "#a9a394", hatch: "none" },
  drainage: { label: "Drainage", fill: "#e6ebe4", stroke: "#56705a", hatch: "dash" },
  aggregate: { label: "Aggregate", fill: "#e2ddd0", stroke: "#6c665a", hatch: "gravel" },
  metal: { label: "Metal", fill: "#cfd4d8", stroke: "#50585e", hatch: "solid" },
};

const UNKNOWN: FamilyStyle = { label: "Other", fill: "#eeeeee", stroke: "#777777", hatch: "none" };

export function familyStyle(family: string): FamilyStyle {
  return FAMILY_STYLES[family] ?? UNKNOWN;
}
