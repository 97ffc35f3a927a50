import { afterAll, beforeAll, expect, test } from "vitest";
import type { BrowserContext } from "playwright-core";
import { baseUrl, openBrowser, screenshot } from "./browser";
import { STANDING_CAUTION } from "~/vocabulary/caution";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser.close();
});

test("the home page loads with the shipped fonts, the palette and the standing caution", async () => {
  const page = await browser.newPage();
  const fontRequests: string[] = [];
  page.on("requestfinished", (request) => {
    if (/\.woff2?$/.test(request.url())) fontRequests.push(request.url());
  });
  const response = await page.goto(baseUrl());
  expect(response?.status()).toBe(200);
  await page.evaluate(() => document.fonts.ready);
  await page.waitForFunction(
    () => document.fonts.check('16px "Inter"') && document.fonts.check('700 16px "Merriweather"'),
  );

  const styles = await page.evaluate(() => ({
    body: getComputedStyle(document.body).fontFamily,
    heading: getComputedStyle(document.querySelector("h1")!).fontFamily,
    background: getComputedStyle(document.documentElement).backgroundColor,
    fontsLoaded: [...document.fonts].filter((f) => f.status === "loaded").map((f) => f.family.replaceAll('"', "")),
  }));
  expect(styles.body).toMatch(/^Inter/);
  expect(styles.heading).toMatch(/^Merriweather/);
  expect(styles.background).toBe("rgb(247, 242, 232)"); // --color-paper
  expect(styles.fontsLoaded).toEqual(expect.arrayContaining(["Inter", "Merriweather"]));
  // Fonts come from our own server, never a font CDN.
  expect(fontRequests.length).toBeGreaterThan(0);
  for (const url of fontRequests) expect(url.startsWith(baseUrl())).toBe(true);

  await expect(page.getByTestId("standing-caution").textContent()).resolves.toContain(STANDING_CAUTION);
  await screenshot(page, "home-desktop");
  await page.close();
});
