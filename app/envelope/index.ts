// Public surface of the site-check engine (pure TypeScript: zod and ~/vocabulary are its only imports
// from outside). Modules that need a narrower piece import it from its own file.
export { runSiteCheck } from "./site-check";
export {
  resolveSite,
  CLIMATE_ZONES,
  zoneNumberFromDegreeDays,
  nbcZoneFromHdd,
  moistureRegimeFromNormals,
} from "./climate";
export { interiorRetarderClass, seriesPermeance } from "./vapour";
export { assemblyRValue } from "./thermal";
export { profileChartSeries } from "./profile";
export { LOCAL_CODE_CAUTION } from "./rules";
export { SiteCheckInputError } from "./errors";
export { materialSchema, buildMaterialLibrary } from "./material-schema";
export type { Material } from "./material-schema";
export * from "./types";
export * as units from "./units";
export * as psychrometrics from "./psychrometrics";
