// A sealed crawl space needs a Class I ground cover.
import { classOf } from "./helpers";
import { flagOf, type Rule } from "./types";

export const crawlspaceNoClassIGroundCover: Rule = {
  id: "crawlspace-no-class-i-ground-cover",
  severity: "stop",
  source: "IRC 2021 R408.3 item 1, C2",
  applies: (ctx) => ctx.assembly.kind === "crawlspace-floor",
  check(ctx) {
    const a = ctx.assembly;
    if (a.layers.some((l) => classOf(a, l) === "I")) return null;
    return flagOf(
      this,
      "stop",
      "No Class I ground cover in the crawl space",
      "A sealed (unvented) crawl space needs a continuous Class I vapour retarder over the earth, joints lapped 6 in and sealed, run 6 in up the stem walls and attached.",
    );
  },
};
