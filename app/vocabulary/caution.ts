// The standing caution: one wording, shown by the app shell on every page, carried by every API
// answer and site-check result, and printed on every PDF sheet and pack. It defers to the local code,
// the product manufacturers and a licensed design professional (docs/design.md, "The computation", item 4).

export const STANDING_CAUTION =
  "Reference designs and screenings, not approvals: check every detail against the code adopted where you build, " +
  "the manufacturers' instructions for each product, and a licensed design professional where one is required.";

/** What the site check is, said before the standing caution on every result. */
export const SITE_CHECK_SCOPE =
  "This check is a steady-state screening (design-day profiles and a monthly moisture balance) against the tables named; " +
  "it does not replace the local building official or a transient hygrothermal analysis.";

/** The caution a site-check result carries: its scope, then the standing caution. */
export const SITE_CHECK_CAUTION = `${SITE_CHECK_SCOPE} ${STANDING_CAUTION}`;
