// A Class I interior retarder on a basement wall traps the soil's moisture against the framing.
import { flagOf, type Rule } from "./types";

export const basementClassIInterior: Rule = {
  id: "basement-class-i-interior",
  severity: "caution",
  source: "IRC 2021 R702.7 exception (basement walls), C2; common practice",
  applies: (ctx) => ctx.assembly.kind === "basement-wall",
  check(ctx) {
    if (ctx.vapour.interiorClass !== "I") return null;
    return flagOf(
      this,
      "caution",
      "Class I vapour retarder on the inside of a basement wall",
      "Basement walls are exempt from the interior vapour retarder rule because they take on moisture from the soil and must dry inward. A sheet on the inside traps it against the framing. Use foam against the concrete and leave the interior open.",
    );
  },
};
