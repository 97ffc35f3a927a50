/** One problem found in a content file, located so an editor can jump to it. */
export interface ContentProblem {
  /** File name as given to the parser (relative to the content folder when loaded from disk). */
  file: string;
  /** 1-based line in the whole file (the opening `---` of a detail is line 1). */
  line: number;
  /** Dotted path of the offending field, e.g. `layers[2].material`; empty for file-level problems. */
  field: string;
  message: string;
}

/** Thrown by the parsers; carries the first problem up front and every problem in `problems`. */
export class ContentError extends Error implements ContentProblem {
  readonly file: string;
  readonly line: number;
  readonly field: string;
  readonly problems: readonly ContentProblem[];

  constructor(problems: readonly ContentProblem[]) {
    const first = problems[0] ?? { file: "", line: 1, field: "", message: "unknown content problem" };
    super(formatProblem(first));
    this.name = "ContentError";
    this.file = first.file;
    this.line = first.line;
    this.field = first.field;
    this.problems = problems;
  }
}

export function formatProblem(problem: ContentProblem): string {
  const where = problem.field ? ` ${problem.field}:` : "";
  return `${problem.file}:${problem.line}:${where} ${problem.message}`;
}
