import { expect, test } from "vitest";
import { DEFAULT_UNIT_SYSTEM, UNIT_SYSTEMS, UNIT_SYSTEM_LABELS, parseUnitSystem } from "~/vocabulary/units";

test("two unit systems, inch-pound by default", () => {
  expect(UNIT_SYSTEMS).toEqual(["ip", "si"]);
  expect(DEFAULT_UNIT_SYSTEM).toBe("ip");
  expect(UNIT_SYSTEM_LABELS).toEqual({ ip: "inch-pound", si: "SI" });
});

test("the parser accepts exactly the ids", () => {
  expect(parseUnitSystem("ip")).toBe("ip");
  expect(parseUnitSystem("si")).toBe("si");
});

test("the parser rejects junk with null, so each caller chooses a 400 or the default", () => {
  for (const junk of ["SI", "IP", " si", "metric", "imperial", "", null, undefined, 0, {}, ["si"]]) {
    expect(parseUnitSystem(junk), JSON.stringify(junk)).toBeNull();
  }
});
