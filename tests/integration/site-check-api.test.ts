// POST /api/details/:slug/check with the site fields of the detail page's panel (docs/api.md): a
// Canadian site is compared with the NBC 2020 and answered SI first, the seasonal balance and the
// indoor basis come with every result, and a bad CSV is a 400 that names its line.
import { beforeAll, expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { RouteClient } from "../helpers/route-client";

useMigratedDatabase();

// Free details of the demo library (content/details), so no subscription is needed.
const WALL = "wall-2x4-r13-plus-50mm-xps-zone-5";
const BASEMENT = "basement-icf-wall";

beforeAll(async () => {
  const { importContent } = await import("~/catalogue/import.server");
  await importContent("content");
});

async function check(slug: string, body: unknown, type = "application/json"): Promise<Response> {
  const request = new Request(`http://test.local/api/details/${slug}/check`, {
    method: "POST",
    headers: { "Content-Type": type },
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
  const { action } = await import("~/routes/api/detail-check");
  return (await new RouteClient().respond(action, request, { slug })) as Response;
}

const CSV_ROWS = [
  "month,temperature_c,rh_percent",
  "1,-18,78",
  "2,-15,76",
  "3,-7,74",
  "4,3,65",
  "5,11,60",
  "6,17,65",
  "7,20,68",
  "8,19,70",
  "9,13,72",
  "10,5,76",
  "11,-4,82",
  "12,-14,80",
];

test("a Canadian site by province is compared with NBC 2020 rows and answered in SI first", async () => {
  const response = await check(WALL, { country: "CA", province: "MB", units: "ip" });
  expect(response.status).toBe(200);
  const { result, units } = await response.json();
  expect(units).toBe("si");
  expect(result.site.country).toBe("CA");
  expect(result.site.preferredUnits).toBe("SI");
  expect(result.site.canada).toMatchObject({ province: "MB", hddSource: "province", edition: "NBC 2020" });
  expect(result.code.edition).toBe("NBC 2020");
  // The three NBC rows of docs/site-climate.md: 9.36.2.6 effective RSI, 9.25.4 and 9.25.5.2.
  const ids = result.code.rows.map((row: { id: string }) => row.id);
  expect(ids).toEqual(expect.arrayContaining(["nbc-9-36-2-6", "nbc-9-25-4", "nbc-9-25-5-2"]));
});

test("an NBC zone alone, or HDD below 18 °C, is a Canadian site too", async () => {
  const byZone = await (await check(WALL, { country: "CA", nbcZone: "7A" })).json();
  expect(byZone.result.site.canada).toMatchObject({ nbcZone: "7A", hddSource: "nbc-zone" });
  const byHdd = await (await check(WALL, { country: "CA", hdd18: 4500 })).json();
  expect(byHdd.result.site.canada).toMatchObject({ hdd18: 4500, hddSource: "given" });
});

test("every result carries the seasonal balance, the indoor basis, the country, the code and both paths", async () => {
  const response = await check(WALL, { zone: "6A", units: "ip" });
  expect(response.status).toBe(200);
  const { result, units } = await response.json();
  expect(units).toBe("ip");
  const seasonal = result.seasonal;
  expect(seasonal.months).toHaveLength(12);
  expect(["no-condensation", "dries-within-year", "accumulates"]).toContain(seasonal.verdict);
  expect(typeof seasonal.peak_g_m2).toBe("number");
  expect(seasonal).toHaveProperty("driesOutMonth");
  expect(seasonal.surface).toMatchObject({ pass: expect.any(Boolean), fRsi: expect.any(Number) });
  expect(seasonal.climate.source).toBe("generated");
  expect(seasonal.climate.note).not.toBe("");
  // The default indoor method is named in the sentence the page prints.
  expect(result.site.indoor.basis).toMatch(
    /^indoor 21 °C \/ [\d.]+ % RH, by the ASHRAE 160 simplified method at −?[\d.]+ °C outdoors$/,
  );
  expect(result.site.country).toBe("US");
  expect(result.code.edition).toMatch(/^IECC\/IRC/);
  expect(result.profiles.winter.path).toBe("clear-cavity");
  expect(result.profiles.winter.studPath.interfaces_t_c).toHaveLength(result.profiles.winter.interfaces.length);
});

test("a basement wall reports the upper-wall cases beside deep ground", async () => {
  const { result } = await (await check(BASEMENT, { zone: "5A" })).json();
  expect(result.profiles.upperWall.aboveGrade.exterior.label).toBe("outdoor air above grade");
  expect(result.profiles.upperWall.frostDepth.exterior.label).toBe("soil at frost depth");
});

test("another indoor method is used and said so; a typed year and a CSV year are used as given", async () => {
  const byClass = await (await check(WALL, { zone: "5A", indoorMethod: "iso-13788-class-4" })).json();
  expect(byClass.result.site.indoor.method).toBe("iso-13788-class-4");
  expect(byClass.result.site.indoor.basis).toMatch(/ISO 13788 humidity class 4/);

  const months = CSV_ROWS.slice(1).map((row) => {
    const [, t, rh] = row.split(",");
    return { t: Number(t), rh: Number(rh) };
  });
  const typed = await (await check(WALL, { zone: "6A", units: "si", yearSource: "typed", yearMonths: months })).json();
  expect(typed.result.seasonal.climate.source).toBe("typed");
  expect(typed.result.seasonal.months[0].outdoor.t_c).toBe(-18);

  const csv = await (await check(WALL, { zone: "6A", yearSource: "csv", yearCsv: CSV_ROWS.join("\n") })).json();
  expect(csv.result.seasonal.climate.source).toBe("csv");
  expect(csv.result.seasonal.months[6].outdoor).toMatchObject({ t_c: 20, rh: 68 });
});

test("a bad CSV answers 400 with the line in the reason and on the yearCsv field", async () => {
  const bad = [...CSV_ROWS];
  bad[5] = "4,11,60"; // line 6 repeats April
  const response = await check(WALL, { zone: "6A", yearSource: "csv", yearCsv: bad.join("\n") });
  expect(response.status).toBe(400);
  const body = await response.json();
  expect(body.error).toBe("invalid_site");
  expect(body.fieldErrors).toEqual({ yearCsv: ["Line 6: Apr appears twice"] });
  expect(body.message).toMatch(/line 6/i);
});

test("the same CSV sent as a form file is read as text, and a body that is not JSON is a 400", async () => {
  const form = new FormData();
  form.append("zone", "6A");
  form.append("yearSource", "csv");
  form.append("yearCsv", new Blob([CSV_ROWS.join("\n")], { type: "text/csv" }), "year.csv");
  const request = new Request(`http://test.local/api/details/${WALL}/check`, { method: "POST", body: form });
  const { action } = await import("~/routes/api/detail-check");
  const response = (await new RouteClient().respond(action, request, { slug: WALL })) as Response;
  expect(response.status).toBe(200);
  expect((await response.json()).result.seasonal.climate.source).toBe("csv");

  const notJson = await check(WALL, "{zone: 6A");
  expect(notJson.status).toBe(400);
  expect((await notJson.json()).error).toBe("invalid_json");
  const noSite = await check(WALL, { country: "CA" });
  expect(noSite.status).toBe(400);
  expect((await noSite.json()).fieldErrors.province[0]).toMatch(/province/);
});
