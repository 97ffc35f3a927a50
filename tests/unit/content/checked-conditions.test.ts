// Only the site check says what conditions it ran at (site.indoor.basis, docs/site-climate.md and
// docs/content-format.md "Conventions"): no detail's text may state the indoor condition of a check,
// because it changes with the indoor method and the site.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";

const DIR = "content/details";
// "(indoor 21 °C / 40 %)", "checked at 21 °C / 40 % RH": a temperature and a humidity given as the check's.
const STATED_CONDITION =
  /(checked at|check(?:s|ed)? (?:ran|runs) at|indoor)\s*\d+(?:\.\d+)?\s*°[CF]\s*\/\s*\d+(?:\.\d+)?\s*%/i;

test("no detail states the indoor condition a site check ran at", () => {
  const offenders = readdirSync(DIR)
    .filter((name) => name.endsWith(".md"))
    .flatMap((name) =>
      readFileSync(join(DIR, name), "utf8")
        .split("\n")
        .map((line, i) => ({ at: `${name}:${i + 1}`, line })),
    )
    .filter(({ line }) => STATED_CONDITION.test(line))
    .map(({ at }) => at);
  expect(offenders).toEqual([]);
});
