import { afterAll, beforeAll, expect, test } from "vitest";
import { mkdirSync } from "node:fs";
import type { BrowserContext, Locator, Page } from "playwright-core";
import { PROFILE_CHART_WIDTHS } from "~/components/profile-chart";
import { baseUrl, openBrowser, screenshot } from "./browser";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser.close();
});

async function resultCount(page: Page): Promise<number> {
  const text = (await page.getByTestId("result-count").textContent()) ?? "";
  return Number(/(\d+)/.exec(text)?.[1] ?? NaN);
}

test("a builder narrows the catalogue by facet and by text, and the URL keeps the search", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/details`);
  const all = await resultCount(page);
  expect(all).toBeGreaterThanOrEqual(36);
  await screenshot(page, "catalogue-desktop");

  // Facet: a zone checkbox filters without a full page load.
  const marker = await page.evaluate(() => ((window as unknown as { __marker: number }).__marker = Math.random()));
  await page.locator('input[name="zone"][value="5A"]').check();
  await page.waitForURL(/zone=5A/);
  await page.waitForFunction((before) => {
    const text = document.querySelector('[data-testid="result-count"]')?.textContent ?? "";
    return Number(/(\d+)/.exec(text)?.[1]) < before;
  }, all);
  expect(await page.evaluate(() => (window as unknown as { __marker?: number }).__marker)).toBe(marker);
  const inZone = await resultCount(page);
  const facetCount = await page.locator('[data-facet-count="zone:5A"]').textContent();
  expect(Number(facetCount)).toBe(inZone);

  // Text: typing offers suggestions; Enter searches.
  const box = page.locator('input[type="search"]');
  await box.fill("crawl");
  await page.getByTestId("suggestions").waitFor();
  await box.fill("crawlspace");
  await box.press("Enter");
  await page.waitForURL(/q=crawlspace/);
  await page.waitForFunction(() =>
    /matching/.test(document.querySelector('[data-testid="result-count"]')?.textContent ?? ""),
  );
  const cards = await page.getByTestId("detail-card").count();
  expect(cards).toBeGreaterThan(0);
  expect(new URL(page.url()).searchParams.getAll("zone")).toEqual(["5A"]);

  // The same URL opened fresh shows the same search (shareable).
  const shared = await browser.newPage();
  await shared.goto(page.url());
  expect(await resultCount(shared)).toBe(await resultCount(page));
  await shared.close();
  await page.close();
});

test("the catalogue works without JavaScript: filters apply through the form", async () => {
  const context = await openBrowser();
  const page = await context.newPage();
  await page.route("**/*.js", (route) => route.abort());
  await page.goto(`${baseUrl()}/details?tier=free`);
  const free = await resultCount(page);
  expect(free).toBeGreaterThan(0);
  await page.close();
  await context.close();
});

test("a free detail opens with its drawing, layer table and site check; the check and units update in place", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/details?tier=free&assembly=above-grade-wall`);
  await page.getByTestId("detail-card").first().getByRole("link").click();
  await page.waitForURL(/\/details\/[a-z0-9-]+$/);
  await page.getByTestId("site-check-results").waitFor();
  await expect(page.locator("svg[role=img] title").first().textContent()).resolves.toContain("section drawing");
  expect(await page.getByTestId("layer-table").locator("tbody tr").count()).toBeGreaterThan(2);
  await screenshot(page, "detail-desktop");

  // Run the check for zone 7 through the fetcher: the URL stays, the results change.
  const url = page.url();
  const before = await page.getByTestId("site-check-results").textContent();
  await page.getByTestId("site-check-panel").locator('select[name="zone"]').selectOption("7");
  await page.getByTestId("run-check").click();
  await page.waitForFunction(() =>
    document.querySelector('[data-testid="site-check-results"]')?.textContent?.includes("Zone 7"),
  );
  expect(page.url()).toBe(url);
  expect(await page.getByTestId("site-check-results").textContent()).not.toBe(before);

  // Degree-days instead of a zone; a bad RH gets a clear message and keeps the typed values.
  await page.getByTestId("site-check-panel").locator('select[name="zone"]').selectOption("");
  await page.locator('input[name="hdd"]').fill("7000");
  await page.locator('input[name="cdd"]').fill("1500");
  await page.locator('input[name="indoorRh"]').fill("150");
  await page.getByTestId("run-check").click();
  await page.getByTestId("site-errors").waitFor();
  expect(await page.getByTestId("site-errors").textContent()).toMatch(/humidity/i);
  expect(await page.locator('input[name="hdd"]').inputValue()).toBe("7000");
  await page.locator('input[name="indoorRh"]').fill("35");
  // Degree-days give the zone number; the moisture regime must be said (IECC R301.3).
  await page.getByTestId("run-check").click();
  await page.waitForFunction(() =>
    /moisture/i.test(document.querySelector('[data-testid="site-errors"]')?.textContent ?? ""),
  );
  await page.locator('select[name="moisture"]').selectOption("A");
  await page.getByTestId("run-check").click();
  await page.waitForFunction(() =>
    document.querySelector('[data-testid="site-check-results"]')?.textContent?.includes("from degree-days"),
  );

  // Units: inch-pound → SI changes the R notation everywhere on the page.
  expect(await page.getByTestId("effective-r").textContent()).toMatch(/^R-/);
  await page.getByTestId("units-toggle").getByRole("button", { name: "SI" }).click();
  await page.waitForFunction(() => document.querySelector('[data-testid="layer-table"]')?.textContent?.includes("RSI"));
  await page.close();
});

test("a premium detail shows a visitor its summary, drawing and preview, never the body", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/details?tier=premium`);
  await page.getByTestId("detail-card").first().getByRole("link").click();
  await page.getByTestId("premium-preview").waitFor();
  const html = await page.content();
  expect(html).not.toContain("Install sequence");
  expect(await page.getByTestId("layer-table").count()).toBe(0);
  await page.close();
});

test("the catalogue and a detail read well at phone width", async () => {
  const context = await openBrowser();
  const page = await context.newPage();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(`${baseUrl()}/details`);
  await screenshot(page, "catalogue-phone");
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(1);
  await page.getByTestId("detail-card").first().getByRole("link").click();
  await page.waitForURL(/\/details\/[a-z0-9-]+$/);
  await screenshot(page, "detail-phone");
  await page.close();
  await context.close();
});

/** Saves one chart figure as test output for people to look at (not committed). */
async function chartShot(chart: Locator, name: string): Promise<void> {
  mkdirSync("test-results/screenshots", { recursive: true });
  await chart.screenshot({ path: `test-results/screenshots/${name}.png` });
}

test("the profile charts show a winter, a summer and a below-grade case, wide and at phone width", async () => {
  const page = await browser.newPage();
  // A free wall with exterior foam, opened directly: the charts are in the server-rendered page.
  await page.goto(`${baseUrl()}/details/wall-2x4-r13-plus-50mm-xps-zone-5`);
  const winter = page.getByTestId("profile-chart-winter");
  const summer = page.getByTestId("profile-chart-summer");
  await winter.locator('svg[data-layout="wide"]').waitFor();
  // Separate, titled figures: the section drawing, then one chart per case.
  expect(await winter.locator("figcaption").textContent()).toBe("Winter profile");
  expect(await summer.locator("figcaption").textContent()).toBe("Summer profile");
  expect(await winter.locator('svg[data-layout="wide"] title').textContent()).toContain(
    "temperature by thermal resistance",
  );
  expect(await winter.locator('svg[data-layout="narrow"]').isVisible()).toBe(false);
  await chartShot(winter, "profile-winter");
  await chartShot(summer, "profile-summer");

  await page.goto(`${baseUrl()}/details/basement-icf-wall`);
  const below = page.getByTestId("profile-chart-winter");
  await below.locator('svg[data-layout="wide"]').waitFor();
  expect(await below.locator('svg[data-layout="wide"]').textContent()).toContain("soil side");
  await chartShot(below, "profile-below-grade");

  // At phone width the one-column drawing shows instead, its type drawn near 1:1.
  await page.setViewportSize({ width: 360, height: 800 });
  const narrow = below.locator('svg[data-layout="narrow"]');
  await narrow.waitFor();
  expect(await below.locator('svg[data-layout="wide"]').isVisible()).toBe(false);
  const box = await narrow.boundingBox();
  expect(box?.width).toBeGreaterThanOrEqual(0.9 * PROFILE_CHART_WIDTHS.narrow); // 10-unit labels draw at 9 px or more
  await chartShot(below, "profile-below-grade-phone");
  await page.close();
});
