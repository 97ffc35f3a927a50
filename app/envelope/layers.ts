// Resolves an assembly's layers against the material library once, checking every input,
// so the thermal, vapour and rule modules work on trusted numbers.
import { MaterialDataError, SiteCheckInputError } from "./errors";
import { lookupMaterial, type Material, type MaterialLibrary } from "./material-schema";
import { ASSEMBLY_KINDS, EXPOSURES, type AssemblyInput, type AssemblyKind, type LayerInput } from "./types";

export interface ResolvedLayer {
  index: number;
  input: LayerInput;
  material: Material;
  framing: { material: Material; fraction: number } | null;
  thickness_mm: number;
}

export interface ResolvedAssembly {
  kind: AssemblyKind;
  layers: ResolvedLayer[];
}

/** Thickest plausible layer; a typo of 1400 for 140 mm should not pass silently. */
const MAX_THICKNESS_MM = 2000;
const JOINTS = ["taped", "lapped", "sealed"];
const ADHESIVES = ["solvent-based", "water-based", "mechanical"];

function findMaterial(library: MaterialLibrary, slug: unknown, field: string): Material {
  if (typeof slug !== "string" || slug === "") {
    throw new SiteCheckInputError(field, "a material slug is required");
  }
  const material = lookupMaterial(library, slug);
  if (!material) {
    throw new SiteCheckInputError(field, `unknown material "${slug}"; pick one from the material library`);
  }
  return material;
}

export function resolveAssembly(assembly: AssemblyInput, library: MaterialLibrary): ResolvedAssembly {
  if (assembly === null || typeof assembly !== "object") {
    throw new SiteCheckInputError("assembly", "an assembly with a kind and layers is required");
  }
  if (!(ASSEMBLY_KINDS as readonly string[]).includes(assembly.kind)) {
    throw new SiteCheckInputError(
      "kind",
      `unknown assembly kind "${String(assembly.kind)}"; use one of ${ASSEMBLY_KINDS.join(", ")}`,
    );
  }
  if (!Array.isArray(assembly.layers) || assembly.layers.length === 0) {
    throw new SiteCheckInputError("layers", "the assembly has no layers; add at least one");
  }
  const layers = assembly.layers.map((input, index): ResolvedLayer => {
    const at = `layers[${index}]`;
    if (input === null || typeof input !== "object") {
      throw new SiteCheckInputError(at, "each layer needs a material and a thickness");
    }
    const material = findMaterial(library, input.material, `${at}.material`);
    const t = input.thickness_mm;
    if (typeof t !== "number" || !Number.isFinite(t) || t <= 0) {
      throw new SiteCheckInputError(`${at}.thickness_mm`, `thickness must be a number above 0 mm (got ${String(t)})`);
    }
    if (t > MAX_THICKNESS_MM) {
      throw new SiteCheckInputError(
        `${at}.thickness_mm`,
        `thickness ${t} mm is over ${MAX_THICKNESS_MM} mm; check the units (millimetres)`,
      );
    }
    if (input.joints !== undefined && !JOINTS.includes(input.joints)) {
      throw new SiteCheckInputError(`${at}.joints`, `joints must be one of ${JOINTS.join(", ")}`);
    }
    if (input.adhesive !== undefined && !ADHESIVES.includes(input.adhesive)) {
      throw new SiteCheckInputError(`${at}.adhesive`, `adhesive must be one of ${ADHESIVES.join(", ")}`);
    }
    if (input.exposure !== undefined && !(EXPOSURES as readonly string[]).includes(input.exposure)) {
      throw new SiteCheckInputError(`${at}.exposure`, `exposure must be one of ${EXPOSURES.join(", ")}`);
    }
    let framing: ResolvedLayer["framing"] = null;
    if (input.framing !== undefined) {
      const f = input.framing.fraction;
      if (typeof f !== "number" || !Number.isFinite(f) || f < 0 || f > 1) {
        throw new SiteCheckInputError(
          `${at}.framing.fraction`,
          `framing fraction must be from 0 to 1 (e.g. 0.23 for 2×6 at 16 in), got ${String(f)}`,
        );
      }
      framing = { material: findMaterial(library, input.framing.material, `${at}.framing.material`), fraction: f };
    }
    for (const m of framing ? [material, framing.material] : [material]) checkMaterialNumbers(m);
    return { index, input, material, framing, thickness_mm: t };
  });
  return { kind: assembly.kind, layers };
}

/** Library entries normally come through the zod schema; this guards hand-built ones. */
function checkMaterialNumbers(m: Material): void {
  const k = m.thermal.conductivity_w_mk;
  const r = m.thermal.rsi_fixed;
  if (!((k !== undefined && Number.isFinite(k) && k > 0) || (r !== undefined && Number.isFinite(r) && r >= 0))) {
    throw new MaterialDataError(m.slug, "needs a positive conductivity_w_mk or a non-negative rsi_fixed");
  }
  const p = m.vapour.permeance_ng;
  if (!Number.isFinite(p) || p <= 0) throw new MaterialDataError(m.slug, "needs a positive permeance_ng");
}

/** RSI of a material at a thickness (rated conductivity). */
export function materialRsi(m: Material, thickness_mm: number): number {
  if (m.thermal.rsi_fixed !== undefined) return m.thermal.rsi_fixed;
  return thickness_mm / 1000 / (m.thermal.conductivity_w_mk as number);
}

export function hasTemperatureDependentConductivity(m: Material): boolean {
  return m.thermal.by_mean_temperature !== undefined;
}

/** Conductivity at a mean temperature: linear between the published points, flat beyond them. */
export function conductivityAt(m: Material, mean_t_c: number): number {
  const curve = m.thermal.by_mean_temperature;
  if (!curve) return m.thermal.conductivity_w_mk as number;
  const pts = curve.points;
  if (mean_t_c <= pts[0][0]) return pts[0][1];
  for (let i = 1; i < pts.length; i++) {
    if (mean_t_c <= pts[i][0]) {
      const [t0, k0] = pts[i - 1];
      const [t1, k1] = pts[i];
      return k0 + ((k1 - k0) * (mean_t_c - t0)) / (t1 - t0);
    }
  }
  return pts[pts.length - 1][1];
}

/** RSI of a material at a thickness and a mean temperature (rated where no curve is given). */
export function materialRsiAt(m: Material, thickness_mm: number, mean_t_c: number): number {
  if (m.thermal.rsi_fixed !== undefined || !m.thermal.by_mean_temperature) return materialRsi(m, thickness_mm);
  return thickness_mm / 1000 / conductivityAt(m, mean_t_c);
}

/** Innermost ventilated cavity (a vented air space used as a drainage gap: a rainscreen, a vented
 * attic), or −1. A cavity with nothing inboard of it leaves no stack to analyse and is ignored.
 * Layers outboard of it are outdoors for heat and vapour. */
export function ventedCavityIndex(a: ResolvedAssembly): number {
  let idx = -1;
  for (const l of a.layers) if (l.material.family === "air-space" && l.input.role === "drainage-gap") idx = l.index;
  return idx < a.layers.length - 1 ? idx : -1;
}

const lowerNames = new WeakMap<Material, string>();
/** Material name in lower case for running text (cached: the library's materials are reused). */
export function lowerName(m: Material): string {
  let name = lowerNames.get(m);
  if (name === undefined) {
    name = m.name.toLowerCase();
    lowerNames.set(m, name);
  }
  return name;
}

/** Insulation families: counted as cavity or continuous insulation in the code rows. */
export const INSULATION_FAMILIES = new Set(["foam-board", "spray-foam", "fibrous-insulation", "loose-fill"]);

export function isInsulation(layer: ResolvedLayer): boolean {
  return layer.input.role === "insulation" || INSULATION_FAMILIES.has(layer.material.family);
}
