import type { z } from "zod";
import type { ContentProblem } from "./content-error";
import { formatFieldPath, lineOfPath, type FieldPath, type LocatedDocument } from "./yaml-locate";

/** Turns schema issues into located problems; an unknown key points at that key itself. */
export function problemsFromZod(file: string, located: LocatedDocument, error: z.ZodError): ContentProblem[] {
  return error.issues.flatMap((issue) => {
    const path: FieldPath = issue.path;
    if (issue.code === "unrecognized_keys") {
      return issue.keys.map((key) => {
        const keyPath = [...path, key];
        return {
          file,
          line: lineOfPath(located, keyPath),
          field: formatFieldPath(keyPath),
          message: `unknown field "${key}"`,
        };
      });
    }
    return [{ file, line: lineOfPath(located, path), field: formatFieldPath(path), message: issue.message }];
  });
}
