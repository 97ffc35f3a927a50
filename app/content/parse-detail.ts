import { ContentError, type ContentProblem } from "./content-error";
import { detailFrontMatterSchema, type DetailFrontMatter } from "./detail-schema";
import { lineOfPath, parseLocated, syntaxProblems, type LocatedDocument } from "./yaml-locate";
import { problemsFromZod } from "./zod-problems";
import { missingBodySections } from "~/vocabulary/body-sections";

export interface ParsedDetail extends DetailFrontMatter {
  /** Markdown after the closing `---`. */
  body: string;
  /** File line where the body starts, for problems found later (rendering, links). */
  bodyStartLine: number;
  /** The file name the detail came from. */
  file: string;
}

export interface ParseDetailOptions {
  /** Material slugs that exist; when given, every layer and framing material must be one of them. */
  knownMaterials?: ReadonlySet<string>;
  /** Set slugs that exist; when given, every listed set must be one of them. */
  knownSets?: ReadonlySet<string>;
}

interface SplitFile {
  frontMatter: string;
  body: string;
  bodyStartLine: number;
}

/**
 * Parses one detail file (`content/details/<slug>.md`). Pure: no disk, no database.
 * Throws a ContentError listing every problem, each with the file line of the offending key.
 */
export function parseDetail(fileName: string, text: string, options: ParseDetailOptions = {}): ParsedDetail {
  const split = splitFrontMatter(fileName, text);
  // The front matter's first line is file line 2: the opening `---` is line 1.
  const located = parseLocated(split.frontMatter, 1);
  const syntax = syntaxProblems(fileName, located);
  if (syntax.length > 0) throw new ContentError(syntax);

  const result = detailFrontMatterSchema.safeParse(located.doc.toJS());
  if (!result.success) throw new ContentError(problemsFromZod(fileName, located, result.error));

  const detail = result.data;
  const problems = [
    ...slugProblems(fileName, located, detail),
    ...referenceProblems(fileName, located, detail, options),
    ...bodyProblems(fileName, split),
  ];
  if (problems.length > 0) throw new ContentError(problems);

  return { ...detail, body: split.body, bodyStartLine: split.bodyStartLine, file: fileName };
}

/** The slug a file name implies: `a/b/sealed-crawl.md` → `sealed-crawl`. */
export function slugFromFileName(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? fileName;
  return base.replace(/\.md$/i, "");
}

function splitFrontMatter(fileName: string, text: string): SplitFile {
  const lines = text
    .replace(/^\uFEFF/, "")
    .replace(/\r\n?/g, "\n")
    .split("\n");
  if (lines[0]?.trim() !== "---") {
    throw new ContentError([
      { file: fileName, line: 1, field: "", message: "a detail must start with a `---` line opening its front matter" },
    ]);
  }
  const closing = lines.findIndex((line, index) => index > 0 && line.trim() === "---");
  if (closing === -1) {
    throw new ContentError([
      { file: fileName, line: 1, field: "", message: "the front matter is never closed by a second `---` line" },
    ]);
  }
  return {
    frontMatter: lines.slice(1, closing).join("\n"),
    body: lines
      .slice(closing + 1)
      .join("\n")
      .trim(),
    bodyStartLine: closing + 2,
  };
}

function slugProblems(file: string, located: LocatedDocument, detail: DetailFrontMatter): ContentProblem[] {
  const expected = slugFromFileName(file);
  if (detail.slug === expected) return [];
  return [
    {
      file,
      line: lineOfPath(located, ["slug"]),
      field: "slug",
      message: `slug "${detail.slug}" does not match the file name (expected "${expected}")`,
    },
  ];
}

function referenceProblems(
  file: string,
  located: LocatedDocument,
  detail: DetailFrontMatter,
  options: ParseDetailOptions,
): ContentProblem[] {
  const problems: ContentProblem[] = [];
  const { knownMaterials, knownSets } = options;
  if (knownMaterials) {
    detail.layers.forEach((layer, index) => {
      if (!knownMaterials.has(layer.material)) {
        problems.push({
          file,
          line: lineOfPath(located, ["layers", index, "material"]),
          field: `layers[${index}].material`,
          message: `unknown material "${layer.material}"`,
        });
      }
      if (layer.framing && !knownMaterials.has(layer.framing.material)) {
        problems.push({
          file,
          line: lineOfPath(located, ["layers", index, "framing", "material"]),
          field: `layers[${index}].framing.material`,
          message: `unknown framing material "${layer.framing.material}"`,
        });
      }
    });
  }
  if (knownSets) {
    detail.sets.forEach((set, index) => {
      if (!knownSets.has(set)) {
        problems.push({
          file,
          line: lineOfPath(located, ["sets", index]),
          field: `sets[${index}]`,
          message: `unknown set "${set}" (not in content/sets.yaml)`,
        });
      }
    });
  }
  return problems;
}

function bodyProblems(file: string, split: SplitFile): ContentProblem[] {
  const missing = missingBodySections(split.body);
  if (missing.length === 0) return [];
  return [
    {
      file,
      line: split.bodyStartLine,
      field: "body",
      message: `the body lacks the section${missing.length > 1 ? "s" : ""} ${missing.map((m) => `"## ${m}"`).join(", ")}`,
    },
  ];
}
