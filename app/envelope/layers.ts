// Resolves an assembly's layers against the material library once, checking every input,
// so the thermal, vapour and rule modules work on trusted numbers.
import { MaterialDataError, SiteCheckInputError } from "./errors";
import { lookupMaterial, type Material, type MaterialLibrary } from "./material-schema";
import { ASSEMBLY_KINDS, type AssemblyInput, type AssemblyKind, type LayerInput } from "./types";

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
    throw new SiteCheckInputError("kind", `unknown assembly kind "${String(assembly.kind)}"; use one of ${ASSEMBLY_KINDS.join(", ")}`);
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
      throw new SiteCheckInputError(`${at}.thickness_mm`, `thickness ${t} mm is over ${MAX_THICKNESS_MM} mm; check the units (millimetres)`);
    }
    if (input.joints !== undefined && !JOINTS.includes(input.joints)) {
      throw new SiteCheckInputError(`${at}.joints`, `joints must be one of ${JOINTS.join(", ")}`);
    }
    if (input.adhesive !== undefined && !ADHESIVES.includes(input.adhesive)) {
      throw new SiteCheckInputError(`${at}.adhesive`, `adhesive must be one of ${ADHESIVES.join(", ")}`);
    }
    let framing: ResolvedLayer["framing"] = null;
    if (input.framing !== undefined) {
      const f = input.framing.fraction;
      if (typeof f !== "number" || !Number.isFinite(f) || f < 0 || f > 1) {
        throw new SiteCheckInputError(`${at}.framing.fraction`, `framing fraction must be from 0 to 1 (e.g. 0.23 for 2×6 at 16 in), got ${String(f)}`);
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

/** RSI of a material at a thickness. */
export function materialRsi(m: Material, thickness_mm: number): number {
  if (m.thermal.rsi_fixed !== undefined) return m.thermal.rsi_fixed;
  return thickness_mm / 1000 / (m.thermal.conductivity_w_mk as number);
}

/** Insulation families: counted as cavity or continuous insulation in the code rows. */
export const INSULATION_FAMILIES = new Set(["foam-board", "spray-foam", "fibrous-insulation", "loose-fill"]);

export function isInsulation(layer: ResolvedLayer): boolean {
  return layer.input.role === "insulation" || INSULATION_FAMILIES.has(layer.material.family);
}
