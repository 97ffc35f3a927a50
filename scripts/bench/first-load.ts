// Gzipped JavaScript a first visit downloads, measured in Debian's chromium against a running server.
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";

export async function measureFirstLoad(
  base: string,
  paths: string[],
): Promise<{ path: string; files: number; gzipKb: number }[]> {
  const results = [];
  for (const path of paths) {
    // A fresh profile per page: nothing cached from the previous one.
    const context = await chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), "dryside-bench-")), {
      executablePath: "/usr/bin/chromium",
      headless: true,
      args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update"],
    });
    const page = await context.newPage();
    const bodies: Promise<Buffer>[] = [];
    page.on("response", (response) => {
      if (response.url().endsWith(".js") || response.request().resourceType() === "script")
        bodies.push(response.body());
    });
    await page.goto(base + path, { waitUntil: "networkidle" });
    const buffers = await Promise.all(bodies);
    results.push({
      path,
      files: buffers.length,
      gzipKb: buffers.reduce((sum, b) => sum + gzipSync(b).length, 0) / 1024,
    });
    await context.close();
  }
  return results;
}
