import type { Page } from "playwright-core";
import { baseUrl } from "./browser";
import { waitForMail } from "./caught-mail";

/**
 * A new member as a step of a longer journey: sign up, confirm through the caught e-mail, sign in.
 * (tests/e2e/accounts.test.ts walks and checks the same steps one by one.)
 */
export async function signUpConfirmedMember(
  page: Page,
  person: { name: string; email: string; password: string },
): Promise<void> {
  await page.goto(`${baseUrl()}/sign-up`);
  await page.getByLabel("Your name").fill(person.name);
  await page.getByLabel("E-mail").fill(person.email);
  await page.getByLabel("Password", { exact: true }).fill(person.password);
  await page.getByLabel("Password again").fill(person.password);
  await page.getByRole("button", { name: "Create account" }).click();
  const confirm = await waitForMail(person.email, /Confirm/);
  await page.goto(confirm.text.match(/https?:\/\/\S+\/verify-email\/[A-Za-z0-9_-]+/)![0]);
  await page.getByRole("button", { name: "Confirm my e-mail" }).click();
  await page.waitForURL(/\/sign-in\?notice=verified/);
  await page.getByLabel("E-mail").fill(person.email);
  await page.getByLabel("Password").fill(person.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByTestId("account-heading").waitFor();
}
