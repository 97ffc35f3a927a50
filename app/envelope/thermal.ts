// Thermal resistance of a layered assembly.
// Framed layers: cavity and framing combined by area-weighted conductance (the parallel-path rule
// applied inside the layer), then all layers and the air films in series (isothermal planes).
// The whole-assembly parallel-path figure (paths running through every layer) is reported beside
// it for comparison; with wood framing the truth lies between the two (docs/references.md §4.1).
import { materialRsi, resolveAssembly, ventedCavityIndex, type ResolvedAssembly, type ResolvedLayer } from "./layers";
import type { MaterialLibrary } from "./material-schema";
import type { AirFilm, AssemblyInput, AssemblyKind, ThermalLayer, ThermalResult } from "./types";
import { ripToRsi, rsiToRip, usiToUip } from "./units";

export type Season = "winter" | "summer";

const BELOW_GRADE: ReadonlySet<AssemblyKind> = new Set([
  "basement-wall",
  "crawlspace-wall",
  "slab",
  "crawlspace-floor",
]);
export const isBelowGrade = (kind: AssemblyKind): boolean => BELOW_GRADE.has(kind);

interface FilmSpec {
  rip: number;
  label: string;
  source: string;
}
const WAC = "WAC 51-11-0526 (ASHRAE surface resistances), C";
const FILM_WALL: FilmSpec = { rip: 0.68, label: "inside air film, vertical surface", source: WAC };
const FILM_UP: FilmSpec = { rip: 0.61, label: "inside air film, heat flow up", source: WAC };
const FILM_DOWN: FilmSpec = { rip: 0.92, label: "still-air film, heat flow down", source: WAC };
const FILM_OUT_WINTER: FilmSpec = { rip: 0.17, label: "outside air film, 15 mph wind", source: WAC };
const FILM_OUT_SUMMER: FilmSpec = {
  rip: 0.25,
  label: "outside air film, 7.5 mph wind",
  source: "ASHRAE HoF ch.26 surface resistances, M",
};

/** Interior film by kind and season: heat flows up through a roof in winter and down in summer;
 * floors and slabs lose heat downward in winter. */
function interiorFilm(kind: AssemblyKind, season: Season): FilmSpec {
  if (kind === "roof") return season === "winter" ? FILM_UP : FILM_DOWN;
  if (kind === "floor" || kind === "slab" || kind === "crawlspace-floor")
    return season === "winter" ? FILM_DOWN : FILM_UP;
  return FILM_WALL;
}

/** Exterior film, or none. Below grade there is no exterior film: the soil face is held at a
 * stated ground temperature, as the simple steady-state below-grade methods do (ASHRAE treats the
 * soil as the boundary; the ground temperature stands in for the soil path and the annual swing).
 * A floor's underside faces still crawlspace or garage air, so it gets a still-air film. */
function exteriorFilm(kind: AssemblyKind, season: Season): FilmSpec | null {
  if (isBelowGrade(kind)) return null;
  if (kind === "floor") return FILM_DOWN;
  return season === "winter" ? FILM_OUT_WINTER : FILM_OUT_SUMMER;
}

function toFilm(side: AirFilm["side"], spec: FilmSpec): AirFilm {
  return { side, rsi: ripToRsi(spec.rip), r_ip: spec.rip, label: spec.label, source: spec.source };
}

export function filmsFor(kind: AssemblyKind, season: Season): { exterior: AirFilm | null; interior: AirFilm } {
  const ext = exteriorFilm(kind, season);
  return { exterior: ext ? toFilm("exterior", ext) : null, interior: toFilm("interior", interiorFilm(kind, season)) };
}

/** Effective RSI of one layer (framed: 1 / Σ f_j / R_j). */
export function layerRsi(layer: ResolvedLayer): number {
  const cavity = materialRsi(layer.material, layer.thickness_mm);
  if (!layer.framing) return cavity;
  const framing = materialRsi(layer.framing.material, layer.thickness_mm);
  const f = layer.framing.fraction;
  // A zero-resistance path (rsi_fixed 0) would short the layer: treat as conductance sum safely.
  const conductance = (1 - f) / Math.max(cavity, 1e-9) + f / Math.max(framing, 1e-9);
  return 1 / conductance;
}

/** The one-dimensional heat path a profile runs along: through the clear cavity (the worst case in
 * winter: framed layers conduct only through their fill) or through the framing. */
export type HeatPath = "clear-cavity" | "stud";

/** Series sum of all layers plus films (winter films), isothermal planes. Outboard of a ventilated
 * cavity nothing counts, and the cavity's still air takes the place of the outdoor film (the same
 * rule the profiles use; ASHRAE practice for well-ventilated spaces). */
export function seriesRsi(a: ResolvedAssembly): {
  layers: number[];
  counted: boolean[];
  exterior: number;
  exteriorFilm: AirFilm | null;
  interior: number;
  total: number;
} {
  const films = filmsFor(a.kind, "winter");
  const vent = ventedCavityIndex(a);
  const layers = a.layers.map(layerRsi);
  const counted = a.layers.map((l) => l.index > vent);
  const exteriorFilm = vent >= 0 ? stillAirFilm(a.kind) : films.exterior;
  const exterior = exteriorFilm?.rsi ?? 0;
  const interior = films.interior.rsi;
  let total = exterior + interior;
  for (let i = 0; i < layers.length; i++) if (counted[i]) total += layers[i];
  return { layers, counted, exterior, exteriorFilm, interior, total };
}

/** Film on the inner face of a ventilated cavity: still air, the interior film of the same surface. */
export function stillAirFilm(kind: AssemblyKind): AirFilm {
  const spec = interiorFilm(kind, "winter");
  return {
    side: "exterior",
    rsi: ripToRsi(spec.rip),
    r_ip: spec.rip,
    label: `still-air film in the ventilated cavity (${spec.label.replace(/^inside air film, /, "")})`,
    source: `${spec.source}; ventilated cavity treated as still air (ASHRAE HoF ch.26 practice), M`,
  };
}

/** Paths through the whole assembly; several framed layers are taken as independent (their
 * combined fractions multiply). Null when more than 6 framed layers make that meaningless. */
function parallelPathRsi(a: ResolvedAssembly, filmsRsi: number, counted: readonly boolean[]): number | null {
  const framed = a.layers.filter((l) => l.framing && counted[l.index]);
  if (framed.length === 0 || framed.length > 6) return null;
  let u = 0;
  for (let mask = 0; mask < 1 << framed.length; mask++) {
    let weight = 1;
    let r = filmsRsi;
    for (const l of a.layers) {
      if (!counted[l.index]) continue;
      const k = framed.indexOf(l);
      if (k < 0) {
        r += materialRsi(l.material, l.thickness_mm);
        continue;
      }
      const onFraming = (mask >> k) & 1;
      const f = (l.framing as { fraction: number }).fraction;
      weight *= onFraming ? f : 1 - f;
      r += materialRsi(
        onFraming ? (l.framing as { material: ResolvedLayer["material"] }).material : l.material,
        l.thickness_mm,
      );
    }
    if (weight > 0) u += weight / Math.max(r, 1e-9);
  }
  return 1 / u;
}

export function analyseThermal(a: ResolvedAssembly): ThermalResult {
  const films = filmsFor(a.kind, "winter");
  const series = seriesRsi(a);
  const layers: ThermalLayer[] = a.layers.map((l, i) => {
    const rsi = series.layers[i];
    const out: ThermalLayer = {
      index: l.index,
      role: l.input.role,
      material: l.material.slug,
      name: l.material.name,
      thickness_mm: l.thickness_mm,
      rsi,
      r_ip: rsiToRip(rsi),
      counted: series.counted[i],
    };
    if (l.framing) {
      out.framed = {
        framing_material: l.framing.material.slug,
        fraction: l.framing.fraction,
        cavity_rsi: materialRsi(l.material, l.thickness_mm),
        framing_rsi: materialRsi(l.framing.material, l.thickness_mm),
      };
    }
    return out;
  });
  const rsi = series.total;
  const pp = parallelPathRsi(a, series.exterior + series.interior, series.counted);
  const filmList = series.exteriorFilm ? [series.exteriorFilm, films.interior] : [films.interior];
  const vented = series.counted.includes(false);
  const method =
    "Layers in series with air films (isothermal planes); framed layers combine cavity and framing by area-weighted conductance." +
    (vented
      ? " Layers outboard of the ventilated cavity (and the cavity itself) do not count; a still-air film stands in for the outdoor film."
      : "") +
    (films.exterior ? "" : " Below grade: no exterior film; the soil face is taken at the stated ground temperature.") +
    (pp !== null ? " The parallel-path figure (heat paths through every layer) is shown for comparison." : "");
  return {
    layers,
    films: filmList,
    rsi,
    r_ip: rsiToRip(rsi),
    u_si: 1 / rsi,
    u_ip: usiToUip(1 / rsi),
    parallelPath: pp === null ? null : { rsi: pp, r_ip: rsiToRip(pp), u_si: 1 / pp, u_ip: usiToUip(1 / pp) },
    method,
  };
}

/** Effective R and U of an assembly (winter films, isothermal planes). */
export function assemblyRValue(
  assembly: AssemblyInput,
  materials: MaterialLibrary,
): { rsi: number; r_ip: number; u_si: number; u_ip: number } {
  const t = analyseThermal(resolveAssembly(assembly, materials));
  return { rsi: t.rsi, r_ip: t.r_ip, u_si: t.u_si, u_ip: t.u_ip };
}
