// The site check on a detail page for a Canadian site: the panel takes a province, the results say
// the NBC 2020 was compared, read SI first, and show the 12-month chart of the seasonal balance. A bad
// CSV year is a field error naming its line, and what was pasted stays in the box.
import { afterAll, beforeAll, expect, test } from "vitest";
import { mkdirSync } from "node:fs";
import type { BrowserContext } from "playwright-core";
import { baseUrl, openBrowser, screenshot } from "./browser";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser.close();
});

// A free wall of the demo library (content/details).
const WALL = "wall-2x4-r13-plus-50mm-xps-zone-5";
const ROWS = [
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

test("a Canadian site shows the NBC 2020 rows, SI first, and the 12-month chart", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/details/${WALL}`);
  const panel = page.getByTestId("site-check-panel");
  await panel.getByTestId("site-check-results").waitFor();
  // The generated year is the default and says so.
  expect(await panel.getByTestId("climate-year").getAttribute("data-source")).toBe("generated");
  expect(await panel.getByTestId("climate-year").textContent()).toMatch(/generated/i);
  // The "checked at" sentence is the engine's, naming the default method.
  expect(await panel.getByTestId("indoor-basis").textContent()).toMatch(
    /^Checked at indoor 21 °C \/ [\d.]+ % RH, by the ASHRAE 160 simplified method/,
  );

  await panel.getByLabel("Canada (NBC 2020, SI)").check();
  await panel.getByTestId("canadian-site").waitFor();
  await panel.locator('select[name="province"]').selectOption("MB");
  await panel.getByTestId("run-check").click();
  await page.waitForFunction(() => document.querySelector('[data-testid="code-edition"]')?.textContent === "NBC 2020");
  const results = panel.getByTestId("site-check-results");
  expect(await results.getAttribute("data-units")).toBe("si");
  expect(await panel.getByTestId("effective-r").textContent()).toMatch(/^RSI /);
  const rows = await panel
    .getByTestId("code-rows")
    .locator("tbody tr")
    .evaluateAll((trs) => trs.map((tr) => tr.getAttribute("data-row")));
  expect(rows).toEqual(expect.arrayContaining(["nbc-9-36-2-6", "nbc-9-25-4", "nbc-9-25-5-2"]));
  expect(await panel.getByTestId("site-line").textContent()).toMatch(/MB, NBC zone \w+/);

  const chart = panel.getByTestId("seasonal-chart");
  const wide = chart.locator('svg[data-layout="wide"]');
  await wide.waitFor();
  for (const month of ["Jan", "Jun", "Dec"]) expect(await wide.textContent()).toContain(month);
  expect(await panel.getByTestId("seasonal-verdict").textContent()).toMatch(
    /^(Stays dry all year|Dries within the year|Accumulates year on year)$/,
  );
  await screenshot(page, "site-check-canada");
  mkdirSync("test-results/screenshots", { recursive: true });
  await panel.getByTestId("seasonal").screenshot({ path: "test-results/screenshots/seasonal-canada.png" });
  await page.close();
});

test("a bad CSV year is shown on its field with the line, and the pasted text is kept", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/details/${WALL}`);
  const panel = page.getByTestId("site-check-panel");
  await panel.getByTestId("site-check-results").waitFor();
  await panel.getByLabel("A 12-row CSV file").check();
  const bad = [...ROWS];
  bad[5] = "4,11,60";
  const box = panel.locator('textarea[name="yearCsv"]');
  await box.fill(bad.join("\n"));
  await panel.getByTestId("run-check").click();
  await page.waitForFunction(() =>
    /Line 6: Apr appears twice/.test(document.querySelector('[data-testid="csv-year"]')?.textContent ?? ""),
  );
  expect(await box.inputValue()).toBe(bad.join("\n"));
  expect(await box.getAttribute("aria-invalid")).toBe("true");
  mkdirSync("test-results/screenshots", { recursive: true });
  await panel.getByTestId("csv-year").screenshot({ path: "test-results/screenshots/site-form-csv-error.png" });

  // Fixed, the year is used as given.
  await box.fill(ROWS.join("\n"));
  await panel.getByTestId("run-check").click();
  await page.waitForFunction(
    () => document.querySelector('[data-testid="climate-year"]')?.getAttribute("data-source") === "csv",
  );
  await page.close();
});

test("a Canadian site in the address (the form sent without JavaScript) opens with its own fields and the NBC rows", async () => {
  const context = await openBrowser();
  const page = await context.newPage();
  await page.route("**/*.js", (route) => route.abort());
  await page.goto(`${baseUrl()}/details/${WALL}?country=CA&nbcZone=7A&indoorMethod=iso-13788-class-3`);
  const panel = page.getByTestId("site-check-panel");
  expect(await panel.getByTestId("code-edition").textContent()).toBe("NBC 2020");
  expect(await panel.locator('input[name="country"][value="CA"]').isChecked()).toBe(true);
  // The radio shows the Canadian fields by CSS alone, and hides the US ones.
  expect(await panel.getByTestId("canadian-site").isVisible()).toBe(true);
  expect(await panel.getByTestId("us-site").isVisible()).toBe(false);
  expect(await panel.locator('select[name="nbcZone"]').inputValue()).toBe("7A");
  expect(await panel.getByTestId("indoor-basis").textContent()).toMatch(/ISO 13788 humidity class 3/);
  mkdirSync("test-results/screenshots", { recursive: true });
  await panel.locator("form").screenshot({ path: "test-results/screenshots/site-form-canada.png" });
  await page.close();
  await context.close();
});

test("a basement wall shows the top of the wall beside deep ground, and the wall's stud path beside its clear cavity", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/details/basement-icf-wall?zone=6A`);
  const upper = page.getByTestId("upper-wall");
  await upper.waitFor();
  for (const id of ["case-above-grade", "case-frost-depth", "case-deep-ground"])
    expect(await upper.getByTestId(id).isVisible()).toBe(true);
  await page.goto(`${baseUrl()}/details/${WALL}?zone=5A`);
  const paths = page.getByTestId("paths-winter");
  await paths.waitFor();
  expect(await paths.locator("thead").textContent()).toMatch(/Clear cavity.*Through framing/);
  await page.close();
});

test("at phone width the typed year fits the screen", async () => {
  const context = await openBrowser();
  const page = await context.newPage();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(`${baseUrl()}/details/${WALL}`);
  const panel = page.getByTestId("site-check-panel");
  await panel.getByTestId("site-check-results").waitFor();
  await panel.getByLabel("Twelve monthly means, typed").check();
  await panel.getByTestId("typed-year").waitFor();
  expect(await panel.locator('input[name="yearMonths[11].rh"]').isVisible()).toBe(true);
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(1);
  mkdirSync("test-results/screenshots", { recursive: true });
  await panel.locator("form").screenshot({ path: "test-results/screenshots/site-form-typed-phone.png" });
  await page.close();
  await context.close();
});
