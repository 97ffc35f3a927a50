// The paid path in a real browser: a member buys one set on the payments stand-in's hosted page, comes
// back, sees the set as theirs and downloads its pack; the pack's PDFs are opened with poppler-utils.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, expect, test } from "vitest";
import type { BrowserContext } from "playwright-core";
import { loadContent } from "~/content/load-content";
import { buildMaterialLibrary, runSiteCheck } from "~/envelope";
import { formatR } from "~/envelope/units";
import { pdfText } from "~/packs/sheet-pdf.server";
import { waitForMail } from "./caught-mail";
import { signUpConfirmedMember } from "./journeys";
import { baseUrl, openBrowser, screenshot } from "./browser";

const SET = "roofs-and-attics";
const CARD_PAYS = "4242424242424242"; // the payments service's test-mode Visa (docs.stripe.com/testing), as in the stand-in README

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser.close();
});

/** What each sheet must say, from the content files and the engine itself (the page and API show the same). */
function expectedSheets(): Map<string, { title: string; effectiveR: string }> {
  const content = loadContent("content");
  const library = buildMaterialLibrary((content.materials ?? []).map((m) => m.material));
  const sheets = new Map<string, { title: string; effectiveR: string }>();
  for (const detail of content.details.filter((d) => d.sets.includes(SET))) {
    // The pack's default: each detail at the first zone it is written for, inch-pound units.
    const result = runSiteCheck({ kind: detail.assembly, layers: detail.layers }, { zone: detail.zones[0] }, library);
    sheets.set(detail.slug, { title: detail.title, effectiveR: `Effective ${formatR(result.thermal.rsi, "ip")}` });
  }
  return sheets;
}

test("a member buys a set with a test card, returns, sees it as theirs and downloads a pack of detail sheets (the detail, then its year)", async () => {
  const page = await browser.newPage();
  const email = `buyer-${Date.now()}@example.test`;
  const password = "a set buyer passphrase"; // our own minimum is 12 characters

  await signUpConfirmedMember(page, { name: "Wren Callowby", email, password });

  await page.goto(`${baseUrl()}/sets#${SET}`);
  await page.getByTestId(`buy-${SET}`).click();
  // The hosted checkout page lives on the stand-in, not on our origin.
  await page.getByLabel("Card number").waitFor();
  expect(new URL(page.url()).origin).not.toBe(new URL(baseUrl()).origin);
  await page.getByLabel("Card number").fill(CARD_PAYS);
  await page.getByLabel("Expiry (MM/YY)").fill("12/40");
  await page.getByLabel("Security code").fill("123");
  await page.getByLabel("Name on card").fill("Wren Callowby");
  await screenshot(page, "payments-hosted-checkout");
  await page.getByRole("button", { name: /^Pay/ }).click();

  await page.waitForURL(/\/account\/checkout\/return\?session_id=cs_/);
  // The return page only reads; it refreshes itself until the webhook's grant is visible.
  await page.getByTestId("checkout-granted").waitFor({ timeout: 20000 });
  await screenshot(page, "payments-checkout-return");

  const receipt = await waitForMail(email, /receipt/);
  expect(receipt.text).toContain("$49.00"); // content/sets.yaml: roofs-and-attics price_cents 4900

  await page.goto(`${baseUrl()}/sets#${SET}`);
  const button = page.getByTestId(`download-${SET}`);
  await button.waitFor();
  const [download] = await Promise.all([page.waitForEvent("download", { timeout: 60000 }), button.click()]);
  const dir = mkdtempSync(join(tmpdir(), "dryside-pack-"));
  await download.saveAs(join(dir, "pack.zip"));
  await screenshot(page, "payments-sets-owned");
  await page.close();

  // Debian's unzip and poppler-utils (pdfinfo, pdftotext) read what a subscriber's machine would.
  execFileSync("unzip", ["-q", "pack.zip"], { cwd: dir });
  const expected = expectedSheets();
  expect(expected.size).toBeGreaterThan(0);
  for (const [slug, sheet] of expected) {
    const info = execFileSync("pdfinfo", [`${slug}.pdf`], { cwd: dir, encoding: "utf8" });
    expect(info, slug).toMatch(/^Pages:\s+3$/m); // the detail, its seasonal balance, its winter profile
    const title = /^Title:\s+(.*)$/m.exec(info)?.[1];
    expect(title, slug).toBe(pdfText(sheet.title));
    const text = execFileSync("pdftotext", ["-layout", `${slug}.pdf`, "-"], { cwd: dir, encoding: "utf8" });
    expect(text, slug).toContain(sheet.effectiveR);
    expect(readFileSync(join(dir, `${slug}.md`), "utf8"), slug).toMatch(new RegExp(`^---\\nslug: ${slug}\\n`));
  }
}, 180_000);
