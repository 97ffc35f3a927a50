// The site form beyond a zone: Canadian sites, the indoor humidity method and the site year. The
// panel (through conform) and the check API parse with this one schema, so the browser and the
// server report the same field errors; the CSV format is docs/site-climate.md's.
import { parseWithZod } from "@conform-to/zod/v4";
import { describe, expect, test } from "vitest";
import { formFieldOf, siteFormSchema, siteInputFromForm } from "~/catalogue/site-form";
import { indoorMethodChoices } from "~/envelope/indoor-climate";

function posted(fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  return form;
}

function parse(fields: Record<string, string>) {
  return parseWithZod(posted({ units: "ip", ...fields }), { schema: siteFormSchema });
}

const CSV = [
  "month,temperature_c,rh_percent",
  ...Array.from({ length: 12 }, (_, i) => `${i + 1},${i < 3 ? -10 : 12},80`),
].join("\n");

describe("Canadian sites", () => {
  test("a province alone is a site, entered in SI whatever the viewer's units", () => {
    const submission = parse({ country: "CA", province: "MB", zone: "", hdd: "" });
    expect(submission.status === "success" && siteInputFromForm(submission.value)).toEqual({
      country: "CA",
      province: "MB",
    });
  });
  test("an NBC zone or heating degree-days below 18 °C go to the engine as they are", () => {
    const byZone = parse({ country: "CA", nbcZone: "7A" });
    expect(byZone.status === "success" && siteInputFromForm(byZone.value)).toEqual({ country: "CA", nbcZone: "7A" });
    const byHdd = parse({ country: "CA", hdd18: "5120" });
    expect(byHdd.status === "success" && siteInputFromForm(byHdd.value)).toEqual({ country: "CA", hdd18: 5120 });
  });
  test("none of the three asks for one, on the province field", () => {
    const submission = parse({ country: "CA" });
    expect(submission.status === "error" && submission.error).toEqual({
      province: ["Choose a province or territory, an NBC zone, or enter heating degree-days below 18 °C"],
    });
  });
  test("an NBC zone that does not exist is refused on its field", () => {
    const submission = parse({ country: "CA", nbcZone: "9" });
    expect(submission.status === "error" && Object.keys(submission.error ?? {})).toEqual(["nbcZone"]);
  });
});

describe("indoor humidity method", () => {
  test("the default method is the first choice and is left to the engine; another is passed by id", () => {
    const first = indoorMethodChoices()[0].id;
    const byDefault = parse({ zone: "5A", indoorMethod: first });
    expect(byDefault.status === "success" && siteInputFromForm(byDefault.value)).toEqual({ zone: "5A" });
    const other = parse({ zone: "5A", indoorMethod: "iso-13788-class-4" });
    expect(other.status === "success" && siteInputFromForm(other.value)).toEqual({
      zone: "5A",
      indoor: { rh: undefined, t_c: undefined, method: "iso-13788-class-4" },
    });
  });
  test("an unknown method is a field error", () => {
    const submission = parse({ zone: "5A", indoorMethod: "guess" });
    expect(submission.status === "error" && Object.keys(submission.error ?? {})).toEqual(["indoorMethod"]);
  });
});

describe("the site year", () => {
  test("generated is the default: no year goes to the engine", () => {
    const submission = parse({ zone: "6A" });
    expect(submission.status === "success" && submission.value.yearSource).toBe("generated");
    expect(submission.status === "success" && siteInputFromForm(submission.value).year).toBeUndefined();
  });
  test("twelve typed months in °F reach the engine in °C (32 °F = 0 °C, 50 °F = 10 °C)", () => {
    const fields: Record<string, string> = { zone: "6A", yearSource: "typed" };
    for (let i = 0; i < 12; i++)
      Object.assign(fields, { [`yearMonths[${i}].t`]: i % 2 ? "50" : "32", [`yearMonths[${i}].rh`]: "75" });
    const submission = parse(fields);
    expect(submission.status).toBe("success");
    const year = submission.status === "success" ? siteInputFromForm(submission.value).year : undefined;
    expect(year?.months?.[0]).toEqual({ t_c: 0, rh: 75 });
    expect(year?.months?.[1]).toEqual({ t_c: 10, rh: 75 });
    expect(year?.months).toHaveLength(12);
  });
  test("a typed year with a month missing says which, on that month's field, and keeps what was typed", () => {
    const fields: Record<string, string> = { zone: "6A", yearSource: "typed" };
    for (let i = 0; i < 11; i++) Object.assign(fields, { [`yearMonths[${i}].t`]: "20", [`yearMonths[${i}].rh`]: "60" });
    fields["yearMonths[3].rh"] = "140";
    const submission = parse(fields);
    const errors = submission.status === "error" ? (submission.error ?? {}) : {};
    expect(Object.keys(errors).sort()).toEqual(["yearMonths[11].rh", "yearMonths[11].t", "yearMonths[3].rh"]);
    expect(errors["yearMonths[3].rh"]).toEqual(["Month 4: relative humidity above 0 and at most 100 %"]);
    expect(submission.reply().initialValue).toMatchObject({
      yearMonths: expect.arrayContaining([{ t: "20", rh: "140" }]),
    });
  });
  test("a good CSV goes to the engine as its text", () => {
    const submission = parse({ zone: "6A", yearSource: "csv", yearCsv: CSV });
    expect(submission.status === "success" && siteInputFromForm(submission.value).year).toEqual({ csv: CSV });
  });
  test("a bad CSV is a field error that names the line, and the text is kept", () => {
    const bad = CSV.replace("5,12,80", "4,12,80");
    const submission = parse({ zone: "6A", yearSource: "csv", yearCsv: bad });
    expect(submission.status === "error" && submission.error).toEqual({ yearCsv: ["Line 6: Apr appears twice"] });
    expect(submission.reply().initialValue).toMatchObject({ yearCsv: bad });
  });
  test("an empty CSV asks for the twelve rows", () => {
    const submission = parse({ zone: "6A", yearSource: "csv", yearCsv: "" });
    expect(submission.status === "error" && submission.error?.yearCsv?.[0]).toMatch(/empty; it needs 12 rows/);
  });
});

test("engine input paths map back to the form's fields", () => {
  expect(formFieldOf("year.csv")).toBe("yearCsv");
  expect(formFieldOf("year.months[11].rh")).toBe("yearMonths[11].rh");
  expect(formFieldOf("hdd18", "CA")).toBe("hdd18");
  expect(formFieldOf("hdd18", "US")).toBe("hdd");
  expect(formFieldOf("moisture")).toBe("moisture");
});
