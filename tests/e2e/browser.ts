import { mkdtempSync, mkdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { inject } from "vitest";

export const baseUrl = () => inject("baseUrl");

/** Debian's chromium through playwright-core; never a downloaded browser. */
export async function openBrowser(): Promise<BrowserContext> {
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), "dryside-chromium-")), {
    executablePath: "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
    viewport: { width: 1280, height: 900 },
  });
}

/** Screenshots are test output for people to look at; they are not committed. */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync("test-results/screenshots", { recursive: true });
  await page.screenshot({ path: `test-results/screenshots/${name}.png`, fullPage: true });
}
