// What an assembly is and what its layers are: the kinds, the layer roles, joint treatments, adhesives
// and what a layer's open face meets. The content schema, the desk, the engine and search read these.

export const ASSEMBLY_KINDS = [
  "above-grade-wall",
  "roof",
  "floor",
  "crawlspace-wall",
  "crawlspace-floor",
  "basement-wall",
  "slab",
  "rim-joist",
] as const;
export type AssemblyKind = (typeof ASSEMBLY_KINDS)[number];

export const LAYER_ROLES = [
  "cladding",
  "drainage-gap",
  "water-resistive-barrier",
  "air-barrier",
  "sheathing",
  "insulation",
  "vapour-retarder",
  "structure",
  "interior-finish",
  "thermal-barrier",
  "soil-side-protection",
  "capillary-break",
  "roofing",
  "underlayment",
  "subfloor",
] as const;
export type LayerRole = (typeof LAYER_ROLES)[number];

export const JOINT_TREATMENTS = ["taped", "lapped", "sealed"] as const;
export type Joints = (typeof JOINT_TREATMENTS)[number];

export const ADHESIVES = ["solvent-based", "water-based", "mechanical"] as const;
export type Adhesive = (typeof ADHESIVES)[number];

/** What a layer's open face meets, where that is not simply the next layer: a room, a crawl space
 * or attic, the weather (above grade), or the soil. */
export const EXPOSURES = ["interior", "service-space", "weather", "soil"] as const;
export type Exposure = (typeof EXPOSURES)[number];
