// One printable detail sheet (US Letter) drawn with pdfkit: header, the generated section (the same
// primitives as the page's SVG), the layer table, the site check for the chosen site, flags,
// cautions, references and the standing caution in the footer; the seasonal balance's monthly chart
// on a second page.
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import PDFDocument from "pdfkit";
import { STANDING_CAUTION } from "~/vocabulary/caution";
import { profileGeometry } from "~/drawing/profile-geometry";
import {
  asSentence,
  seasonalFigures,
  seasonalGeometry,
  seasonalVerdictLabel,
  SEASONAL_CHART_WIDTHS,
} from "~/drawing/seasonal-geometry";
import { sectionGeometry, type SectionLayer } from "~/drawing/section-geometry";
import { INK, type Shape } from "~/drawing/shapes";
import type { AssemblyKind, Flag, ProfileCase, SeasonalResult, SiteCheckResult } from "~/envelope/types";
import {
  formatPermeance,
  formatR,
  formatTemperature,
  formatTemperatureDifference,
  formatThickness,
  formatU,
  type UnitSystem,
} from "~/envelope/units";

export interface DetailSheetInput {
  title: string;
  slug: string;
  revision: {
    number: number;
    publishedAt: Date | string;
    authorName: string;
    reviewerName: string;
    changeNote?: string | null;
  };
  summary: string;
  kind: AssemblyKind;
  /** Exterior → interior, as for the section drawing. */
  layers: SectionLayer[];
  units: UnitSystem;
  siteCheck: SiteCheckResult;
  cautions: string[];
  references: string[];
  /** e.g. the job or subscriber the sheet was generated for. */
  generatedFor?: string;
  /** Generation time (defaults to now); fixed in tests. */
  generatedAt?: Date;
}

const PAGE = { width: 612, height: 792, margin: 36 } as const;
const CONTENT_WIDTH = PAGE.width - 2 * PAGE.margin;
const FOOTER_TOP = PAGE.height - 44;
const FONTS = { sans: "Inter", sansBold: "Inter-Bold", serif: "Merriweather", serifBold: "Merriweather-Bold" } as const;

const require = createRequire(import.meta.url);
function fontFile(pkg: "inter" | "merriweather", weight: 400 | 700): string {
  // WOFF v1: pdfkit reads it; WOFF2 fails or draws blank (STACK.md).
  return join(
    dirname(require.resolve(`@fontsource/${pkg}/package.json`)),
    "files",
    `${pkg}-latin-${weight}-normal.woff`,
  );
}

/** The embedded fonts are Latin subsets: map the few symbols outside them to plain text. */
export function pdfText(text: string): string {
  return (
    text
      .replace(/≥/g, ">=")
      .replace(/≤/g, "<=")
      .replace(/→/g, "->")
      .replace(/←/g, "<-")
      .replace(/≈/g, "~")
      .replace(/[\u2070-\u209f]/g, "")
      // biome-ignore lint/suspicious/noControlCharactersInRegex: the range keeps what the PDF font can draw, control characters included in the count
      .replace(/[^\u0000-\u024f\u2000-\u206f\u20ac\u2122\u2212]/g, "?")
  );
}

function isoDate(value: Date | string): string {
  const d = typeof value === "string" ? new Date(value) : value;
  return Number.isNaN(d.getTime()) ? String(value) : d.toISOString().slice(0, 10);
}

type Doc = PDFKit.PDFDocument;

function fontFor(shape: Extract<Shape, { type: "text" }>): string {
  if (shape.font === "serif") return shape.weight === "bold" ? FONTS.serifBold : FONTS.serif;
  return shape.weight === "bold" ? FONTS.sansBold : FONTS.sans;
}

/** Draws geometry primitives at (x, y) scaled by k: the PDF twin of ShapeElements. */
export function drawShapes(doc: Doc, shapes: readonly Shape[], x: number, y: number, k: number): void {
  doc.save();
  doc.translate(x, y);
  doc.scale(k);
  for (const s of shapes) {
    doc.save();
    if (s.type !== "text") {
      if (s.opacity !== undefined) doc.opacity(s.opacity);
      if (s.strokeWidth !== undefined) doc.lineWidth(s.strokeWidth);
      if (s.dash?.length) doc.dash(s.dash[0], { space: s.dash[1] ?? s.dash[0] });
    }
    switch (s.type) {
      case "rect":
        doc.rect(s.x, s.y, s.w, s.h);
        break;
      case "line":
        doc.moveTo(s.x1, s.y1).lineTo(s.x2, s.y2);
        doc.lineCap("round");
        break;
      case "polyline":
        s.points.forEach(([px, py], i) => (i === 0 ? doc.moveTo(px, py) : doc.lineTo(px, py)));
        if (s.closed) doc.closePath();
        doc.lineJoin("round").lineCap("round");
        break;
      case "circle":
        doc.circle(s.cx, s.cy, s.r);
        break;
      case "text": {
        doc.font(fontFor(s)).fontSize(s.size).fillColor(s.fill);
        const value = pdfText(s.text);
        // Light tracking only: wide letter spacing makes pdftotext split words into letters.
        const tracking = Math.min(s.tracking ?? 0, 0.5);
        const w = doc.widthOfString(value, { characterSpacing: tracking });
        const left = s.anchor === "middle" ? s.x - w / 2 : s.anchor === "end" ? s.x - w : s.x;
        doc.text(value, left, s.y, { lineBreak: false, baseline: "alphabetic", characterSpacing: tracking });
        break;
      }
    }
    if (s.type !== "text") {
      const fill = s.fill && s.fill !== "none" ? s.fill : null;
      const stroke = s.stroke && s.stroke !== "none" ? s.stroke : null;
      if (fill && stroke) doc.fillAndStroke(fill, stroke);
      else if (fill) doc.fill(fill);
      else if (stroke) doc.stroke(stroke);
    }
    doc.restore();
  }
  doc.restore();
}

/** Writes a block of text within [x, x + width], no lower than `limit`; returns the new y. */
function block(
  doc: Doc,
  text: string,
  x: number,
  y: number,
  width: number,
  limit: number,
  style: { font: string; size: number; color?: string; gap?: number },
): number {
  doc
    .font(style.font)
    .fontSize(style.size)
    .fillColor(style.color ?? INK.graphite);
  const value = pdfText(text);
  const room = limit - y;
  if (room < style.size) return y;
  const h = doc.heightOfString(value, { width, lineGap: 0.6 });
  doc.text(value, x, y, { width, lineGap: 0.6, height: Math.min(h, room), ellipsis: h > room ? "…" : undefined });
  return y + Math.min(h, room) + (style.gap ?? 2);
}

function heading(doc: Doc, text: string, x: number, y: number, width: number): number {
  doc
    .font(FONTS.sansBold)
    .fontSize(7.5)
    .fillColor(INK.ochre)
    .text(pdfText(text), x, y, { characterSpacing: 0.2, lineBreak: false });
  doc
    .moveTo(x, y + 10)
    .lineTo(x + width, y + 10)
    .lineWidth(0.5)
    .stroke(INK.rule);
  return y + 14;
}

function layerTable(doc: Doc, input: DetailSheetInput, y: number): number {
  const { units, siteCheck } = input;
  const x = PAGE.margin;
  const cols = [
    { label: "#", w: 16, align: "left" as const },
    { label: "Material (role)", w: 236, align: "left" as const },
    { label: "Thickness", w: 58, align: "right" as const },
    { label: units === "ip" ? "R" : "RSI", w: 58, align: "right" as const },
    { label: "Permeance", w: 116, align: "right" as const },
    { label: "Class", w: 56, align: "right" as const },
  ];
  const row = (cells: string[], yy: number, font: string, color: string = INK.graphite): void => {
    let cx = x;
    doc.font(font).fontSize(7.4).fillColor(color);
    cells.forEach((c, i) => {
      doc.text(pdfText(c), cx, yy, {
        width: cols[i].w - 4,
        align: cols[i].align,
        lineBreak: false,
        ellipsis: "…",
        height: 9,
      });
      cx += cols[i].w;
    });
  };
  row(
    cols.map((c) => c.label),
    y,
    FONTS.sansBold,
    INK.graphiteSoft,
  );
  y += 10;
  doc
    .moveTo(x, y - 1)
    .lineTo(x + CONTENT_WIDTH, y - 1)
    .lineWidth(0.5)
    .stroke(INK.rule);
  const geometryBands = sectionGeometry({ kind: input.kind, layers: input.layers }, { units }).bands;
  input.layers.forEach((layer, i) => {
    const thermal = siteCheck.thermal.layers[i];
    const vapour = siteCheck.vapour.layers[i];
    const framed = layer.framing
      ? `, ${Math.round(layer.framing.fraction * 100)} % ${layer.framing.materialName?.toLowerCase() ?? "framing"}`
      : "";
    const star = geometryBands[i]?.drawnWiderThanScale ? " *" : "";
    row(
      [
        String(i + 1),
        `${layer.materialName} (${layer.role.replace(/-/g, " ")}${framed})`,
        `${formatThickness(layer.thickness_mm, units)}${star}`,
        thermal ? formatR(thermal.rsi, units) : "",
        vapour ? formatPermeance(vapour.perm_ng, units) : "",
        vapour ? (vapour.class === "permeable" ? "permeable" : `Class ${vapour.class}`) : "",
      ],
      y,
      FONTS.sans,
    );
    y += 9.6;
  });
  const films = siteCheck.thermal.films.map((f) => `${f.label} ${formatR(f.rsi, units)}`).join("; ");
  doc
    .moveTo(x, y)
    .lineTo(x + CONTENT_WIDTH, y)
    .lineWidth(0.5)
    .stroke(INK.rule);
  y += 3;
  doc
    .font(FONTS.sans)
    .fontSize(6.8)
    .fillColor(INK.graphiteSoft)
    .text(
      pdfText(
        `Air films: ${films}. * Thin layer drawn wider than scale. Framed layers: effective R by the isothermal-planes method.`,
      ),
      x,
      y,
      { width: CONTENT_WIDTH, lineBreak: false, ellipsis: "…", height: 9 },
    );
  return y + 11;
}

function caseLine(p: ProfileCase, units: UnitSystem): string {
  const first = p.firstCondensingSurface;
  const margin = formatTemperatureDifference(p.margin_c, units);
  return first
    ? `${p.name === "winter" ? "Winter" : "Summer"}: condensation first at ${first.label} (${formatTemperature(first.t_c, units)}); margin ${margin}.`
    : `${p.name === "winter" ? "Winter" : "Summer"}: no condensing surface; margin ${margin} at ${p.marginSurface}.`;
}

function siteCheckBlock(doc: Doc, input: DetailSheetInput, x: number, y: number, width: number, limit: number): number {
  const { siteCheck: r, units } = input;
  const site = r.site;
  y = heading(doc, "Site check", x, y, width);
  const small = { font: FONTS.sans, size: 7.4 };
  const where = site.canada
    ? `${site.canada.province ? `${site.canada.province}, ` : ""}NBC zone ${site.canada.nbcZone}, ${Math.round(site.canada.hdd18)} degree-days below 18 °C (design zone ${site.zone})`
    : `Climate zone ${site.zone}${site.zoneSource === "degree-days" ? " (from degree-days)" : ""}`;
  y = block(
    doc,
    `${where}. Winter ${formatTemperature(site.winter.t_c, units)}, summer ${formatTemperature(site.summer.t_c, units)} at ${Math.round(site.summer.rh)} % RH. Checked at ${site.indoor.basis}.`,
    x,
    y,
    width,
    limit,
    small,
  );
  doc.font(FONTS.sansBold).fontSize(9).fillColor(INK.graphite);
  y = block(
    doc,
    `Effective ${formatR(r.thermal.rsi, units)}   ${formatU(r.thermal.u_si, units)}`,
    x,
    y + 1,
    width,
    limit,
    { font: FONTS.sansBold, size: 9, gap: 3 },
  );
  y = block(doc, caseLine(r.profiles.winter, units), x, y, width, limit, small);
  y = block(doc, caseLine(r.profiles.summer, units), x, y, width, limit, small);
  y = block(
    doc,
    `Interior retarder: ${r.vapour.interiorClass === "none" ? "none" : `Class ${r.vapour.interiorClass}`}; dries ${r.vapour.dryingDirections.length ? r.vapour.dryingDirections.join(" and ") : "in neither direction"}.`,
    x,
    y,
    width,
    limit,
    { ...small, gap: 3 },
  );
  if (r.seasonal) {
    y = block(doc, `Through the year: ${seasonalVerdictLabel(r.seasonal)}.`, x, y, width, limit, {
      font: FONTS.sansBold,
      size: 7.4,
      color: r.seasonal.verdict === "accumulates" ? INK.stop : INK.graphite,
      gap: 1,
    });
    y = block(
      doc,
      `${seasonalFigures(r.seasonal, units)}${r.seasonal.scopeNote ? ` ${r.seasonal.scopeNote}` : ""} Monthly chart overleaf.`,
      x,
      y,
      width,
      limit,
      { ...small, gap: 4 },
    );
  }
  y = heading(doc, `Code rows compared, ${r.code.edition}`, x, y + 2, width);
  for (const row of r.code.rows) {
    if (y > limit - 9) break;
    const mark = row.pass ? "PASS" : "FAIL";
    doc
      .font(FONTS.sansBold)
      .fontSize(7)
      .fillColor(row.pass ? INK.vapour : INK.stop)
      .text(mark, x, y, { lineBreak: false });
    y = block(doc, `${row.label}: required ${row.required}, provided ${row.provided}.`, x + 24, y, width - 24, limit, {
      font: FONTS.sans,
      size: 7.2,
    });
  }
  return block(doc, r.caution, x, y + 3, width, limit, { font: FONTS.sans, size: 6.8, color: INK.graphiteSoft });
}

const SEVERITY_COLOUR: Record<Flag["severity"], string> = { stop: INK.stop, caution: INK.caution, note: INK.note };

function notesColumn(doc: Doc, input: DetailSheetInput, x: number, y: number, width: number, limit: number): number {
  y = heading(doc, "Flags", x, y, width);
  if (input.siteCheck.flags.length === 0)
    y = block(doc, "No flags for this site.", x, y, width, limit, { font: FONTS.sans, size: 7.4 });
  for (const flag of input.siteCheck.flags) {
    if (y > limit - 9) break;
    doc
      .font(FONTS.sansBold)
      .fontSize(6.8)
      .fillColor(SEVERITY_COLOUR[flag.severity])
      .text(flag.severity.toUpperCase(), x, y + 0.4, { lineBreak: false, characterSpacing: 0.4 });
    y = block(doc, `${flag.title}. ${flag.explanation} (${flag.source})`, x + 38, y, width - 38, limit, {
      font: FONTS.sans,
      size: 7,
      gap: 3,
    });
  }
  if (input.cautions.length) {
    y = heading(doc, "Cautions", x, y + 3, width);
    for (const c of input.cautions) y = block(doc, `• ${c}`, x, y, width, limit, { font: FONTS.sans, size: 7.2 });
  }
  if (input.references.length) {
    y = heading(doc, "References", x, y + 3, width);
    for (const ref of input.references)
      y = block(doc, ref, x, y, width, limit, { font: FONTS.sans, size: 7, color: INK.graphiteSoft, gap: 1 });
  }
  return y;
}

function footer(doc: Doc, input: DetailSheetInput, generatedAt: Date): void {
  const x = PAGE.margin;
  doc
    .moveTo(x, FOOTER_TOP - 4)
    .lineTo(x + CONTENT_WIDTH, FOOTER_TOP - 4)
    .lineWidth(0.6)
    .stroke(INK.graphiteSoft);
  doc
    .font(FONTS.sansBold)
    .fontSize(7.4)
    .fillColor(INK.graphite)
    .text(STANDING_CAUTION, x, FOOTER_TOP, { width: CONTENT_WIDTH, lineGap: 0.5 });
  doc.font(FONTS.sans).fontSize(6.6).fillColor(INK.graphiteSoft);
  const left = `${input.slug} · revision ${input.revision.number} · generated ${isoDate(generatedAt)}${input.generatedFor ? ` for ${pdfText(input.generatedFor)}` : ""}`;
  doc.text(left, x, FOOTER_TOP + 22, { width: CONTENT_WIDTH * 0.75, lineBreak: false, ellipsis: "…", height: 9 });
  doc.text("Dryside", x, FOOTER_TOP + 22, { width: CONTENT_WIDTH, align: "right", lineBreak: false });
}

function render(doc: Doc, input: DetailSheetInput): void {
  const generatedAt = input.generatedAt ?? new Date();
  const x = PAGE.margin;
  let y: number = PAGE.margin;

  // Header.
  doc.font(FONTS.serifBold).fontSize(10).fillColor(INK.ochre).text("Dryside", x, y, { lineBreak: false });
  doc
    .font(FONTS.sans)
    .fontSize(7)
    .fillColor(INK.graphiteSoft)
    .text(pdfText(`Detail sheet · ${input.units === "ip" ? "inch-pound units" : "SI units"}`), x, y + 2, {
      width: CONTENT_WIDTH,
      align: "right",
      lineBreak: false,
    });
  y += 16;
  y = block(doc, input.title, x, y, CONTENT_WIDTH, y + 44, { font: FONTS.serifBold, size: 14.5, gap: 3 });
  y = block(doc, input.summary, x, y, CONTENT_WIDTH, y + 20, {
    font: FONTS.sans,
    size: 8,
    color: INK.graphiteSoft,
    gap: 3,
  });
  const rev = input.revision;
  y = block(
    doc,
    `Revision ${rev.number}, published ${isoDate(rev.publishedAt)} · written by ${rev.authorName} · reviewed by ${rev.reviewerName}${rev.changeNote ? ` · ${rev.changeNote}` : ""}`,
    x,
    y,
    CONTENT_WIDTH,
    y + 20,
    { font: FONTS.sans, size: 7.4, gap: 4 },
  );

  // Section drawing: same primitives as the page, legend replaced by the layer table.
  const geometry = sectionGeometry({ kind: input.kind, layers: input.layers }, { units: input.units, legend: false });
  const k = CONTENT_WIDTH / geometry.width;
  doc.rect(x, y, CONTENT_WIDTH, geometry.height * k).fill(INK.sheet);
  drawShapes(doc, geometry.shapes, x, y, k);
  y += geometry.height * k + 6;

  y = layerTable(doc, input, y);

  // Two columns: the site check, then flags, cautions and references.
  const gap = 18;
  const colWidth = (CONTENT_WIDTH - gap) / 2;
  const limit = FOOTER_TOP - 10;
  siteCheckBlock(doc, input, x, y + 4, colWidth, limit);
  notesColumn(doc, input, x + colWidth + gap, y + 4, colWidth, limit);

  footer(doc, input, generatedAt);
  if (input.siteCheck.seasonal) {
    doc.addPage();
    seasonalPage(doc, input, input.siteCheck.seasonal);
    footer(doc, input, generatedAt);
  }
  // The winter profile on its own page: the case where walls rot, drawn as on the detail page.
  doc.addPage();
  profilePage(doc, input, input.siteCheck.profiles.winter);
  footer(doc, input, generatedAt);
}

/** The head of a sheet's later pages: the name, then the page's title; returns the y below it. */
function continuationHeading(doc: Doc, title: string): number {
  const y = PAGE.margin;
  doc.font(FONTS.serifBold).fontSize(10).fillColor(INK.ochre).text("Dryside", PAGE.margin, y, { lineBreak: false });
  return block(doc, title, PAGE.margin, y + 16, CONTENT_WIDTH, y + 36, { font: FONTS.serifBold, size: 12, gap: 6 });
}

function profilePage(doc: Doc, input: DetailSheetInput, profile: ProfileCase): void {
  drawProfileChart(doc, profile, input.units, continuationHeading(doc, `${input.title}: winter profile`));
}

/** The sheet's second page: the seasonal balance month by month, drawn with the page's primitives. */
function seasonalPage(doc: Doc, input: DetailSheetInput, seasonal: SeasonalResult): void {
  const x = PAGE.margin;
  const limit = FOOTER_TOP - 10;
  let y = continuationHeading(doc, `${input.title}: through the year`);
  y = heading(doc, "Seasonal balance, month by month", x, y, CONTENT_WIDTH);
  y = block(doc, seasonal.explanation, x, y, CONTENT_WIDTH, limit, { font: FONTS.sans, size: 7.6, gap: 6 });
  const chart = seasonalGeometry(seasonal, { units: input.units, width: SEASONAL_CHART_WIDTHS.wide });
  const k = CONTENT_WIDTH / chart.width;
  drawShapes(doc, chart.shapes, x, y, k);
  y += chart.height * k + 8;
  const small = { font: FONTS.sans, size: 7.2, color: INK.graphiteSoft, gap: 3 };
  const year = seasonal.climate;
  y = block(
    doc,
    `${year.source === "generated" ? "Site year GENERATED by Dryside, not measured: " : year.source === "csv" ? "Site year from an uploaded file. " : "Site year as typed. "}${year.note}`,
    x,
    y,
    CONTENT_WIDTH,
    limit,
    small,
  );
  y = block(
    doc,
    `Indoor: ${input.siteCheck.site.indoor.basis} on the design day; each month by the same method at its mean outdoor temperature.`,
    x,
    y,
    CONTENT_WIDTH,
    limit,
    small,
  );
  y = block(doc, `Code compared: ${input.siteCheck.code.edition}.`, x, y, CONTENT_WIDTH, limit, small);
  y = block(doc, `Method: ${asSentence(seasonal.method)}`, x, y, CONTENT_WIDTH, limit, small);
  block(
    doc,
    `Interior surface: ${asSentence(seasonal.surface.method)} ${seasonal.surface.explanation}`,
    x,
    y,
    CONTENT_WIDTH,
    limit,
    small,
  );
}

/** A Letter document with the sheet's fonts, drawn by `draw`, as bytes. */
function letterPdf(info: PDFKit.DocumentInfo, draw: (doc: Doc) => void): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    // Bottom margin 0: the footer sits below the text area and must not start a second page.
    const doc = new PDFDocument({
      size: "LETTER",
      margins: { top: PAGE.margin, left: PAGE.margin, right: PAGE.margin, bottom: 0 },
      info,
    });
    doc.registerFont(FONTS.sans, fontFile("inter", 400));
    doc.registerFont(FONTS.sansBold, fontFile("inter", 700));
    doc.registerFont(FONTS.serif, fontFile("merriweather", 400));
    doc.registerFont(FONTS.serifBold, fontFile("merriweather", 700));
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    try {
      draw(doc);
      doc.end();
    } catch (error) {
      reject(error);
    }
  });
}

/** Renders one detail sheet to Letter PDF: the detail and its site check on the first page, the
 * seasonal balance month by month on the second, the winter profile chart on the third. */
export function renderDetailSheet(input: DetailSheetInput): Promise<Buffer> {
  return letterPdf(
    {
      Title: pdfText(input.title),
      Subject: `Dryside detail sheet ${input.slug}, revision ${input.revision.number}`,
      Creator: "Dryside",
    },
    (doc) => render(doc, input),
  );
}

/** Draws a site-check case's profile chart (the page's wide layout) across the content width at y;
 * returns the y below it. The type is 10 drawing units, 7.5 pt at this scale. */
export function drawProfileChart(doc: Doc, profile: ProfileCase, units: UnitSystem, y: number): number {
  const chart = profileGeometry(profile, { units, width: 720 });
  const k = CONTENT_WIDTH / chart.width;
  drawShapes(doc, chart.shapes, PAGE.margin, y, k);
  return y + chart.height * k;
}

/** The winter and summer profile charts of a site check, one Letter page each, for a pack or a review. */
export function renderProfilePages(title: string, siteCheck: SiteCheckResult, units: UnitSystem): Promise<Buffer> {
  return letterPdf({ Title: pdfText(`${title}: profiles`), Creator: "Dryside" }, (doc) => {
    for (const profile of [siteCheck.profiles.winter, siteCheck.profiles.summer]) {
      if (profile.name === "summer") doc.addPage();
      doc
        .font(FONTS.serifBold)
        .fontSize(12)
        .fillColor(INK.graphite)
        .text(pdfText(`${title}: ${profile.name} profile`), PAGE.margin, PAGE.margin, {
          width: CONTENT_WIDTH,
          lineBreak: false,
          ellipsis: "…",
          height: 16,
        });
      drawProfileChart(doc, profile, units, PAGE.margin + 22);
    }
  });
}
