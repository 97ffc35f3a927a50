// The inside surface on the coldest path is cold enough, in some month, for mould to grow.
import { flagOf, type Rule } from "./types";

export const interiorSurfaceMould: Rule = {
  id: "interior-surface-mould",
  severity: "caution",
  source: "ISO 13788:2012 §5 (temperature factor against a critical surface humidity of 80 %), C",
  applies: (ctx) => ctx.seasonal !== null && ctx.seasonal.scopeNote === null,
  check(ctx) {
    const surface = ctx.seasonal?.surface;
    if (!surface || surface.pass) return null;
    return flagOf(this, "caution", "Inside surface cold enough for mould", surface.explanation);
  },
};
