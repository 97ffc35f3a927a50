// The part of a site check that depends only on the assembly (resolved layers, R-values, permeances,
// drying directions, profile labels) is the same at every site. A detail is checked at many sites
// and zones, so it is worked out once per distinct assembly and library and shared between results
// (results are read-only data). Keyed by the assembly's content, not its object, so an equal
// assembly parsed afresh (an API body, a content file) finds it too; an assembly is kept only once
// it comes back, so one-off assemblies leave nothing behind.
import { resolveAssembly, type ResolvedAssembly } from "./layers";
import type { MaterialLibrary } from "./material-schema";
import { analyseThermal } from "./thermal";
import type { AssemblyInput, LayerInput, ThermalResult, VapourResult } from "./types";
import { analyseVapour } from "./vapour";

export interface AnalysedAssembly {
  assembly: ResolvedAssembly;
  thermal: ThermalResult;
  vapour: VapourResult;
}

const MAX_ENTRIES = 256;

interface LibraryCache {
  entries: Map<number, AnalysedAssembly[]>;
  size: number;
  seenOnce: Set<number>;
}
const caches = new WeakMap<object, LibraryCache>();
/** The same assembly object checked again: found without hashing, once its layers are compared. */
const byObject = new WeakMap<AssemblyInput, { materials: MaterialLibrary; entry: AnalysedAssembly }>();

// FNV-1a over 32-bit words: strings by character, numbers by their two 32-bit halves.
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
const mix = (h: number, x: number): number => Math.imul(h ^ x, 0x01000193) >>> 0;
function hashString(h: number, s: string): number {
  for (let i = 0; i < s.length; i++) h = mix(h, s.charCodeAt(i));
  return mix(h, 0x1f);
}
function hashNumber(h: number, n: number): number {
  f64[0] = n;
  return mix(mix(h, u32[0]), u32[1]);
}
const hashOptional = (h: number, s: string | undefined): number => (s === undefined ? mix(h, 0x1e) : hashString(h, s));

/** A hash of the assembly's content, or null where any field has an unexpected type (then the
 * input goes straight to resolveAssembly, which says what is wrong with it). */
function contentHash(assembly: AssemblyInput): number | null {
  if (
    assembly === null ||
    typeof assembly !== "object" ||
    typeof assembly.kind !== "string" ||
    !Array.isArray(assembly.layers)
  )
    return null;
  let h = hashString(0x811c9dc5, assembly.kind);
  for (const l of assembly.layers as readonly LayerInput[]) {
    if (
      l === null ||
      typeof l !== "object" ||
      typeof l.role !== "string" ||
      typeof l.material !== "string" ||
      typeof l.thickness_mm !== "number"
    )
      return null;
    if (
      !isOptionalString(l.joints) ||
      !isOptionalString(l.adhesive) ||
      !isOptionalString(l.exposure) ||
      !isOptionalString(l.note)
    )
      return null;
    if (l.exposed !== undefined && typeof l.exposed !== "boolean") return null;
    h = hashNumber(hashString(hashString(h, l.role), l.material), l.thickness_mm);
    h = hashOptional(hashOptional(hashOptional(hashOptional(h, l.joints), l.adhesive), l.exposure), l.note);
    h = mix(h, l.exposed === undefined ? 2 : l.exposed ? 1 : 0);
    if (l.framing !== undefined) {
      if (
        l.framing === null ||
        typeof l.framing !== "object" ||
        typeof l.framing.material !== "string" ||
        typeof l.framing.fraction !== "number"
      )
        return null;
      h = hashNumber(hashString(h, l.framing.material), l.framing.fraction);
    } else h = mix(h, 0x1d);
  }
  return h;
}

function isOptionalString(v: unknown): boolean {
  return v === undefined || typeof v === "string";
}

/** True when the input has exactly the content the entry was built from (the entry holds copies). */
function sameContent(assembly: AssemblyInput, entry: AnalysedAssembly): boolean {
  const layers = assembly.layers;
  const held = entry.assembly.layers;
  if (assembly.kind !== entry.assembly.kind || !Array.isArray(layers) || layers.length !== held.length) return false;
  for (let i = 0; i < layers.length; i++) {
    const l = layers[i];
    const h = held[i].input;
    if (l === null || typeof l !== "object") return false;
    if (
      l.role !== h.role ||
      l.material !== h.material ||
      l.thickness_mm !== h.thickness_mm ||
      l.joints !== h.joints ||
      l.adhesive !== h.adhesive ||
      l.exposed !== h.exposed ||
      l.exposure !== h.exposure ||
      l.note !== h.note
    )
      return false;
    if (l.framing === undefined || h.framing === undefined) {
      if (l.framing !== h.framing) return false;
    } else if (
      l.framing === null ||
      l.framing.material !== h.framing.material ||
      l.framing.fraction !== h.framing.fraction
    )
      return false;
  }
  return true;
}

function analyse(assembly: AssemblyInput, materials: MaterialLibrary): AnalysedAssembly {
  const a = resolveAssembly(assembly, materials);
  return { assembly: a, thermal: analyseThermal(a), vapour: analyseVapour(a) };
}

export function analyseAssembly(assembly: AssemblyInput, materials: MaterialLibrary): AnalysedAssembly {
  const known = assembly !== null && typeof assembly === "object" ? byObject.get(assembly) : undefined;
  if (known && known.materials === materials && sameContent(assembly, known.entry)) return known.entry;
  const h = contentHash(assembly);
  if (h === null) return analyse(assembly, materials);
  let cache = caches.get(materials);
  if (!cache) {
    cache = { entries: new Map(), size: 0, seenOnce: new Set() };
    caches.set(materials, cache);
  }
  const bucket = cache.entries.get(h);
  const hit = bucket?.find((e) => sameContent(assembly, e));
  if (hit) {
    byObject.set(assembly, { materials, entry: hit });
    return hit;
  }
  if (!cache.seenOnce.has(h)) {
    if (cache.seenOnce.size >= 4 * MAX_ENTRIES) cache.seenOnce.clear();
    cache.seenOnce.add(h);
    return analyse(assembly, materials);
  }
  const fresh = analyse(assembly, materials);
  // The resolved layers keep the caller's inputs: copy them, so later edits by the caller cannot
  // change what the cache holds.
  for (const l of fresh.assembly.layers)
    l.input = { ...l.input, ...(l.input.framing ? { framing: { ...l.input.framing } } : {}) };
  // Full: start again (simpler than recency order, and a detail library is far below the limit).
  if (cache.size >= MAX_ENTRIES) {
    cache.entries.clear();
    cache.size = 0;
  }
  if (bucket) bucket.push(fresh);
  else cache.entries.set(h, [fresh]);
  cache.size++;
  byObject.set(assembly, { materials, entry: fresh });
  return fresh;
}
