// Public input and result shapes of the site check. Results are plain JSON (no class instances,
// no NaN/Infinity) so a page, an API route and a PDF sheet show the same numbers.
import type { ClimateZoneId, MoistureRegime } from "~/vocabulary/climate-zones";

export const ASSEMBLY_KINDS = [
  "above-grade-wall", "roof", "floor", "crawlspace-wall", "crawlspace-floor", "basement-wall", "slab",
  "rim-joist",
] as const;
export type AssemblyKind = (typeof ASSEMBLY_KINDS)[number];

export const LAYER_ROLES = [
  "cladding", "drainage-gap", "water-resistive-barrier", "air-barrier", "sheathing", "insulation",
  "vapour-retarder", "structure", "interior-finish", "thermal-barrier", "soil-side-protection",
  "capillary-break", "roofing", "underlayment", "subfloor",
] as const;
export type LayerRole = (typeof LAYER_ROLES)[number];

export type Joints = "taped" | "lapped" | "sealed";
export type Adhesive = "solvent-based" | "water-based" | "mechanical";

/** One layer, exactly as the `layers` of a detail file (docs/content-format.md). */
export interface LayerInput {
  role: LayerRole | (string & {});
  material: string;
  thickness_mm: number;
  framing?: { material: string; fraction: number };
  joints?: Joints;
  adhesive?: Adhesive;
  exposed?: boolean;
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
  indoor?: { t_c?: number; rh?: number; summer_t_c?: number; summer_rh?: number };
  edition?: CodeEdition;
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
  indoor: { t_c: number; rh: number; summer_t_c: number; summer_rh: number };
  edition: CodeEdition;
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
  edition: CodeEdition;
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
  profiles: { winter: ProfileCase; summer: ProfileCase };
  vapour: VapourResult;
  code: CodeResult;
  flags: Flag[];
  caution: string;
}
