// Renders a real detail sheet (a content wall, the engine's site check, the material library)
// and reads it back with poppler: the detail on one page, the seasonal balance on a second, the winter profile on a third, extractable
// text, the figures the engine formats.
import { execFileSync } from "node:child_process";
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { parse } from "yaml";
import type { SectionLayer } from "~/drawing/section-geometry";
import {
  buildMaterialLibrary,
  materialSchema,
  runSiteCheck,
  type AssemblyInput,
  type LayerInput,
  type SiteCheckResult,
} from "~/envelope";
import { formatR, formatU } from "~/envelope/units";
import { seasonalFigures, seasonalVerdictLabel } from "~/drawing/seasonal-geometry";
import { pdfText, renderDetailSheet } from "~/packs/sheet-pdf.server";
import { STANDING_CAUTION } from "~/vocabulary/caution";

const materials = buildMaterialLibrary(
  readdirSync("content/materials")
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => materialSchema.parse(parse(readFileSync(join("content/materials", f), "utf8")))),
);

interface DetailFront {
  slug: string;
  title: string;
  summary: string;
  assembly: AssemblyInput["kind"];
  revision: number;
  revised: string;
  author: string;
  reviewer: string;
  change_note?: string;
  references: string[];
  layers: LayerInput[];
}

function loadDetail(slug: string): DetailFront {
  const text = readFileSync(`content/details/${slug}.md`, "utf8");
  const front = text.split(/^---\s*$/m)[1];
  return parse(front) as DetailFront;
}

function sectionLayers(layers: readonly LayerInput[]): SectionLayer[] {
  return layers.map((l) => {
    const m = materials.get(l.material);
    if (!m) throw new Error(`unknown material ${l.material}`);
    const framing = l.framing ? materials.get(l.framing.material) : undefined;
    return {
      role: l.role,
      family: m.family,
      materialName: m.name,
      thickness_mm: l.thickness_mm,
      framing:
        l.framing && framing
          ? { fraction: l.framing.fraction, family: framing.family, materialName: framing.name }
          : undefined,
    };
  });
}

async function renderSample(
  slug: string,
  zone: string,
  units: "si" | "ip",
  file: string,
): Promise<{ text: string; pages: number; r: string; u: string; siteCheck: SiteCheckResult }> {
  const detail = loadDetail(slug);
  const siteCheck = runSiteCheck({ kind: detail.assembly, layers: detail.layers }, { zone }, materials);
  const pdf = await renderDetailSheet({
    title: detail.title,
    slug: detail.slug,
    revision: {
      number: detail.revision,
      publishedAt: detail.revised,
      authorName: detail.author,
      reviewerName: detail.reviewer,
      changeNote: detail.change_note,
    },
    summary: detail.summary,
    kind: detail.assembly,
    layers: sectionLayers(detail.layers),
    units,
    siteCheck,
    cautions: [
      "Tape every foam joint and lap the housewrap shingle-fashion over window heads.",
      "Fasten cladding through the furring into the studs; check fastener length for the foam thickness.",
    ],
    references: detail.references,
    generatedFor: "Test job",
    generatedAt: new Date("2026-12-02T12:00:00Z"),
  });
  mkdirSync("test-results", { recursive: true });
  const path = join("test-results", file);
  writeFileSync(path, pdf);
  const info = execFileSync("pdfinfo", [path], { encoding: "utf8" });
  const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
  const text = execFileSync("pdftotext", [path, "-"], { encoding: "utf8" }).replace(/\s+/g, " ");
  execFileSync("pdftoppm", ["-r", "60", "-png", path, path.replace(/\.pdf$/, "")]);
  return {
    text,
    pages,
    r: formatR(siteCheck.thermal.rsi, units),
    u: formatU(siteCheck.thermal.u_si, units),
    siteCheck,
  };
}

test("a zone 6 wall sheet is the detail on one Letter page, the year on a second and the winter profile on a third, with extractable text and the engine's figures", async () => {
  const { text, pages, r, u, siteCheck } = await renderSample(
    "wall-2x6-r21-plus-50mm-polyiso-zone-6",
    "6A",
    "ip",
    "sheet-sample.pdf",
  );
  expect(pages).toBe(3);
  expect(text).toMatch(/winter profile/);
  expect(text).toContain("2x6 wall with 50 mm foil-faced polyiso, zone 6");
  const revision = loadDetail("wall-2x6-r21-plus-50mm-polyiso-zone-6").revision;
  expect(text).toContain(`Revision ${revision}`);
  expect(text).toContain("reviewed by Idris Varrow");
  expect(text).toContain(r); // the engine's own formatter, so page, API and sheet agree
  expect(text).toContain(u);
  expect(text).toContain(STANDING_CAUTION);
  expect(text).toContain(`wall-2x6-r21-plus-50mm-polyiso-zone-6 · revision ${revision} · generated 2026-12-02`);
  expect(text).toContain("IECC/IRC 2021");
  // The seasonal figures and the "checked at" sentence are the engine's (docs/site-climate.md).
  const seasonal = siteCheck.seasonal;
  if (!seasonal) throw new Error("the sheet's site check has no seasonal balance");
  expect(text).toContain(`Through the year: ${seasonalVerdictLabel(seasonal)}.`);
  expect(text).toContain(pdfText(seasonalFigures(seasonal, "ip")).replace(/\s+/g, " "));
  expect(text).toContain(`Checked at ${pdfText(siteCheck.site.indoor.basis)}`);
  for (const month of ["Jan", "Jul", "Dec"]) expect(text).toContain(month);
  expect(text).toContain("Water held at the end of each month");
  expect(text).toContain("Margin above the dew point, each month");
  expect(text).toContain("Site year GENERATED by Dryside");
  const size = execFileSync("pdfinfo", ["test-results/sheet-sample.pdf"], { encoding: "utf8" });
  expect(size).toMatch(/Page size:\s+612 x 792 pts \(letter\)/); // US Letter, 8.5 x 11 in
  const fonts = execFileSync("pdffonts", ["test-results/sheet-sample.pdf"], { encoding: "utf8" });
  expect(fonts).toMatch(/Inter/);
  expect(fonts).toMatch(/Merriweather/);
});

test("a long roof stack in SI units still fits its first page", async () => {
  const { text, pages, r } = await renderSample(
    "roof-unvented-polyiso-above-deck-zones-5-6",
    "5A",
    "si",
    "sheet-sample-roof-si.pdf",
  );
  expect(pages).toBe(3);
  expect(text).toContain(r);
  expect(text).toContain("ROOF TOP");
  expect(text).toContain(STANDING_CAUTION);
});
