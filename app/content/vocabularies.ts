// Kept free of zod so client components can use the vocabularies without shipping the validator.
export { ADHESIVES, ASSEMBLY_KINDS, EXPOSURES, JOINT_TREATMENTS, LAYER_ROLES } from "~/vocabulary/assemblies";

/** Vocabularies of a detail's front matter, as fixed in docs/content-format.md. */
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
