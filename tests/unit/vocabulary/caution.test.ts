import { expect, test } from "vitest";
import { LOCAL_CODE_CAUTION } from "~/envelope";
import { SITE_CHECK_CAUTION, STANDING_CAUTION } from "~/vocabulary/caution";

// Safety rule of the product (docs/design.md, "The computation", item 4): cautions defer to the
// local code, the manufacturers and a licensed professional.
test("the standing caution defers to the code adopted where you build, manufacturers' instructions and a licensed design professional", () => {
  expect(STANDING_CAUTION).toMatch(/not approvals/);
  expect(STANDING_CAUTION).toMatch(/the code adopted where you build/);
  expect(STANDING_CAUTION).toMatch(/manufacturers' instructions/);
  expect(STANDING_CAUTION).toMatch(/licensed design professional/);
});

test("the site check's result says what the check is, then carries the same standing caution", () => {
  expect(SITE_CHECK_CAUTION.endsWith(STANDING_CAUTION)).toBe(true);
  expect(SITE_CHECK_CAUTION).toMatch(/steady-state screening/);
  expect(SITE_CHECK_CAUTION).toMatch(/local building official/);
  expect(LOCAL_CODE_CAUTION).toBe(SITE_CHECK_CAUTION);
});
