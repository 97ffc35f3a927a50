// Kept free of zod so client components can use the vocabularies without shipping the validator.

/** Vocabularies of a detail's front matter, as fixed in docs/content-format.md. */
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
export const SUBSTRATES = [
  "wood-frame",
  "cast-concrete",
  "concrete-block",
  "icf",
  "wood-roof-deck",
  "wood-floor-framing",
] as const;
export const BELOW_GRADE_CONDITIONS = [
  "none",
  "vented-crawlspace",
  "sealed-crawlspace",
  "basement",
  "slab-on-grade",
] as const;
export const INSULATION_STRATEGIES = [
  "cavity-only",
  "exterior-continuous",
  "cavity-plus-exterior",
  "interior-continuous",
  "spray-foam",
  "flash-and-batt",
  "insulated-form",
  "under-slab",
] as const;
export const TIERS = ["free", "premium"] as const;
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
export const JOINT_TREATMENTS = ["taped", "lapped", "sealed"] as const;
export const ADHESIVES = ["solvent-based", "water-based", "mechanical"] as const;
/** What a layer's open face meets (the site check's rules read it; app/envelope/types.ts EXPOSURES). */
export const EXPOSURES = ["interior", "service-space", "weather", "soil"] as const;
