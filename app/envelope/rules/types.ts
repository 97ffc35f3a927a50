// The shape of a trade rule: a small named object, one per file, listed in ./index.ts.
import type { ResolvedAssembly } from "../layers";
import type {
  CodeRow,
  Flag,
  ProfileCase,
  ResolvedSite,
  SeasonalResult,
  Severity,
  UpperWallProfiles,
  VapourResult,
} from "../types";

export interface RuleContext {
  assembly: ResolvedAssembly;
  site: ResolvedSite;
  vapour: VapourResult;
  winter: ProfileCase;
  summer: ProfileCase;
  /** Basement and crawl-space walls: the band above grade and the soil at frost depth. */
  upperWall: UpperWallProfiles | null;
  codeRows: CodeRow[];
  /** The ISO 13788 monthly balance, or null when the caller asked for the design day only. */
  seasonal: SeasonalResult | null;
}

export interface Rule {
  /** The id of the flag it raises (stable: pages and tests refer to it). */
  id: string;
  /** The most severe level it raises; some rules lower it where the risk is smaller. */
  severity: Severity;
  /** Where the rule comes from, with its status letter or "common practice". */
  source: string;
  /** Cheap test of whether the rule concerns this assembly and site at all. */
  applies(ctx: RuleContext): boolean;
  /** The flag (a few rules raise one per failed code row), or null when the assembly passes.
   * Called only when applies() is true. */
  check(ctx: RuleContext): Flag | readonly Flag[] | null;
}

/** A flag carrying the rule's id and source unless it says otherwise. */
export function flagOf(
  rule: Pick<Rule, "id" | "source">,
  severity: Severity,
  title: string,
  explanation: string,
  source = rule.source,
): Flag {
  return { id: rule.id, severity, title, explanation, source };
}
