// Test helpers: the real material library from content/materials, and small fixture libraries
// built from stated values (so reference cases use exactly the inputs their source gives).
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parse } from "yaml";
import { buildMaterialLibrary, type Material } from "~/envelope/material-schema";
import { ripToRsi, permToNg } from "~/envelope/units";

const DIR = join(process.cwd(), "content", "materials");

export function loadLibrary(): ReadonlyMap<string, Material> {
  const entries = readdirSync(DIR)
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => parse(readFileSync(join(DIR, f), "utf8")) as unknown);
  return buildMaterialLibrary(entries);
}

/** A fixture material with a fixed R (inch-pound) and a fixed permeance (US perm). */
export function fixedMaterial(slug: string, rIp: number, perm: number, extra: Partial<Material> = {}): Material {
  return {
    slug,
    name: slug,
    family: "membrane",
    thermal: { rsi_fixed: ripToRsi(rIp), source: "fixture, D" },
    vapour: { permeance_ng: permToNg(perm), source: "fixture, D" },
    foam_plastic: false,
    water_sensitive: false,
    insect_risk: false,
    solvent_sensitive: false,
    vented_cladding: false,
    ...extra,
  };
}

/** A fixture material with a fixed RSI (SI). */
export function fixedRsiMaterial(slug: string, rsi: number, extra: Partial<Material> = {}): Material {
  return { ...fixedMaterial(slug, 0, 1000, extra), thermal: { rsi_fixed: rsi, source: "fixture, D" } };
}

export function libraryOf(...materials: Material[]): ReadonlyMap<string, Material> {
  return new Map(materials.map((m) => [m.slug, m]));
}
