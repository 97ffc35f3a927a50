import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { materialSchema, type Material } from "~/envelope/material-schema";
import { ContentError, type ContentProblem } from "./content-error";
import { parseDetail, type ParsedDetail } from "./parse-detail";
import { parseSets } from "./parse-sets";
import type { DetailSet } from "./set-schema";
import { lineOfPath, parseLocated, syntaxProblems } from "./yaml-locate";
import { problemsFromZod } from "./zod-problems";

/** A material file validated by the engine's material schema, with the file it came from. */
export interface LoadedMaterial {
  file: string;
  slug: string;
  material: Material;
}

export interface LoadedContent {
  /** Undefined when the folder has no `materials/` directory (layer materials are then not checked). */
  materials?: LoadedMaterial[];
  details: ParsedDetail[];
  sets: DetailSet[];
  /** Every problem found; the importer writes nothing unless this is empty. */
  errors: ContentProblem[];
}

/**
 * Reads a content folder (`details/*.md`, `materials/*.yaml`, `sets.yaml`) for the server-side import.
 * Never throws for content problems: they are collected in `errors`, with paths relative to `root`.
 */
export function loadContent(root: string): LoadedContent {
  const errors: ContentProblem[] = [];
  const materials = loadMaterials(root, errors);
  const sets = loadSets(root, errors);

  const knownMaterials = materials ? new Set(materials.map((material) => material.slug)) : undefined;
  const knownSets = new Set(sets.map((set) => set.slug));
  const details: ParsedDetail[] = [];
  for (const file of listFiles(root, "details", ".md")) {
    const text = readFileSync(path.join(root, file), "utf8");
    collect(errors, () => details.push(parseDetail(file, text, { knownMaterials, knownSets })));
  }
  return { materials, details, sets, errors };
}

function loadSets(root: string, errors: ContentProblem[]): DetailSet[] {
  const file = "sets.yaml";
  if (!existsSync(path.join(root, file))) {
    errors.push({ file, line: 1, field: "", message: "the content folder has no sets.yaml" });
    return [];
  }
  let sets: DetailSet[] = [];
  collect(errors, () => {
    sets = parseSets(file, readFileSync(path.join(root, file), "utf8"));
  });
  return sets;
}

function loadMaterials(root: string, errors: ContentProblem[]): LoadedMaterial[] | undefined {
  if (!existsSync(path.join(root, "materials"))) return undefined;
  const materials: LoadedMaterial[] = [];
  for (const file of listFiles(root, "materials", ".yaml")) {
    const located = parseLocated(readFileSync(path.join(root, file), "utf8"), 0);
    const syntax = syntaxProblems(file, located);
    if (syntax.length > 0) {
      errors.push(...syntax);
      continue;
    }
    const result = materialSchema.safeParse(located.doc.toJS());
    if (!result.success) {
      errors.push(...problemsFromZod(file, located, result.error));
      continue;
    }
    const material = result.data;
    const expected = path.basename(file, ".yaml");
    if (material.slug !== expected) {
      errors.push({
        file,
        line: lineOfPath(located, ["slug"]),
        field: "slug",
        message: `slug "${material.slug}" does not match the file name (expected "${expected}")`,
      });
      continue;
    }
    materials.push({ file, slug: material.slug, material });
  }
  return materials;
}

/** Files of one subfolder with the given extension, relative to root, in a stable order. */
function listFiles(root: string, folder: string, extension: string): string[] {
  const dir = path.join(root, folder);
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((name) => name.endsWith(extension))
    .sort()
    .map((name) => `${folder}/${name}`);
}

function collect(errors: ContentProblem[], work: () => void): void {
  try {
    work();
  } catch (error) {
    if (error instanceof ContentError) errors.push(...error.problems);
    else throw error;
  }
}
