// Schema for content/materials/*.yaml (format: docs/content-format.md). Every value carries
// a source, and the source ends with its status letter (C, C2, M or D; see docs/references.md),
// so an editor cannot add a number without saying how sure we are of it.
import { z } from "zod";

export const MATERIAL_FAMILIES = [
  "cladding",
  "masonry",
  "concrete",
  "wood-panel",
  "lumber",
  "gypsum",
  "foam-board",
  "spray-foam",
  "fibrous-insulation",
  "loose-fill",
  "membrane",
  "sheet-retarder",
  "coating",
  "air-space",
  "drainage",
  "aggregate",
  "metal",
  "roofing",
] as const;
export type MaterialFamily = (typeof MATERIAL_FAMILIES)[number];

const sourceWithStatus = z
  .string()
  .min(3)
  .regex(/,\s*(C|C2|M|D)\)?\s*$/, 'source must end with its status, e.g. "…, C2" or "…, M"');

const positive = z.number().finite().positive();

/** Conductivity against the layer's mean temperature, for insulations whose R falls in the cold
 * (some polyisocyanurate boards): [mean °C, W/(m·K)], temperatures rising strictly. */
const byMeanTemperatureSchema = z
  .object({
    points: z.array(z.tuple([z.number().finite().min(-60).max(80), positive])).min(2),
    source: sourceWithStatus,
  })
  .strict()
  .refine((c) => c.points.every((p, i, a) => i === 0 || p[0] > a[i - 1][0]), {
    message: "mean temperatures must rise strictly",
    path: ["points"],
  });

const thermalSchema = z
  .object({
    conductivity_w_mk: positive.optional(),
    rsi_fixed: z.number().finite().min(0).optional(),
    source: sourceWithStatus,
    by_mean_temperature: byMeanTemperatureSchema.optional(),
  })
  .strict()
  .refine((t) => (t.conductivity_w_mk === undefined) !== (t.rsi_fixed === undefined), {
    message: "give exactly one of conductivity_w_mk or rsi_fixed",
  })
  .refine((t) => t.by_mean_temperature === undefined || t.conductivity_w_mk !== undefined, {
    message: "by_mean_temperature needs conductivity_w_mk (the rated value)",
    path: ["by_mean_temperature"],
  });

const curvePoint = z.tuple([z.number().finite().min(0).max(100), positive]);

const vapourSchema = z
  .object({
    permeance_ng: positive, // dry cup, ng/(s·m²·Pa)
    at_thickness_mm: positive.optional(), // present: homogeneous, scales with 1/thickness
    wet_cup_ng: positive.optional(),
    curve: z.array(curvePoint).min(2).optional(), // [RH %, ng/(s·m²·Pa)] at at_thickness_mm
    source: sourceWithStatus,
  })
  .strict()
  .refine((v) => !v.curve || v.curve.every((p, i, a) => i === 0 || p[0] > a[i - 1][0]), {
    message: "curve RH values must rise strictly",
    path: ["curve"],
  });

export const materialSchema = z
  .object({
    slug: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "slug: lower-case words joined by hyphens"),
    name: z.string().min(1),
    family: z.enum(MATERIAL_FAMILIES),
    thermal: thermalSchema,
    vapour: vapourSchema,
    foam_plastic: z.boolean().default(false),
    water_sensitive: z.boolean().default(false),
    insect_risk: z.boolean().default(false),
    solvent_sensitive: z.boolean().default(false),
    /** Cladding that is back-ventilated by its own shape (hollow-backed lap siding): counts as
     * "vented cladding" for IRC Table R702.7(3). Optional; absent means false. */
    vented_cladding: z.boolean().default(false),
    notes: z.string().optional(),
  })
  .strict();

export type Material = z.output<typeof materialSchema>;
export type MaterialLibrary = ReadonlyMap<string, Material> | Readonly<Record<string, Material>>;

/** Builds a library from parsed entries (each validated); duplicate slugs are an error. */
export function buildMaterialLibrary(entries: readonly unknown[]): ReadonlyMap<string, Material> {
  const map = new Map<string, Material>();
  for (const entry of entries) {
    const material = materialSchema.parse(entry);
    if (map.has(material.slug)) throw new Error(`duplicate material slug "${material.slug}"`);
    map.set(material.slug, material);
  }
  return map;
}

export function lookupMaterial(library: MaterialLibrary, slug: string): Material | undefined {
  if (library instanceof Map) return library.get(slug);
  const record = library as Readonly<Record<string, Material>>;
  return Object.hasOwn(record, slug) ? record[slug] : undefined;
}
