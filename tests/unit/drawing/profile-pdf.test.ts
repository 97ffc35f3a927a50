// The profile chart on paper: the same primitives the page draws, through the PDF sheet's renderer.
// Written to test-results/ for a person to look at; read back with poppler when it is installed.
import { execFileSync } from "node:child_process";
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { parse } from "yaml";
import { buildMaterialLibrary, materialSchema, runSiteCheck } from "~/envelope";
import { renderProfilePages } from "~/packs/sheet-pdf.server";

const materials = buildMaterialLibrary(
  readdirSync("content/materials")
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => materialSchema.parse(parse(readFileSync(join("content/materials", f), "utf8")))),
);

function hasPoppler(): boolean {
  try {
    execFileSync("pdftotext", ["-v"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

test("the winter and summer charts print one per Letter page with their panel titles as text", async () => {
  const result = runSiteCheck(
    {
      kind: "above-grade-wall",
      layers: [
        { role: "cladding", material: "vinyl-siding", thickness_mm: 2 },
        { role: "insulation", material: "xps-board", thickness_mm: 25 },
        { role: "sheathing", material: "osb", thickness_mm: 11 },
        {
          role: "insulation",
          material: "fibreglass-batt",
          thickness_mm: 140,
          framing: { material: "softwood-lumber", fraction: 0.23 },
        },
        { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
      ],
    },
    { zone: "6A" },
    materials,
  );
  const pdf = await renderProfilePages("Thin-foam 2x6 wall", result, "si");
  expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
  mkdirSync("test-results", { recursive: true });
  writeFileSync("test-results/profile-pages.pdf", pdf);
  if (!hasPoppler()) return;
  const info = execFileSync("pdfinfo", ["test-results/profile-pages.pdf"], { encoding: "utf8" });
  expect(info).toMatch(/Pages:\s+2/);
  const text = execFileSync("pdftotext", ["test-results/profile-pages.pdf", "-"], { encoding: "utf8" });
  for (const title of [
    "Temperature by thermal resistance",
    "Vapour pressure by vapour resistance",
    "Margin above the dew point at each interface",
    "WINTER CASE",
    "SUMMER CASE",
  ]) {
    expect(text).toContain(title);
  }
  execFileSync("pdftoppm", ["-r", "60", "-png", "test-results/profile-pages.pdf", "test-results/profile-pages"]);
});
