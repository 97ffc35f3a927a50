import { expect, test } from "vitest";
import * as u from "~/envelope/units";

test("R-1 = RSI 0.176110 and RSI 1 = R-5.678263 — docs/references.md §2 (D; converter pages C)", () => {
  expect(u.ripToRsi(1)).toBeCloseTo(0.17611, 6);
  expect(u.rsiToRip(1)).toBeCloseTo(5.678263, 4);
});
test("U 1 Btu/(h·ft²·°F) = 5.678263 W/(m²·K) — docs/references.md §2 (D)", () => {
  expect(u.uipToUsi(1)).toBeCloseTo(5.678263, 4);
});
test("1 US perm = 57.2135 ng/(s·m²·Pa) — Perm (unit), Wikipedia (docs/references.md §2, C)", () => {
  expect(u.permToNg(1)).toBe(57.2135);
});
test("1 ng/(s·m²·Pa) = 0.0174784 US perm — Perm (unit), Wikipedia (docs/references.md §2, C)", () => {
  expect(u.ngToPerm(1)).toBeCloseTo(0.0174784, 7);
});
test("1 metric perm = 86.8127 ng = 1.51735 US perm — Perm (unit), Wikipedia (docs/references.md §2, C)", () => {
  expect(u.ngToPerm(86.8127)).toBeCloseTo(1.51735, 4);
});
test("NBC vapour-barrier limit 60 ng ≈ 1.05 US perm — fpis.ca quoting NBC (docs/references.md §2, C2)", () => {
  expect(u.ngToPerm(60)).toBeCloseTo(1.05, 2);
});
test("°F ↔ °C: 32 °F = 0 °C, 70 °F = 21.11 °C, −40 is −40 — definition (psychrolib, C)", () => {
  expect(u.fToC(32)).toBe(0);
  expect(u.fToC(70)).toBeCloseTo(21.111, 3);
  expect(u.cToF(-40)).toBe(-40);
});
test("1 in = 25.4 mm — definition", () => {
  expect(u.mmToIn(25.4)).toBe(1);
  expect(u.inToMm(5.5)).toBeCloseTo(139.7, 9);
});
test("HDD65 = 1.8 × HDD18 (IECC 3600 ↔ 2000 threshold) — docs/references.md §6.3 (C2)", () => {
  expect(u.degreeDaysFToC(3600)).toBe(2000);
  expect(u.degreeDaysCToF(7000)).toBe(12600);
});
test("formatters render both systems from SI", () => {
  expect(u.formatR(u.ripToRsi(21), "ip")).toBe("R-21.0");
  expect(u.formatR(3.7, "si")).toBe("RSI 3.70");
  expect(u.formatTemperature(0, "ip")).toBe("32.0 °F");
  expect(u.formatPermeance(u.permToNg(0.06), "ip")).toBe("0.060 perm");
  expect(u.formatTemperature(-0.01, "si")).toBe("0.0 °C");
});
