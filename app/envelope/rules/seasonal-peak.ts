// The monthly balance dries within the year, but the wet season holds a lot of water at one interface.
import { flagOf, type Rule } from "./types";

/** Above this much condensate at the peak, drying within the year is not enough comfort
 * (DIN 4108-3:2018 §5.3 limits condensate to 1.0 kg/m², and 0.5 kg/m² where it meets a layer that
 * does not absorb water; from memory). The lower limit is used: it errs on the safe side. */
export const SEASONAL_PEAK_LIMIT_G_M2 = 500;

export const seasonalPeak: Rule = {
  id: "seasonal-peak",
  severity: "caution",
  source:
    "DIN 4108-3:2018 §5.3 condensate limits (0.5 kg/m² at a non-absorbent layer), from memory; ISO 13788:2012 monthly method",
  applies: (ctx) => ctx.seasonal !== null && ctx.seasonal.scopeNote === null,
  check(ctx) {
    const s = ctx.seasonal;
    if (s?.verdict !== "dries-within-year" || s.peak_g_m2 <= SEASONAL_PEAK_LIMIT_G_M2) return null;
    const where = s.criticalInterface?.label ?? "an interface";
    return flagOf(
      this,
      "caution",
      "A wet season at one interface",
      `The monthly balance dries out within the year, but ${Math.round(s.peak_g_m2)} g/m² collects at ${where} first, more than the ${SEASONAL_PEAK_LIMIT_G_M2} g/m² a non-absorbent layer is usually allowed to hold. Wood and paper-faced layers at that interface stay wet for months: warm it or slow the vapour reaching it.`,
    );
  },
};
