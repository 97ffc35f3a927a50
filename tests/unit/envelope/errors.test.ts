import { expect, test } from "vitest";
import { interiorRetarderClass, resolveSite, runSiteCheck, SiteCheckInputError } from "~/envelope";
import type { AssemblyInput, SiteInput } from "~/envelope/types";
import { loadLibrary } from "./library";

const lib = loadLibrary();
const good: AssemblyInput = {
  kind: "above-grade-wall",
  layers: [{ role: "sheathing", material: "osb", thickness_mm: 11.1 }],
};

function errorOf(fn: () => unknown): SiteCheckInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof SiteCheckInputError) return e;
    throw e;
  }
  throw new Error("expected a SiteCheckInputError");
}

test.each([
  [
    "unknown material",
    { kind: "above-grade-wall", layers: [{ role: "x", material: "unobtainium", thickness_mm: 10 }] },
    "layers[0].material",
    /unknown material "unobtainium"/,
  ],
  [
    "zero thickness",
    { kind: "above-grade-wall", layers: [{ role: "x", material: "osb", thickness_mm: 0 }] },
    "layers[0].thickness_mm",
    /above 0 mm/,
  ],
  [
    "negative thickness",
    { kind: "above-grade-wall", layers: [{ role: "x", material: "osb", thickness_mm: -3 }] },
    "layers[0].thickness_mm",
    /above 0 mm/,
  ],
  [
    "NaN thickness",
    { kind: "above-grade-wall", layers: [{ role: "x", material: "osb", thickness_mm: Number.NaN }] },
    "layers[0].thickness_mm",
    /above 0 mm/,
  ],
  [
    "framing fraction above 1",
    {
      kind: "above-grade-wall",
      layers: [
        {
          role: "insulation",
          material: "fibreglass-batt",
          thickness_mm: 89,
          framing: { material: "softwood-lumber", fraction: 1.5 },
        },
      ],
    },
    "layers[0].framing.fraction",
    /from 0 to 1/,
  ],
  [
    "negative framing fraction",
    {
      kind: "above-grade-wall",
      layers: [
        {
          role: "insulation",
          material: "fibreglass-batt",
          thickness_mm: 89,
          framing: { material: "softwood-lumber", fraction: -0.1 },
        },
      ],
    },
    "layers[0].framing.fraction",
    /from 0 to 1/,
  ],
  [
    "unknown framing material",
    {
      kind: "above-grade-wall",
      layers: [
        {
          role: "insulation",
          material: "fibreglass-batt",
          thickness_mm: 89,
          framing: { material: "steel-stud", fraction: 0.2 },
        },
      ],
    },
    "layers[0].framing.material",
    /unknown material/,
  ],
  ["empty stack", { kind: "above-grade-wall", layers: [] }, "layers", /no layers/],
  [
    "unknown kind",
    { kind: "chimney", layers: [{ role: "x", material: "osb", thickness_mm: 10 }] },
    "kind",
    /unknown assembly kind/,
  ],
])("%s throws SiteCheckInputError on the right field", (_name, assembly, field, message) => {
  const e = errorOf(() => runSiteCheck(assembly as AssemblyInput, { zone: "5A" }, lib));
  expect(e.field).toBe(field);
  expect(e.message).toMatch(message);
});

test.each([
  ["indoor RH above 100", { zone: "5A", indoor: { rh: 120 } }, "indoor.rh"],
  ["indoor RH below 0", { zone: "5A", indoor: { rh: -5 } }, "indoor.rh"],
  ["winter RH above 100", { zone: "5A", winter: { rh: 101 } }, "winter.rh"],
  ["summer RH NaN", { zone: "5A", summer: { rh: Number.NaN } }, "summer.rh"],
  ["zone 9", { zone: "9A" }, "zone"],
  ["marine zone 2", { zone: "2C" }, "zone"],
  ["zone text", { zone: "cold" }, "zone"],
  ["zone without regime", { zone: "5" }, "moisture"],
  ["no zone or degree-days", {}, "zone"],
  ["negative degree-days", { hdd18: -10, cdd10: 100 }, "hdd18"],
  ["degree-days without regime", { hdd18: 4500, cdd10: 200 }, "moisture"],
  ["bad edition", { zone: "5A", edition: "IECC 2006" }, "edition"],
])("%s throws SiteCheckInputError on %s", (_name, site, field) => {
  const e = errorOf(() => resolveSite(site as SiteInput));
  expect(e.field).toBe(field);
  expect(e.message.length).toBeGreaterThan(10);
});

test("errors carry no NaN and never fall back to a default silently", () => {
  expect(() => runSiteCheck(good, { zone: "5A", indoor: { t_c: Number.NaN } }, lib)).toThrow(SiteCheckInputError);
  expect(() => interiorRetarderClass({ kind: "roof", layers: [] }, lib)).toThrow(SiteCheckInputError);
});
