// Public surface of the site-check engine (pure TypeScript; zod is its only dependency).
export { runSiteCheck, winterCase, summerCase } from "./site-check";
export { resolveSite, CLIMATE_ZONES, zoneNumberFromDegreeDays, nbcZoneFromHdd, moistureRegimeFromNormals, parseZone, DEFAULT_INDOOR } from "./climate";
export { interiorRetarderClass, retarderClass, seriesPermeance, dryCupPermeance, permeanceAtRh } from "./vapour";
export { assemblyRValue, filmsFor } from "./thermal";
export { computeProfile, profileChartSeries } from "./profile";
export { codeRows, r70273Threshold, summariseInsulation } from "./code-tables";
export { LOCAL_CODE_CAUTION } from "./rules";
export { SiteCheckInputError, MaterialDataError } from "./errors";
export { materialSchema, buildMaterialLibrary, lookupMaterial, MATERIAL_FAMILIES } from "./material-schema";
export type { Material, MaterialInput, MaterialLibrary, MaterialFamily } from "./material-schema";
export * from "./types";
export * as units from "./units";
export * as psychrometrics from "./psychrometrics";
