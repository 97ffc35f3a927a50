import { expect, test } from "vitest";
import { parsePackRequest } from "~/packs/pack-request";
import { cautionsOf, packKey } from "~/packs/packs.server";
import { formatMoney, formatRecurring } from "~/payments/money";
import { PLANS, setLookupKey } from "~/payments/catalogue.server";

const members = [
  { slug: "a-wall", revisionId: 11, contentHash: "aa" },
  { slug: "b-slab", revisionId: 12, contentHash: "bb" },
];

test("a pack key is stable for the same inputs and changes with revisions, units, zone and materials", () => {
  const ip = { units: "ip" as const, zone: "own" as const };
  const key = packKey("below-grade-essentials", ip, members, "40:2026-12-01");
  expect(key).toMatch(/^packs\/below-grade-essentials\/ip-own-[0-9a-f]{20}\.zip$/);
  expect(packKey("below-grade-essentials", ip, members, "40:2026-12-01")).toBe(key);
  const revised = [members[0], { ...members[1], revisionId: 13, contentHash: "cc" }];
  expect(packKey("below-grade-essentials", ip, revised, "40:2026-12-01")).not.toBe(key);
  expect(packKey("below-grade-essentials", { units: "si", zone: "own" }, members, "40:2026-12-01")).not.toBe(key);
  expect(packKey("below-grade-essentials", { units: "ip", zone: "5A" }, members, "40:2026-12-01")).toMatch(/\/ip-5a-/);
  expect(packKey("below-grade-essentials", ip, members, "41:2026-12-02")).not.toBe(key);
});

test("pack requests accept only known units and climate zones", () => {
  expect(parsePackRequest(new URLSearchParams(""), "ip")).toEqual({ units: "ip", zone: "own" });
  expect(parsePackRequest(new URLSearchParams("units=si&zone=6A"), "ip")).toEqual({ units: "si", zone: "6A" });
  expect(parsePackRequest(new URLSearchParams("units=metric"), "ip")).toBeNull();
  expect(parsePackRequest(new URLSearchParams("zone=../../etc"), "ip")).toBeNull();
});

test("the cautions of a body become one plain sentence per bullet", () => {
  const body =
    "## Why it works\n\nText.\n\n## Cautions\n\n- Keep **foam** covered,\n  inside and out.\n- Drain the footing.\n\n## References\n";
  expect(cautionsOf(body)).toEqual(["Keep foam covered, inside and out.", "Drain the footing."]);
});

test("money is shown from integer cents, plans name their cadence, lookup keys are stable", () => {
  expect(formatMoney(6900, "usd")).toBe("$69.00");
  expect(formatRecurring(1900, "usd", "month")).toBe("$19.00 per month");
  expect(PLANS.map((p) => p.slug)).toEqual(["monthly", "annual"]);
  expect(setLookupKey("below-grade-essentials")).toBe("dryside_set_below_grade_essentials");
});
