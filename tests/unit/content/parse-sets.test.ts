import { expect, test } from "vitest";
import { ContentError } from "~/content/content-error";
import { parseSets } from "~/content/parse-sets";

const SETS = `- slug: roofs-and-attics
  title: Roofs and attics
  summary: Vented and unvented roofs.
  price_cents: 3900
  currency: usd
- slug: below-grade-essentials
  title: Below-grade essentials
  summary: Basements, crawlspaces and slabs.
  price_cents: 4900
  currency: usd
`;

test("a good sets file parses", () => {
  expect(parseSets("sets.yaml", SETS).map((set) => set.slug)).toEqual(["roofs-and-attics", "below-grade-essentials"]);
});

test("a bad price is reported at its line", () => {
  try {
    parseSets("sets.yaml", SETS.replace("price_cents: 4900", "price_cents: 49.5"));
    throw new Error("expected a ContentError");
  } catch (error) {
    expect(error).toBeInstanceOf(ContentError);
    expect(error).toMatchObject({ file: "sets.yaml", line: 9, field: "[1].price_cents" });
  }
});
