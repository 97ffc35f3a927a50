// Open-cell spray foam under a cold roof deck without an interior retarder.
import { retarderClass, dryCupPermeance } from "../vapour";
import { nameOf } from "./helpers";
import { flagOf, type Rule } from "./types";

export const openCellRoofNoRetarder: Rule = {
  id: "open-cell-roof-no-retarder",
  severity: "stop",
  source:
    "IRC 2021 R806.5 (unvented attics, Class II retarder in zones 5–8 with air-permeable insulation), M; common practice",
  applies: (ctx) =>
    ctx.assembly.kind === "roof" &&
    (ctx.site.zoneNumber >= 5 || (ctx.site.zoneNumber === 4 && ctx.site.moisture === "C")),
  check(ctx) {
    // Open-cell foam told from closed-cell by its permeability: above 10 perm per inch.
    const openCell = ctx.assembly.layers.find(
      (l) => l.material.family === "spray-foam" && retarderClass(dryCupPermeance(l.material, 25.4)) === "permeable",
    );
    if (!openCell || (ctx.vapour.interiorClass !== "III" && ctx.vapour.interiorClass !== "none")) return null;
    return flagOf(
      this,
      "stop",
      "Open-cell spray foam under a cold roof without a vapour retarder",
      `Indoor vapour passes the ${nameOf(openCell)} and condenses on the cold roof deck in zone ${ctx.site.zone}. Add a Class II retarder on the interior (e.g. vapour-retarder primer) or use closed-cell foam or rigid insulation above the deck.`,
    );
  },
};
