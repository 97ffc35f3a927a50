import { afterAll, beforeAll, expect, test } from "vitest";
import type { BrowserContext } from "playwright-core";
import { waitForMail } from "./caught-mail";
import { baseUrl, openBrowser, screenshot } from "./browser";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser.close();
});

test("sign up, confirm the e-mail from the caught mail, sign in and see the account page", async () => {
  const page = await browser.newPage();
  const email = `e2e-${Date.now()}@example.test`;
  const password = "a browser test passphrase"; // our own minimum is 12 characters

  await page.goto(`${baseUrl()}/sign-up`);
  await page.getByLabel("Your name").fill("Pim Harrowgate");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByLabel("Password again").fill(password);
  await page.getByRole("button", { name: "Create account" }).click();
  await page.getByTestId("sign-up-sent").waitFor();

  const message = await waitForMail(email);
  expect(message.subject).toBe("Confirm your e-mail for Dryside");
  const link = message.text.match(/https?:\/\/\S+\/verify-email\/[A-Za-z0-9_-]+/)?.[0];
  expect(link?.startsWith(baseUrl())).toBe(true);

  await page.goto(link!);
  await page.getByRole("button", { name: "Confirm my e-mail" }).click();
  await page.waitForURL(/\/sign-in\?notice=verified/);

  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByTestId("account-heading").waitFor();
  expect(new URL(page.url()).pathname).toBe("/account");
  expect(await page.getByTestId("account-email").textContent()).toBe(email);
  expect(await page.getByTestId("account-verified").textContent()).toMatch(/^Yes/);
  expect(await page.getByTestId("account-link").textContent()).toBe("Pim Harrowgate");
  await screenshot(page, "account-after-sign-up");

  await page.getByRole("button", { name: "Sign out" }).click();
  await page.getByRole("link", { name: "Sign in" }).waitFor();
  await page.goto(`${baseUrl()}/account`);
  await page.waitForURL(/\/sign-in\?next=%2Faccount/);
  await page.close();
});
