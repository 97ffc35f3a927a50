import { z } from "zod";
import { slugSchema } from "./detail-schema";

export const CURRENCIES = ["usd", "cad"] as const;

export const detailSetSchema = z.strictObject({
  slug: slugSchema,
  title: z.string().min(3).max(80),
  summary: z.string().min(10).max(400),
  price_cents: z.number().int().min(0),
  currency: z.enum(CURRENCIES),
});

export const detailSetListSchema = z
  .array(detailSetSchema)
  .min(1)
  .superRefine((sets, ctx) => {
    const seen = new Set<string>();
    sets.forEach((set, index) => {
      if (seen.has(set.slug)) {
        ctx.addIssue({ code: "custom", path: [index, "slug"], message: `set "${set.slug}" is listed twice` });
      }
      seen.add(set.slug);
    });
  });

export type DetailSet = z.infer<typeof detailSetSchema>;
