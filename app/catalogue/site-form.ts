import { z } from "zod";
import type { SiteInput } from "~/envelope";
import { fToC } from "~/envelope/units";
import { CLIMATE_ZONE_IDS, MOISTURE_REGIMES } from "~/vocabulary/climate-zones";
import { DEFAULT_UNIT_SYSTEM, UNIT_SYSTEMS } from "~/vocabulary/units";

// What the site-check panel (and the API) accepts. Temperatures and degree-days arrive in the
// user's units; the engine takes SI.
const optionalNumber = (label: string) =>
  z.preprocess(
    (value) => (value === "" || value === null || value === undefined ? undefined : Number(value)),
    z.number({ error: `${label} must be a number` }).refine(Number.isFinite, `${label} must be a number`).optional(),
  );

export const siteFormSchema = z
  .object({
    units: z.enum(UNIT_SYSTEMS).default(DEFAULT_UNIT_SYSTEM),
    zone: z.union([z.enum(CLIMATE_ZONE_IDS), z.literal("")]).optional(),
    hdd: optionalNumber("Heating degree-days").pipe(z.number().min(0, "Heating degree-days cannot be negative").max(20000, "Heating degree-days above 20,000 are outside every climate zone").optional()),
    cdd: optionalNumber("Cooling degree-days").pipe(z.number().min(0, "Cooling degree-days cannot be negative").max(20000, "Cooling degree-days look too high").optional()),
    moisture: z.union([z.enum(MOISTURE_REGIMES), z.literal("")]).optional(),
    indoorRh: optionalNumber("Indoor relative humidity").pipe(z.number().min(5, "Indoor relative humidity below 5 % is not a realistic design value").max(95, "Indoor relative humidity above 95 % is not a design condition").optional()),
    indoorT: optionalNumber("Indoor temperature").optional(),
    winterT: optionalNumber("Winter design temperature").optional(),
  })
  .superRefine((form, ctx) => {
    const hasZone = Boolean(form.zone);
    const hasDegreeDays = form.hdd !== undefined;
    if (!hasZone && !hasDegreeDays) ctx.addIssue({ code: "custom", path: ["zone"], message: "Choose a climate zone or enter heating degree-days" });
    if (hasDegreeDays && form.cdd === undefined) ctx.addIssue({ code: "custom", path: ["cdd"], message: "Enter cooling degree-days too (0 if none)" });
  });

export type SiteForm = z.infer<typeof siteFormSchema>;

export function siteInputFromForm(form: SiteForm): SiteInput {
  const ip = form.units === "ip";
  const temperature = (value: number | undefined) => (value === undefined ? undefined : ip ? fToC(value) : value);
  const site: SiteInput = {};
  if (form.zone) site.zone = form.zone;
  else if (ip) Object.assign(site, { hdd65: form.hdd, cdd50: form.cdd });
  else Object.assign(site, { hdd18: form.hdd, cdd10: form.cdd });
  if (!form.zone && form.moisture) site.moisture = form.moisture;
  if (form.indoorRh !== undefined || form.indoorT !== undefined) site.indoor = { rh: form.indoorRh, t_c: temperature(form.indoorT) };
  if (form.winterT !== undefined) site.winter = { t_c: temperature(form.winterT) };
  return site;
}

