// Public surface of the site-check engine (pure TypeScript; zod is its only dependency).
export { runSiteCheck, winterCase, summerCase } from "./site-check";
export { resolveSite, CLIMATE_ZONES, zoneNumberFromDegreeDays, nbcZoneFromHdd, resolveCanada, moistureRegimeFromNormals, parseZone, DEFAULT_INDOOR } from "./climate";
export { interiorRetarderClass, retarderClass, seriesPermeance, dryCupPermeance, permeanceAtRh } from "./vapour";
export { assemblyRValue, filmsFor } from "./thermal";
export { computeProfile, profileChartSeries } from "./profile";
export { codeRows, r70273Threshold, summariseInsulation } from "./code-tables";
export { LOCAL_CODE_CAUTION } from "./rules";
export { SiteCheckInputError, MaterialDataError } from "./errors";
export { INDOOR_METHODS, INDOOR_METHOD_INFO, DEFAULT_INDOOR_METHOD, indoorMethodChoices, isIndoorMethod } from "./indoor-climate";
export { parseClimateCsv, validateMonths, generateClimateYear, resolveClimateYear, ClimateCsvError, MONTH_NAMES } from "./climate-year";
export { seasonalBalance, MONTHLY_METHOD } from "./monthly-balance";
export { nbcRows } from "./nbc";
export { NBC_EDITION, NBC_ZONES, PROVINCE_REFERENCE } from "./nbc-tables";
export { materialSchema, buildMaterialLibrary, lookupMaterial, MATERIAL_FAMILIES } from "./material-schema";
export type { Material, MaterialInput, MaterialLibrary, MaterialFamily } from "./material-schema";
export * from "./types";
export * as units from "./units";
export * as psychrometrics from "./psychrometrics";
