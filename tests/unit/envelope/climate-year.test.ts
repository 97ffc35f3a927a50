import { expect, test } from "vitest";
import { resolveSite } from "~/envelope/climate";
import {
  ClimateCsvError,
  generateClimateYear,
  monthlyDegreeDays,
  parseClimateCsv,
  resolveClimateYear,
  validateMonths,
} from "~/envelope/climate-year";
import { SiteCheckInputError } from "~/envelope/errors";

const good = `month,temperature_c,rh_percent
1,-10.2,82
2,-8.5,80
3,-2.1,76
4,5.9,70
5,12.8,68
6,17.9,70
7,20.8,72
8,19.6,74
9,14.7,76
10,8.1,78
11,1.2,82
12,-6.4,84
`;

test("a 12-row CSV reads month by month, January first", () => {
  const months = parseClimateCsv(good);
  expect(months).toHaveLength(12);
  expect(months[0]).toEqual({ month: 1, name: "Jan", t_c: -10.2, rh: 82 });
  expect(months[11]).toEqual({ month: 12, name: "Dec", t_c: -6.4, rh: 84 });
});

test("the header is optional; month names, any order, CRLF, comments and blank lines are accepted", () => {
  const rows = good
    .trim()
    .split("\n")
    .slice(1)
    .reverse()
    .map((r, i) => (i === 0 ? r.replace(/^12,/, "Dec,") : r));
  const months = parseClimateCsv(`\uFEFF# site normals\r\n\r\n${rows.join("\r\n")}\r\n`);
  expect(months.map((m) => m.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
  expect(months[11].t_c).toBe(-6.4);
});

test.each([
  ["a short row", good.replace("3,-2.1,76", "3,-2.1"), 4, "expected 3 values"],
  ["a bad month", good.replace("5,12.8,68", "13,12.8,68"), 6, "is not a month"],
  ["a repeated month", good.replace("5,12.8,68", "4,12.8,68"), 6, "Apr appears twice"],
  ["text for a temperature", good.replace("7,20.8,72", "7,warm,72"), 8, 'temperature "warm"'],
  ["an RH above 100", good.replace("9,14.7,76", "9,14.7,176"), 10, 'relative humidity "176"'],
  ["an RH of 0", good.replace("9,14.7,76", "9,14.7,0"), 10, 'relative humidity "0"'],
])("a CSV with %s names the line", (_, text, line, message) => {
  try {
    parseClimateCsv(text);
    expect.unreachable();
  } catch (e) {
    expect(e).toBeInstanceOf(ClimateCsvError);
    expect(e).toBeInstanceOf(SiteCheckInputError);
    expect((e as ClimateCsvError).line).toBe(line);
    expect((e as ClimateCsvError).field).toBe("year.csv");
    expect((e as Error).message).toContain(`line ${line}: `);
    expect((e as Error).message).toContain(message);
  }
});

test("a CSV missing months says which", () => {
  expect(() => parseClimateCsv(good.replace("6,17.9,70\n", "").replace("8,19.6,74\n", ""))).toThrow("missing Jun, Aug");
  expect(() => parseClimateCsv("")).toThrow(ClimateCsvError);
});

test("typed months: exactly 12, each a temperature and an RH", () => {
  expect(validateMonths(Array(12).fill({ t_c: 5, rh: 60 }))[6]).toEqual({ month: 7, name: "Jul", t_c: 5, rh: 60 });
  expect(() => validateMonths(Array(11).fill({ t_c: 5, rh: 60 }))).toThrow("give exactly 12 months");
  try {
    validateMonths([...Array(11).fill({ t_c: 5, rh: 60 }), { t_c: 5, rh: 120 }]);
    expect.unreachable();
  } catch (e) {
    expect((e as SiteCheckInputError).field).toBe("year.months[11].rh");
  }
});

test("a generated year reproduces the site's degree-days month by month and is labelled generated", () => {
  // Fit check against its own definition (D): Σ days·max(0, 18 − T) and Σ days·max(0, T − 10).
  const site = resolveSite({ zone: "6A", hdd18: 4500, cdd10: 900 });
  const y = generateClimateYear(site);
  expect(y.source).toBe("generated");
  expect(y.note).toMatch(/^Generated: /);
  expect(y.note).toContain("fitted to HDD18 4500 and CDD10 900");
  const dd = monthlyDegreeDays(y.months.map((m) => m.t_c));
  expect(dd.hdd18).toBeGreaterThan(4500 * 0.98);
  expect(dd.hdd18).toBeLessThan(4500 * 1.02);
  expect(dd.cdd10).toBeGreaterThan(900 * 0.95);
  expect(dd.cdd10).toBeLessThan(900 * 1.05);
  // Coldest in January, warmest in July; RH from the winter design RH to the summer one.
  expect(Math.min(...y.months.map((m) => m.t_c))).toBe(y.months[0].t_c);
  expect(Math.max(...y.months.map((m) => m.t_c))).toBe(y.months[6].t_c);
  expect(y.months[0].rh).toBe(site.winter.rh);
  expect(y.months[6].rh).toBe(site.summer.rh);
});

test("without degree-days the cold end of the zone's band is used, and said", () => {
  const y = generateClimateYear(resolveSite({ zone: "5A" }));
  expect(y.note).toContain("HDD18 4000 (cold end of zone 5)");
  const dd = monthlyDegreeDays(y.months.map((m) => m.t_c));
  expect(Math.abs(dd.hdd18 - 4000)).toBeLessThan(40);
});

test("resolveClimateYear: typed months win, then a CSV, else generated", () => {
  const site = resolveSite({ zone: "5A" });
  expect(resolveClimateYear({ months: Array(12).fill({ t_c: 0, rh: 80 }) }, site).source).toBe("typed");
  expect(resolveClimateYear({ csv: good }, site).source).toBe("csv");
  expect(resolveClimateYear(undefined, site).source).toBe("generated");
});
