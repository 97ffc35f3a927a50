// Foam on the outside of a foundation wall runs from the footing to above grade: sun, mowers,
// backfill and insects reach it there in every zone, so it needs a protective cover.
import type { ResolvedLayer } from "../layers";
import { isBelowGrade } from "../thermal";
import { isFoam, nameOf, structureIndex } from "./helpers";
import { flagOf, type Rule, type RuleContext } from "./types";

const FOUNDATION_WALLS = new Set(["basement-wall", "crawlspace-wall"]);

/** Outboard foam facing soil or weather: foundation-wall foam outboard of the structure, or any
 * foam whose layer says it faces the weather or the soil. */
function exposedExteriorFoam(ctx: RuleContext): ResolvedLayer | undefined {
  const a = ctx.assembly;
  const structure = structureIndex(a);
  return a.layers.find(
    (l) =>
      isFoam(l) &&
      ((FOUNDATION_WALLS.has(a.kind) && structure >= 0 && l.index < structure) ||
        l.input.exposure === "weather" ||
        l.input.exposure === "soil"),
  );
}

const isProtection = (l: ResolvedLayer): boolean =>
  l.input.role === "soil-side-protection" || l.input.role === "cladding";

export const exteriorFoamUnprotected: Rule = {
  id: "exterior-foam-unprotected",
  severity: "caution",
  source:
    "IRC 2021 R318.4 (foam plastic in termite areas), M; IRC 2021 R404.1/R406 protection of exterior foundation insulation above grade, M; common practice",
  applies: (ctx) =>
    isBelowGrade(ctx.assembly.kind) ||
    ctx.assembly.layers.some((l) => l.input.exposure === "weather" || l.input.exposure === "soil"),
  check(ctx) {
    const foam = exposedExteriorFoam(ctx);
    if (!foam || ctx.assembly.layers.slice(0, foam.index).some(isProtection)) return null;
    const termites =
      ctx.site.zoneNumber <= 4
        ? " Where termites are heavy (most of zones 1–4), follow the local code's limits on foam below grade and leave an inspection gap."
        : "";
    return flagOf(
      this,
      "caution",
      "Exterior foam without a protective cover at and above grade",
      `The ${nameOf(foam)} is exposed where the wall meets grade: sunlight breaks it down, mowers, backfill and ladders gouge it, and insects tunnel through it. Cover it from the footing to its top edge with a protection board, a cementitious parge or coating on mesh, or flashing, and cap the top edge.${termites}`,
    );
  },
};
