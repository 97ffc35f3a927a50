import { isMap, isScalar, isSeq, LineCounter, parseDocument, type Document, type Node } from "yaml";
import type { ContentProblem } from "./content-error";

export type FieldPath = readonly PropertyKey[];

/** A YAML document parsed with positions, and the file line where its text starts. */
export interface LocatedDocument {
  doc: Document.Parsed;
  lineCounter: LineCounter;
  /** Lines of the file that come before the YAML text (1 for a front matter after `---`). */
  lineOffset: number;
}

export function parseLocated(yamlText: string, lineOffset: number): LocatedDocument {
  const lineCounter = new LineCounter();
  const doc = parseDocument(yamlText, { lineCounter, prettyErrors: true, uniqueKeys: true });
  return { doc, lineCounter, lineOffset };
}

/** Syntax problems of the document, with file lines. */
export function syntaxProblems(file: string, located: LocatedDocument): ContentProblem[] {
  return located.doc.errors.map((error) => {
    const yamlLine = error.linePos?.[0]?.line ?? located.lineCounter.linePos(error.pos[0]).line;
    const firstLine = error.message.split("\n")[0] ?? error.message;
    return { file, line: yamlLine + located.lineOffset, field: "", message: `YAML syntax: ${firstLine}` };
  });
}

/**
 * File line of a field: the line of its key in a map, or of the item in a sequence. Where the path
 * runs out (a missing key), the deepest node that exists is used, so the editor lands near it.
 */
export function lineOfPath(located: LocatedDocument, path: FieldPath): number {
  let node: unknown = located.doc.contents;
  let offset = rangeStart(node) ?? 0;
  for (const segment of path) {
    if (isMap(node)) {
      const pair = node.items.find((item) => isScalar(item.key) && String(item.key.value) === String(segment));
      if (!pair) break;
      offset = rangeStart(pair.key) ?? offset;
      node = pair.value;
    } else if (isSeq(node) && typeof segment === "number") {
      const item = node.items[segment];
      if (item === undefined) break;
      offset = rangeStart(item) ?? offset;
      node = item;
    } else {
      break;
    }
  }
  return located.lineCounter.linePos(offset).line + located.lineOffset;
}

/** `layers[2].material` from ["layers", 2, "material"]. */
export function formatFieldPath(path: FieldPath): string {
  return path.reduce<string>((text, segment) => {
    if (typeof segment === "number") return `${text}[${segment}]`;
    return text ? `${text}.${String(segment)}` : String(segment);
  }, "");
}

function rangeStart(node: unknown): number | undefined {
  const range = (node as Node | null | undefined)?.range;
  return range ? range[0] : undefined;
}
