import { z } from "zod";
import type { SiteInput } from "~/envelope";
import { ClimateCsvError, parseClimateCsv } from "~/envelope/climate-year";
import { DEFAULT_INDOOR_METHOD, INDOOR_METHODS } from "~/envelope/indoor-climate";
import { NBC_ZONES } from "~/envelope/nbc-tables";
import { PROVINCES, type NbcZone } from "~/envelope/types";
import { fToC } from "~/envelope/units";
import { CLIMATE_ZONE_IDS, MOISTURE_REGIMES } from "~/vocabulary/climate-zones";
import { DEFAULT_UNIT_SYSTEM, UNIT_SYSTEMS, type UnitSystem } from "~/vocabulary/units";

// What the site-check panel (and the check API) accepts, one schema for the browser and the server.
// Temperatures and degree-days of a US site arrive in the user's units; a Canadian site is entered in
// SI (HDD below 18 °C, °C), as the NBC gives them. The engine takes SI.
const optionalNumber = (label: string) =>
  z.preprocess(
    (value) => (value === "" || value === null || value === undefined ? undefined : Number(value)),
    z
      .number({ error: `${label} must be a number` })
      .refine(Number.isFinite, `${label} must be a number`)
      .optional(),
  );

const isNbcZone = (value: string): value is NbcZone => (NBC_ZONES as readonly string[]).includes(value);

const blankable = <T extends readonly [string, ...string[]]>(values: T) =>
  z.union([z.enum(values), z.literal("")]).optional();

export const SITE_COUNTRIES = ["US", "CA"] as const;
/** How the site year for the seasonal balance is given; the first is the default. */
export const YEAR_SOURCES = ["generated", "typed", "csv"] as const;
export type YearSource = (typeof YEAR_SOURCES)[number];

const monthRow = z.object({
  t: optionalNumber("Monthly mean temperature"),
  rh: optionalNumber("Monthly mean relative humidity"),
});

export const siteFormSchema = z
  .object({
    units: z.enum(UNIT_SYSTEMS).default(DEFAULT_UNIT_SYSTEM),
    country: z.enum(SITE_COUNTRIES).default("US"),
    zone: blankable(CLIMATE_ZONE_IDS),
    hdd: optionalNumber("Heating degree-days").pipe(
      z
        .number()
        .min(0, "Heating degree-days cannot be negative")
        .max(20000, "Heating degree-days above 20,000 are outside every climate zone")
        .optional(),
    ),
    cdd: optionalNumber("Cooling degree-days").pipe(
      z
        .number()
        .min(0, "Cooling degree-days cannot be negative")
        .max(20000, "Cooling degree-days look too high")
        .optional(),
    ),
    moisture: blankable(MOISTURE_REGIMES),
    province: blankable(PROVINCES),
    nbcZone: z
      .union([
        z.custom<NbcZone>((value) => typeof value === "string" && isNbcZone(value), {
          message: `The NBC zone is one of ${NBC_ZONES.join(", ")}`,
        }),
        z.literal(""),
      ])
      .optional(),
    hdd18: optionalNumber("Heating degree-days below 18 °C").pipe(
      z
        .number()
        .min(0, "Heating degree-days cannot be negative")
        .max(20000, "Heating degree-days above 20,000 are outside every NBC zone")
        .optional(),
    ),
    indoorMethod: blankable(INDOOR_METHODS),
    indoorRh: optionalNumber("Indoor relative humidity").pipe(
      z
        .number()
        .min(5, "Indoor relative humidity below 5 % is not a realistic design value")
        .max(95, "Indoor relative humidity above 95 % is not a design condition")
        .optional(),
    ),
    indoorT: optionalNumber("Indoor temperature").optional(),
    winterT: optionalNumber("Winter design temperature").optional(),
    yearSource: z.enum(YEAR_SOURCES).default("generated"),
    /** Twelve rows, January first, temperatures in the form's units (siteTemperatureUnits). */
    yearMonths: z.array(monthRow).optional(),
    /** The text of a CSV file, month,temperature_c,rh_percent (docs/site-climate.md). */
    yearCsv: z.string().optional(),
  })
  .superRefine((form, ctx) => {
    if (form.country === "CA") {
      if (!form.province && !form.nbcZone && form.hdd18 === undefined) {
        ctx.addIssue({
          code: "custom",
          path: ["province"],
          message: "Choose a province or territory, an NBC zone, or enter heating degree-days below 18 °C",
        });
      }
    } else {
      const hasZone = Boolean(form.zone);
      const hasDegreeDays = form.hdd !== undefined;
      if (!hasZone && !hasDegreeDays)
        ctx.addIssue({
          code: "custom",
          path: ["zone"],
          message:
            form.province || form.nbcZone
              ? "A province or NBC zone is a Canadian site: choose Canada as the country"
              : "Choose a climate zone or enter heating degree-days",
        });
      if (hasDegreeDays && form.cdd === undefined)
        ctx.addIssue({ code: "custom", path: ["cdd"], message: "Enter cooling degree-days too (0 if none)" });
    }
    if (form.yearSource === "typed") typedYearIssues(form, ctx);
    if (form.yearSource === "csv") {
      try {
        parseClimateCsv(form.yearCsv ?? "");
      } catch (error) {
        if (!(error instanceof ClimateCsvError)) throw error;
        ctx.addIssue({ code: "custom", path: ["yearCsv"], message: csvMessage(error) });
      }
    }
  });

export type SiteForm = z.infer<typeof siteFormSchema>;

/** The units typed monthly temperatures are in: SI for a Canadian site, else the viewer's. */
export function siteTemperatureUnits(form: Pick<SiteForm, "country" | "units">): UnitSystem {
  return form.country === "CA" ? "si" : form.units;
}

/** "line 6: Apr appears twice" → "Line 6: Apr appears twice" (the engine's words, as a field message). */
function csvMessage(error: ClimateCsvError): string {
  const text = error.message.replace(`${error.field}: `, "");
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function typedYearIssues(form: SiteForm, ctx: z.RefinementCtx): void {
  const rows = form.yearMonths ?? [];
  const ip = siteTemperatureUnits(form) === "ip";
  const [lo, hi] = ip ? [-76, 122] : [-60, 50];
  const unit = ip ? "°F" : "°C";
  for (let i = 0; i < 12; i++) {
    const row = rows[i] ?? { t: undefined, rh: undefined };
    if (row.t === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["yearMonths", i, "t"],
        message: `Enter the mean temperature of month ${i + 1}`,
      });
    else if (row.t < lo || row.t > hi)
      ctx.addIssue({
        code: "custom",
        path: ["yearMonths", i, "t"],
        message: `Month ${i + 1}: a mean temperature from ${lo} to ${hi} ${unit}`,
      });
    if (row.rh === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["yearMonths", i, "rh"],
        message: `Enter the mean relative humidity of month ${i + 1}`,
      });
    else if (row.rh <= 0 || row.rh > 100)
      ctx.addIssue({
        code: "custom",
        path: ["yearMonths", i, "rh"],
        message: `Month ${i + 1}: relative humidity above 0 and at most 100 %`,
      });
  }
}

export function siteInputFromForm(form: SiteForm): SiteInput {
  const ip = form.units === "ip";
  const temperature = (value: number | undefined) => (value === undefined ? undefined : ip ? fToC(value) : value);
  const site: SiteInput = {};
  if (form.country === "CA") {
    site.country = "CA";
    if (form.province) site.province = form.province;
    if (form.nbcZone) site.nbcZone = form.nbcZone;
    if (form.hdd18 !== undefined) site.hdd18 = form.hdd18;
  } else if (form.zone) site.zone = form.zone;
  else if (ip) Object.assign(site, { hdd65: form.hdd, cdd50: form.cdd });
  else Object.assign(site, { hdd18: form.hdd, cdd10: form.cdd });
  if (form.country !== "CA" && !form.zone && form.moisture) site.moisture = form.moisture;
  const method = form.indoorMethod && form.indoorMethod !== DEFAULT_INDOOR_METHOD ? form.indoorMethod : undefined;
  if (form.indoorRh !== undefined || form.indoorT !== undefined || method) {
    site.indoor = { rh: form.indoorRh, t_c: temperature(form.indoorT) };
    if (method) site.indoor.method = method;
  }
  if (form.winterT !== undefined) site.winter = { t_c: temperature(form.winterT) };
  if (form.yearSource === "typed" && form.yearMonths) {
    const monthIp = siteTemperatureUnits(form) === "ip";
    site.year = {
      months: form.yearMonths.map((row) => ({ t_c: monthIp ? fToC(row.t ?? NaN) : (row.t ?? NaN), rh: row.rh ?? NaN })),
    };
  }
  if (form.yearSource === "csv") site.year = { csv: form.yearCsv ?? "" };
  return site;
}

/** Where an engine input path lands on the form ("year.months[3].rh" → "yearMonths[3].rh"). */
export function formFieldOf(enginePath: string, country: SiteForm["country"] = "US"): string {
  const month = /^year\.months\[(\d+)\]\.(t_c|rh)$/.exec(enginePath);
  if (month) return `yearMonths[${month[1]}].${month[2] === "t_c" ? "t" : "rh"}`;
  const direct: Record<string, string> = {
    "year.csv": "yearCsv",
    "year.months": "yearMonths",
    "indoor.method": "indoorMethod",
    "indoor.rh": "indoorRh",
    "indoor.t_c": "indoorT",
    "winter.t_c": "winterT",
    hdd65: "hdd",
    cdd50: "cdd",
    cdd10: "cdd",
    hdd18: country === "CA" ? "hdd18" : "hdd",
  };
  return direct[enginePath] ?? enginePath;
}
