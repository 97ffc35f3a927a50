import { expect, test } from "vitest";
import { flag, layer, of } from "./fixtures";

const ID = "crawlspace-no-class-i-ground-cover";

test("building paper as a crawl-space ground cover: stop — IRC 2021 R408.3 (C2)", () => {
  expect(
    flag(
      of(
        "crawlspace-floor",
        layer("capillary-break", "crushed-stone", 100),
        layer("vapour-retarder", "building-paper-grade-d", 1),
      ),
      ID,
    )?.severity,
  ).toBe("stop");
});

test("must not fire: 10-mil polyethylene", () => {
  expect(
    flag(
      of(
        "crawlspace-floor",
        layer("capillary-break", "crushed-stone", 100),
        layer("vapour-retarder", "polyethylene-sheet-10mil", 0.25),
      ),
      ID,
    ),
  ).toBeUndefined();
});
