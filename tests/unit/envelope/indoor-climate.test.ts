import { expect, test } from "vitest";
import {
  DEFAULT_INDOOR_METHOD,
  INDOOR_METHODS,
  indoorHumidity,
  indoorMethodChoices,
  indoorTemperature,
} from "~/envelope/indoor-climate";
import { resolveSite } from "~/envelope/climate";
import { saturationPressure } from "~/envelope/psychrometrics";
import { SiteCheckInputError } from "~/envelope/errors";

const rhAt = (method: (typeof INDOOR_METHODS)[number], t: number, rh = 80, indoor = 21) =>
  indoorHumidity(method, { t_c: t, rh }, indoor).rh;

test("ASHRAE 160 simplified method: 40 % at ≤ −10 °C, 70 % at ≥ 20 °C, linear between (ASHRAE 160-2016 §4.3.1.1, from memory)", () => {
  expect(rhAt("ashrae-160-simplified", -30)).toBe(40);
  expect(rhAt("ashrae-160-simplified", -10)).toBe(40);
  expect(rhAt("ashrae-160-simplified", 5)).toBeCloseTo(55, 9);
  expect(rhAt("ashrae-160-simplified", 20)).toBe(70);
  expect(rhAt("ashrae-160-simplified", 30)).toBe(70);
});

test("EN 15026 Annex C: normal occupancy 30 → 60 %, high occupancy 40 → 70 %, over −10…20 °C (EN 15026:2007 Annex C, from memory)", () => {
  expect(rhAt("en-15026-normal", -15)).toBe(30);
  expect(rhAt("en-15026-normal", 5)).toBeCloseTo(45, 9);
  expect(rhAt("en-15026-normal", 25)).toBe(60);
  expect(rhAt("en-15026-high", -15)).toBe(40);
  expect(rhAt("en-15026-high", 25)).toBe(70);
});

test("ISO 13788 humidity classes: Δp 270/540/810/1080/1350 Pa at ≤ 0 °C, to 0 at 20 °C, × 1.10 (ISO 13788:2012 Annex A, from memory)", () => {
  const pOut = 0.8 * saturationPressure(-5);
  const dp = [270, 540, 810, 1080, 1350];
  dp.forEach((d, i) => {
    const s = indoorHumidity(`iso-13788-class-${i + 1}` as (typeof INDOOR_METHODS)[number], { t_c: -5, rh: 80 }, 20);
    expect(s.p_v_pa).toBeCloseTo(pOut + 1.1 * d, 6);
  });
  // Half way (10 °C) the excess is half.
  const mid = indoorHumidity("iso-13788-class-3", { t_c: 10, rh: 70 }, 20);
  expect(mid.p_v_pa).toBeCloseTo(0.7 * saturationPressure(10) + 1.1 * 405, 6);
  // Capped at saturation indoors.
  expect(indoorHumidity("iso-13788-class-5", { t_c: 19, rh: 100 }, 20).rh).toBeLessThanOrEqual(100);
});

test("the default is one named method, offered first among the choices", () => {
  expect(DEFAULT_INDOOR_METHOD).toBe("ashrae-160-simplified");
  const choices = indoorMethodChoices();
  expect(choices[0].id).toBe(DEFAULT_INDOOR_METHOD);
  expect(choices.map((c) => c.id).sort()).toEqual([...INDOOR_METHODS].sort());
  for (const c of choices) expect(c.source).toMatch(/from memory/);
});

test("a chosen method sets the design-day indoor RH and the sentence that says so", () => {
  const s = resolveSite({ zone: "5A", winter: { t_c: -20 }, indoor: { method: "en-15026-normal" } });
  expect(s.indoor.rh).toBe(30);
  expect(s.indoor.method).toBe("en-15026-normal");
  expect(s.indoor.basis).toBe("indoor 21 °C / 30 % RH, by the EN 15026 normal occupancy at −20 °C outdoors");
});

test("an unknown method is a field error", () => {
  expect(() => resolveSite({ zone: "5A", indoor: { method: "damp" as never } })).toThrow(SiteCheckInputError);
  try {
    resolveSite({ zone: "5A", indoor: { method: "damp" as never } });
  } catch (e) {
    expect((e as SiteCheckInputError).field).toBe("indoor.method");
  }
});

test("indoor temperature: heated to the heating set point, cooled to the cooling set point, free between", () => {
  expect(indoorTemperature(-10, 21, 24)).toBe(21);
  expect(indoorTemperature(22.5, 21, 24)).toBe(22.5);
  expect(indoorTemperature(30, 21, 24)).toBe(24);
});
