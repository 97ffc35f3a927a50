import { ContentError } from "./content-error";
import { detailSetListSchema, type DetailSet } from "./set-schema";
import { parseLocated, syntaxProblems } from "./yaml-locate";
import { problemsFromZod } from "./zod-problems";

/** Parses `content/sets.yaml` (a YAML list of sets). Pure; throws a ContentError with file lines. */
export function parseSets(fileName: string, text: string): DetailSet[] {
  const located = parseLocated(text, 0);
  const syntax = syntaxProblems(fileName, located);
  if (syntax.length > 0) throw new ContentError(syntax);
  const result = detailSetListSchema.safeParse(located.doc.toJS());
  if (!result.success) throw new ContentError(problemsFromZod(fileName, located, result.error));
  return result.data;
}
