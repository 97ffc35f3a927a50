import { z } from "zod";
import { CLIMATE_ZONE_IDS } from "~/vocabulary/climate-zones";

import {
  ADHESIVES,
  ASSEMBLY_KINDS,
  BELOW_GRADE_CONDITIONS,
  EXPOSURES,
  INSULATION_STRATEGIES,
  JOINT_TREATMENTS,
  LAYER_ROLES,
  SUBSTRATES,
  TIERS,
} from "./vocabularies";

export {
  ADHESIVES,
  ASSEMBLY_KINDS,
  BELOW_GRADE_CONDITIONS,
  EXPOSURES,
  INSULATION_STRATEGIES,
  JOINT_TREATMENTS,
  LAYER_ROLES,
  SUBSTRATES,
  TIERS,
};

/** Lower-case words joined by single hyphens: the shape of every slug. */
export const slugSchema = z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "must be lower-case words joined by hyphens");

// YAML 1.2 reads 2026-09-14 as a string; an editor's tool may hand us a Date.
const isoDateSchema = z.preprocess(
  (value) => (value instanceof Date ? value.toISOString().slice(0, 10) : value),
  z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date written YYYY-MM-DD"),
);

const framingSchema = z.strictObject({
  material: slugSchema,
  fraction: z.number().gt(0).lt(1),
});

export const layerSchema = z.strictObject({
  role: z.enum(LAYER_ROLES),
  material: slugSchema,
  thickness_mm: z.number().positive().max(2000),
  joints: z.enum(JOINT_TREATMENTS).optional(),
  note: z.string().min(1).max(200).optional(),
  adhesive: z.enum(ADHESIVES).optional(),
  exposed: z.boolean().optional(),
  exposure: z.enum(EXPOSURES).optional(),
  framing: framingSchema.optional(),
});

/** A site-check flag the detail has been reviewed against: the reason it still claims those zones. */
const acceptedFlagSchema = z.strictObject({
  flag: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "must be a flag id"),
  zones: z.array(z.enum(CLIMATE_ZONE_IDS)).min(1).optional(),
  because: z.string().min(40).max(600),
});

export const detailFrontMatterSchema = z
  .strictObject({
    slug: slugSchema,
    title: z.string().min(5).max(120),
    summary: z.string().min(20).max(400),
    assembly: z.enum(ASSEMBLY_KINDS),
    substrate: z.enum(SUBSTRATES),
    below_grade: z.enum(BELOW_GRADE_CONDITIONS),
    strategy: z.enum(INSULATION_STRATEGIES),
    zones: z
      .array(z.enum(CLIMATE_ZONE_IDS))
      .min(1)
      .refine((zones) => new Set(zones).size === zones.length, "lists a zone twice"),
    tier: z.enum(TIERS),
    sets: z.array(slugSchema).default([]),
    revision: z.number().int().min(1),
    revised: isoDateSchema.optional(),
    change_note: z.string().min(10).max(300).optional(),
    author: z.string().min(2).max(80),
    reviewer: z.string().min(2).max(80),
    references: z.array(z.string().min(5).max(200)).min(1),
    layers: z.array(layerSchema).min(2),
    /** Stop or caution flags of its own site check in zones it claims, each with the reason. */
    site_check_flags: z.array(acceptedFlagSchema).min(1).optional(),
  })
  .superRefine((detail, ctx) => {
    // Review needs a second pair of eyes (docs/design.md: never their own).
    if (detail.reviewer === detail.author) {
      ctx.addIssue({ code: "custom", path: ["reviewer"], message: "a detail's reviewer cannot be its author" });
    }
    // A later revision must say what changed, so subscribers get a useful alert.
    if (detail.revision > 1 && !detail.change_note) {
      ctx.addIssue({ code: "custom", path: ["revision"], message: "a revision above 1 needs a change_note" });
    }
    if (detail.revision > 1 && !detail.revised) {
      ctx.addIssue({ code: "custom", path: ["revision"], message: "a revision above 1 needs a revised date" });
    }
  });

export type DetailLayer = z.infer<typeof layerSchema>;
export type DetailFrontMatter = z.infer<typeof detailFrontMatterSchema>;
