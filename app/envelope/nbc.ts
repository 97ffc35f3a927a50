// Code rows for Canadian sites, National Building Code of Canada 2020 (values: nbc-tables.ts):
// - 9.25.4: a vapour barrier (≤ 60 ng/(Pa·s·m²), dry cup) on the warm side of the insulation;
// - 9.25.5.2: a low-permeance layer outboard of the insulation needs enough of the thermal
//   resistance outboard of its inner face (Table 9.25.5.2 ratio by HDD), unless it is outboard of a
//   ventilated cavity;
// - 9.36.2.6 (9.36.2.8 for foundation walls): minimum effective thermal resistance by zone.
import {
  isInsulation,
  lowerName,
  materialRsi,
  ventedCavityIndex,
  type ResolvedAssembly,
  type ResolvedLayer,
} from "./layers";
import {
  NBC_9_25_5_2,
  NBC_COMPONENT_LABEL,
  NBC_EFFECTIVE_RSI,
  NBC_VAPOUR_BARRIER_KINDS,
  NBC_VAPOUR_BARRIER_NG,
  NBC_ZONE_BANDS,
  outboardRatioAt,
  type NbcComponent,
} from "./nbc-tables";
import type { CanadianSite, CodeRow, ThermalResult } from "./types";
import { layerPermeance, seriesPermeance } from "./vapour";

const r2 = (v: number): string => v.toFixed(2);

function innermostInsulation(a: ResolvedAssembly): number {
  let idx = -1;
  for (const l of a.layers) if (isInsulation(l)) idx = l.index;
  return idx;
}

/** 9.25.4.1–.2: the layers inboard of the innermost insulation, in series, pass ≤ 60 ng/(Pa·s·m²). */
export function vapourBarrierRow(a: ResolvedAssembly): CodeRow | null {
  if (!NBC_VAPOUR_BARRIER_KINDS.has(a.kind)) return null;
  const inner = innermostInsulation(a);
  if (inner < 0) return null; // 9.25.4.1 reads thermally insulated assemblies
  const inboard = a.layers.slice(inner + 1);
  const w = inboard.length ? seriesPermeance(inboard.map((l) => layerPermeance(l))) : null;
  const pass = w !== null && w <= NBC_VAPOUR_BARRIER_NG;
  return {
    id: "nbc-9-25-4",
    label: "NBC 2020 9.25.4, vapour barrier on the warm side of the insulation",
    required: `≤ ${NBC_VAPOUR_BARRIER_NG} ng/(Pa·s·m²) inboard of the insulation (desiccant method)`,
    provided:
      w === null
        ? "nothing inboard of the insulation"
        : `${w < 10 ? w.toFixed(1) : Math.round(w)} ng/(Pa·s·m²) (${inboard.map((l) => lowerName(l.material)).join(" + ")}, dry cup)`,
    pass,
    note: pass
      ? "The warm-side layers form a vapour barrier by the NBC definition."
      : "The warm-side layers pass too much vapour for an NBC vapour barrier: add a sheet, membrane or vapour-barrier coating (a variable-permeance retarder qualifies only where its dry-cup permeance is 60 or less).",
  };
}

/** A low-permeance layer for 9.25.5: below 60 ng/(Pa·s·m²) dry cup. Wood-based sheathing panels are
 * left out: their permeance rises steeply with moisture and Canadian practice builds them without the
 * ratio (from memory: the NBC's explanatory note treats them so; verify). */
function isLowPermeance(l: ResolvedLayer): boolean {
  if (l.material.family === "wood-panel") return false;
  return layerPermeance(l) < NBC_VAPOUR_BARRIER_NG;
}

/** Thermal resistance of the materials only (no air films; from memory that is how 9.25.5.2 counts),
 * clear-cavity path for framed layers: more inboard resistance, the stricter reading. */
function materialsRsi(layers: readonly ResolvedLayer[]): number {
  return layers.reduce((sum, l) => sum + materialRsi(l.material, l.thickness_mm), 0);
}

/** Required ratio: at the site's HDD, or, when only a zone is known, the strictest row of its band. */
function requiredRatio(site: CanadianSite): { ratio: number; basis: string } {
  if (site.hddSource !== "nbc-zone")
    return { ratio: outboardRatioAt(site.hdd18), basis: `${Math.round(site.hdd18)} HDD` };
  const band = NBC_ZONE_BANDS[site.nbcZone];
  const ratio = band.to === null ? NBC_9_25_5_2[NBC_9_25_5_2.length - 1].ratio : outboardRatioAt(band.to);
  return {
    ratio,
    basis: `NBC zone ${site.nbcZone}${band.to === null ? ", no HDD given: the strictest row applies; enter the HDD" : ""}`,
  };
}

/** 9.25.5.1–.2: every low-permeance layer outboard of the insulation and inboard of any ventilated
 * cavity; the outermost one (least resistance outboard) governs. */
export function outboardRatioRow(a: ResolvedAssembly, site: CanadianSite): CodeRow | null {
  if (!NBC_VAPOUR_BARRIER_KINDS.has(a.kind)) return null;
  const inner = innermostInsulation(a);
  const vent = ventedCavityIndex(a);
  const candidates = a.layers.filter((l) => l.index > vent && l.index < inner && isLowPermeance(l));
  if (candidates.length === 0) return null;
  const need = requiredRatio(site);
  let worst: { layer: ResolvedLayer; ratio: number } | null = null;
  for (const l of candidates) {
    const outboard = materialsRsi(a.layers.slice(vent + 1, l.index + 1));
    const inboard = materialsRsi(a.layers.slice(l.index + 1));
    const ratio = inboard > 0 ? outboard / inboard : Number.POSITIVE_INFINITY;
    if (!worst || ratio < worst.ratio) worst = { layer: l, ratio };
  }
  const w = worst as { layer: ResolvedLayer; ratio: number };
  const pass = w.ratio >= need.ratio - 1e-9;
  return {
    id: "nbc-9-25-5-2",
    label: `NBC 2020 Table 9.25.5.2, low-permeance ${lowerName(w.layer.material)} outboard of the insulation (${need.basis})`,
    required: `outboard : inboard thermal resistance ≥ ${r2(need.ratio)}`,
    provided: Number.isFinite(w.ratio) ? r2(w.ratio) : "no resistance inboard",
    pass,
    note: pass
      ? "Enough of the insulation lies outboard of the low-permeance layer to keep its inner face warm."
      : "Too little insulation outboard of the low-permeance layer: add outboard insulation, use a vapour-permeable layer, or move it outboard of a ventilated cavity (9.25.5.1).",
  };
}

function componentOf(a: ResolvedAssembly): NbcComponent | null {
  switch (a.kind) {
    case "above-grade-wall":
    case "rim-joist":
      return "wall";
    case "roof":
      // Loose fill on a ceiling means an attic; otherwise the insulation follows the roof slope.
      return a.layers.some((l) => l.material.family === "loose-fill") ? "attic-ceiling" : "cathedral-roof";
    case "floor":
      return "floor-over-unheated";
    case "basement-wall":
    case "crawlspace-wall":
      return "foundation-wall";
    default:
      return null;
  }
}

/** 9.36.2.6 / 9.36.2.8: effective RSI (isothermal planes with air films) against the zone's row. */
export function effectiveRsiRow(a: ResolvedAssembly, site: CanadianSite, thermal: ThermalResult): CodeRow | null {
  const component = componentOf(a);
  if (!component) return null;
  const row = NBC_EFFECTIVE_RSI[component];
  const need = row.byZone[site.nbcZone];
  const pass = thermal.rsi >= need - 0.005;
  return {
    id: component === "foundation-wall" ? "nbc-9-36-2-8" : "nbc-9-36-2-6",
    label: `NBC 2020 ${row.table}, ${NBC_COMPONENT_LABEL[component]}, zone ${site.nbcZone}, without heat-recovery ventilation`,
    required: `effective RSI ≥ ${r2(need)}`,
    provided: `effective RSI ${r2(thermal.rsi)}`,
    pass,
    note: `${row.status === "M" ? "Table value from memory: verify against the printed code. " : ""}Effective RSI includes framing (isothermal planes) and air films. With a heat-recovery ventilator Table 9.36.2.6.-B permits less; the stricter table is used.`,
  };
}

export function nbcRows(a: ResolvedAssembly, site: CanadianSite, thermal: ThermalResult): CodeRow[] {
  return [effectiveRsiRow(a, site, thermal), vapourBarrierRow(a), outboardRatioRow(a, site)].filter(
    (r): r is CodeRow => r !== null,
  );
}
