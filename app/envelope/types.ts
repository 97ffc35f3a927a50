// Public input and result shapes of the site check. Results are plain JSON (no class instances,
// no NaN/Infinity) so a page, an API route and a PDF sheet show the same numbers.
import type { ClimateZoneId, MoistureRegime } from "~/vocabulary/climate-zones";
import type { IndoorMethodId } from "./indoor-climate";

export { ASSEMBLY_KINDS, EXPOSURES } from "~/vocabulary/assemblies";
export type { Adhesive, AssemblyKind, Exposure, Joints, LayerRole } from "~/vocabulary/assemblies";
import type { Adhesive, AssemblyKind, Exposure, Joints, LayerRole } from "~/vocabulary/assemblies";

/** One layer, exactly as the `layers` of a detail file (docs/content-format.md). */
export interface LayerInput {
  role: LayerRole | (string & {});
  material: string;
  thickness_mm: number;
  framing?: { material: string; fraction: number };
  joints?: Joints;
  adhesive?: Adhesive;
  exposed?: boolean;
  exposure?: Exposure;
  note?: string;
}

/** Layers ordered exterior (soil side, top side for roofs) → interior. */
export interface AssemblyInput {
  kind: AssemblyKind;
  layers: readonly LayerInput[];
}

export type { MoistureRegime };
export type ZoneId = ClimateZoneId;
export type NbcZone = "4" | "5" | "6" | "7A" | "7B" | "8";
export type CodeEdition = "IECC/IRC 2021" | "IECC/IRC 2018";

/** Monthly-climate facts from which the moisture regime follows (ASHRAE 169 / IECC R301.3). */
export interface ClimateNormals {
  annual_mean_c: number;
  annual_precip_mm: number;
  coldest_month_mean_c: number;
  warmest_month_mean_c: number;
  months_above_10c: number;
  /** Wettest month of the cold season and driest month of the warm season (marine test). */
  wettest_cold_month_mm: number;
  driest_warm_month_mm: number;
}

export interface SiteInput {
  /** "5A", "4C", "7", or a bare number with `moisture`. */
  zone?: string | number;
  moisture?: MoistureRegime;
  /** Degree-days, SI bases (HDD 18 °C, CDD 10 °C) or IP bases (HDD 65 °F, CDD 50 °F). */
  hdd18?: number;
  cdd10?: number;
  hdd65?: number;
  cdd50?: number;
  normals?: ClimateNormals;
  winter?: { t_c?: number; rh?: number };
  /** cladding_t_c: temperature of sun-warmed wet cladding for the inward-drive case. */
  summer?: { t_c?: number; rh?: number; cladding_t_c?: number };
  /** Soil-side temperature for below-grade assemblies (winter case). */
  ground_t_c?: number;
  /** method: indoor humidity method id (indoor-climate.ts); a given rh overrides it. */
  indoor?: { t_c?: number; rh?: number; summer_t_c?: number; summer_rh?: number; method?: IndoorMethodId };
  edition?: CodeEdition;
  /** Canada: a province or territory, an NBC zone, or hdd18 with country "CA" (nbc.ts). */
  country?: Country;
  province?: ProvinceCode;
  nbcZone?: NbcZone;
  /** The site year for the seasonal balance: 12 months typed, or a 12-row CSV; else generated. */
  year?: ClimateYearInput;
}

export interface ResolvedSite {
  zone: ZoneId;
  zoneNumber: number;
  moisture: MoistureRegime | null;
  zoneSource: "given" | "degree-days";
  hdd18: number | null;
  cdd10: number | null;
  nbcZone: NbcZone | null;
  winter: { t_c: number; rh: number };
  summer: { t_c: number; rh: number; cladding_t_c: number };
  ground_t_c: number;
  /** method and basis: how the winter indoor RH was set, and the sentence that says so. */
  indoor: {
    t_c: number;
    rh: number;
    summer_t_c: number;
    summer_rh: number;
    method: IndoorMethodId | "given";
    basis: string;
  };
  edition: CodeEdition;
  country: Country;
  /** Canadian sites: where the degree-days came from, the NBC zone and the code compared. */
  canada: CanadianSite | null;
  /** Units to show first: SI for Canadian sites, inch-pound otherwise (the viewer may override). */
  preferredUnits: "SI" | "IP";
  /** Which values were defaults (so the page can say "assumed"). */
  defaulted: string[];
  notes: string[];
}

export type RetarderClass = "I" | "II" | "III";
export type LayerVapourClass = RetarderClass | "permeable";
export type InteriorClass = RetarderClass | "none";

export interface FramedPath {
  framing_material: string;
  fraction: number;
  cavity_rsi: number;
  framing_rsi: number;
}

export interface ThermalLayer {
  index: number;
  role: string;
  material: string;
  name: string;
  thickness_mm: number;
  /** Effective layer RSI (framed layers: area-weighted conductance, i.e. isothermal plane). */
  rsi: number;
  r_ip: number;
  /** False for layers outboard of a ventilated cavity (and the cavity): outdoors for heat. */
  counted: boolean;
  framed?: FramedPath;
}

export interface AirFilm {
  side: "interior" | "exterior";
  rsi: number;
  r_ip: number;
  label: string;
  source: string;
}

export interface ThermalResult {
  layers: ThermalLayer[];
  films: AirFilm[];
  rsi: number;
  r_ip: number;
  u_si: number;
  u_ip: number;
  /** Whole-assembly parallel-path figure (paths through every layer), for comparison. */
  parallelPath: { rsi: number; r_ip: number; u_si: number; u_ip: number } | null;
  method: string;
}

export interface ProfileInterface {
  position_mm: number;
  label: string;
  t_c: number;
  t_f: number;
  p_sat_pa: number;
  p_v_pa: number;
  rh: number;
  /** p_v of the straight (uncondensed) line, before the Glaser correction. */
  p_v_linear_pa: number;
  condensing: boolean;
}

export interface CondensationPlane {
  interfaceIndex: number;
  label: string;
  t_c: number;
  rate_g_m2_day: number;
}

export interface VapourLayer {
  index: number;
  material: string;
  perm_ng: number;
  perm_us: number;
  /** Dry-cup class of the layer at its thickness (IRC R702.7(1) definitions). */
  class: LayerVapourClass;
  /** Permeance used in this case (RH-dependent materials differ from dry cup). */
  case_perm_ng: number;
}

export interface ProfileCase {
  name: "winter" | "summer";
  description: string;
  /** The heat and vapour path the profile runs along: through the clear cavity of framed layers
   * (the worst case; the stud path's temperatures are in `studPath`). */
  path: "clear-cavity";
  /** Interface where the outdoor (soil, wet-cladding) vapour condition applies; layers outboard of
   * it sit in a ventilated cavity or hold the vapour source, and resist nothing in this case. */
  boundaryIndex: number;
  exterior: { t_c: number; rh: number; p_v_pa: number; label: string };
  interior: { t_c: number; rh: number; p_v_pa: number };
  interfaces: ProfileInterface[];
  condensingPlanes: CondensationPlane[];
  firstCondensingSurface: { interfaceIndex: number; label: string; t_c: number } | null;
  /** Coldest (winter) / most at-risk (summer) surface temperature minus the source air's dew point;
   * negative means that surface is below the dew point. */
  margin_c: number;
  marginSurface: string;
  sourceDewPoint_c: number;
  rate_g_m2_day: number;
  vapourLayers: VapourLayer[];
  /** Interface temperatures through the framing, and the margin at the same surface; null when no
   * framed layer is in the heat path. */
  studPath: { interfaces_t_c: number[]; margin_c: number } | null;
  /** How this case was modelled, in sentences to show beside it (sky radiation, cold-weather R …). */
  notes: string[];
}

export interface UpperWallProfiles {
  aboveGrade: ProfileCase;
  frostDepth: ProfileCase;
}

export interface VapourResult {
  layers: VapourLayer[];
  interiorClass: InteriorClass;
  interiorPerm_us: number | null;
  exteriorPerm_us: number | null;
  dryingDirections: ("inward" | "outward")[];
  bothSidesClosed: boolean;
  explanation: string;
}

export interface CodeRow {
  id: string;
  label: string;
  required: string;
  provided: string;
  pass: boolean;
  note: string;
}

export interface CodeResult {
  edition: CodeEdition | NbcEdition;
  rows: CodeRow[];
}

export type Severity = "stop" | "caution" | "note";
export interface Flag {
  id: string;
  severity: Severity;
  title: string;
  explanation: string;
  source: string;
}

export interface SiteCheckResult {
  site: ResolvedSite;
  thermal: ThermalResult;
  /** upperWall: basement and crawl-space walls only, the band above grade and the soil at frost
   * depth beside the deep-ground winter case. */
  profiles: { winter: ProfileCase; summer: ProfileCase; upperWall: UpperWallProfiles | null };
  vapour: VapourResult;
  code: CodeResult;
  flags: Flag[];
  caution: string;
  /** ISO 13788 monthly balance over the site year (monthly-balance.ts); null when the caller asked
   * for the design day only (runSiteCheck options.seasonal false). */
  seasonal: SeasonalResult | null;
}

// Indoor method, site year, seasonal balance and Canada (indoor-climate.ts, climate-year.ts,
// monthly-balance.ts, nbc.ts).
export type { IndoorMethodId } from "./indoor-climate";
export type Country = "US" | "CA";
export type NbcEdition = "NBC 2020";
export const PROVINCES = ["AB", "BC", "MB", "NB", "NL", "NS", "NT", "NU", "ON", "PE", "QC", "SK", "YT"] as const;
export type ProvinceCode = (typeof PROVINCES)[number];

export interface CanadianSite {
  province: ProvinceCode | null;
  nbcZone: NbcZone;
  hdd18: number;
  /** given: the user's HDD; province: the reference place's HDD; nbc-zone: the cold end of the band. */
  hddSource: "given" | "province" | "nbc-zone";
  /** Reference place when the HDD came from the province. */
  place: string | null;
  edition: NbcEdition;
}

export interface MonthInput {
  t_c: number;
  rh: number;
}
export interface ClimateYearInput {
  months?: readonly MonthInput[];
  csv?: string;
}

export interface MonthClimate {
  month: number;
  name: string;
  t_c: number;
  rh: number;
}
export interface ClimateYear {
  source: "typed" | "csv" | "generated";
  months: MonthClimate[];
  /** How the year was made (for "generated": the fitted curve and what it was fitted to). */
  note: string;
}

export interface InterfaceWater {
  interfaceIndex: number;
  label: string;
  /** Held at the end of the month, g/m². */
  accumulated_g_m2: number;
  /** Net rate this month, g/(m²·day); negative while drying. */
  rate_g_m2_day: number;
}

export interface SeasonalMonth {
  month: number;
  name: string;
  days: number;
  outdoor: { t_c: number; rh: number; p_v_pa: number };
  indoor: { t_c: number; rh: number; p_v_pa: number };
  /** Condensed and evaporated this month, all interfaces, g/m². */
  condensed_g_m2: number;
  evaporated_g_m2: number;
  /** Held at the end of the month, all interfaces, g/m². */
  accumulated_g_m2: number;
  /** Held at the critical interface at the end of the month (the chart line), g/m². */
  critical_g_m2: number;
  /** Closest interface's temperature minus the dew point of the uncondensed vapour pressure there;
   * negative where the straight-line profile crosses saturation. */
  margin_c: number;
  marginInterface: string;
  interfaces: InterfaceWater[];
  /** Interior-surface mould check: the temperature factor this month needs (null: no heat loss). */
  fRsiMin: number | null;
}

export interface SurfaceMouldCheck {
  method: string;
  /** Temperature factor of the assembly on its coldest path, with Rsi 0.25 and Rse 0.04. */
  fRsi: number;
  /** Highest monthly requirement and its month (null: no month asks for one). */
  fRsiMax: number | null;
  criticalMonth: number | null;
  pass: boolean;
  explanation: string;
}

export interface SeasonalResult {
  method: string;
  climate: ClimateYear;
  indoorMethod: IndoorMethodId | "given";
  /** Calendar month (1–12) the balance starts from: the first condensing month; null if none. */
  startMonth: number | null;
  months: SeasonalMonth[];
  criticalInterface: { interfaceIndex: number; label: string } | null;
  peak_g_m2: number;
  peakMonth: number | null;
  /** Month (1–12) by whose end all condensate has evaporated; null if none formed or it stays. */
  driesOutMonth: number | null;
  /** Water still held after the twelve months from the start month, g/m². */
  endOfYear_g_m2: number;
  verdict: "no-condensation" | "dries-within-year" | "accumulates";
  /** Set where the monthly method is outside its scope for this assembly (ground contact): the
   * figures are shown, but no flag is raised from them. */
  scopeNote: string | null;
  surface: SurfaceMouldCheck;
  explanation: string;
}
