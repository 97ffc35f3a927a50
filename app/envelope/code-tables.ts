// Prescriptive code rows: IECC minimum insulation by component and zone (2021 Table R402.1.3 =
// IRC N1102.1.3; 2018 Table R402.1.2), IRC R702.7 interior vapour-retarder rows, and Table
// R702.7(3) (continuous insulation that lets a Class III interior retarder serve).
// Values: docs/references.md §6.1 and §6.2 (status C from DOE/PNNL tables, R702.7(3) C2 + M).
import { isInsulation, materialRsi, type ResolvedAssembly, type ResolvedLayer } from "./layers";
import type { CodeEdition, CodeRow, InteriorClass, ResolvedSite } from "./types";
import { rsiToRip } from "./units";

/** One compliance option: cavity R ≥ cavity and continuous R ≥ ci (IP R-values). */
export interface InsulationOption {
  cavity: number;
  ci: number;
  text: string;
}

const parsedOptions = new Map<string, InsulationOption>();
/** Parsed once per distinct option text (the tables are constant). */
function opt(text: string): InsulationOption {
  let parsed = parsedOptions.get(text);
  if (!parsed) {
    parsed = parseOption(text);
    parsedOptions.set(text, parsed);
  }
  return parsed;
}

function parseOption(text: string): InsulationOption {
  // "20+5ci", "13+5" (2018 wording), "15ci", "19", "0+10ci"
  const m = /^(\d+(?:\.\d+)?)(ci)?(?:\+(\d+(?:\.\d+)?)(?:ci)?)?$/.exec(text);
  if (!m) throw new Error(`bad code option ${text}`);
  if (m[2]) return { cavity: 0, ci: Number(m[1]), text: `R-${m[1]} continuous` };
  const cavity = Number(m[1]);
  const ci = m[3] ? Number(m[3]) : 0;
  return { cavity, ci, text: ci ? `R-${cavity} cavity + R-${ci} continuous` : `R-${cavity} cavity` };
}

interface ZoneRow {
  ceiling: number;
  wall: string[];
  mass: [number, number];
  floor: number;
  basement: string[];
  slab: { r: number; depth: string } | null;
  crawl: string[];
}

const W4_2021 = ["30", "20+5ci", "13+10ci", "0+20ci"];
const B5_2021 = ["15ci", "19", "13+5ci"];
const IECC_2021: Record<string, ZoneRow> = {
  "0-1": { ceiling: 30, wall: ["13", "0+10ci"], mass: [3, 4], floor: 13, basement: [], slab: null, crawl: [] },
  "2": { ceiling: 49, wall: ["13", "0+10ci"], mass: [4, 6], floor: 13, basement: [], slab: null, crawl: [] },
  "3": {
    ceiling: 49,
    wall: ["20", "13+5ci", "0+15ci"],
    mass: [8, 13],
    floor: 19,
    basement: ["5ci", "13"],
    slab: { r: 10, depth: "2 ft" },
    crawl: ["5ci", "13"],
  },
  "4": {
    ceiling: 60,
    wall: W4_2021,
    mass: [8, 13],
    floor: 19,
    basement: ["10ci", "13"],
    slab: { r: 10, depth: "4 ft" },
    crawl: ["10ci", "13"],
  },
  "5": {
    ceiling: 60,
    wall: W4_2021,
    mass: [13, 17],
    floor: 30,
    basement: B5_2021,
    slab: { r: 10, depth: "4 ft" },
    crawl: B5_2021,
  },
  "6": {
    ceiling: 60,
    wall: W4_2021,
    mass: [15, 20],
    floor: 30,
    basement: B5_2021,
    slab: { r: 10, depth: "4 ft" },
    crawl: B5_2021,
  },
  "7-8": {
    ceiling: 60,
    wall: W4_2021,
    mass: [19, 21],
    floor: 38,
    basement: B5_2021,
    slab: { r: 10, depth: "4 ft" },
    crawl: B5_2021,
  },
};
const IECC_2018: Record<string, ZoneRow> = {
  "0-1": { ceiling: 30, wall: ["13"], mass: [3, 4], floor: 13, basement: [], slab: null, crawl: [] },
  "2": { ceiling: 38, wall: ["13"], mass: [4, 6], floor: 13, basement: [], slab: null, crawl: [] },
  "3": {
    ceiling: 38,
    wall: ["20", "13+5"],
    mass: [8, 13],
    floor: 19,
    basement: ["5ci", "13"],
    slab: null,
    crawl: ["5ci", "13"],
  },
  "4": {
    ceiling: 49,
    wall: ["20", "13+5"],
    mass: [8, 13],
    floor: 19,
    basement: ["10ci", "13"],
    slab: { r: 10, depth: "2 ft" },
    crawl: ["10ci", "13"],
  },
  "5": {
    ceiling: 49,
    wall: ["20", "13+5"],
    mass: [13, 17],
    floor: 30,
    basement: B5_2021,
    slab: { r: 10, depth: "2 ft" },
    crawl: B5_2021,
  },
  "6": {
    ceiling: 49,
    wall: ["20+5", "13+10"],
    mass: [15, 20],
    floor: 30,
    basement: B5_2021,
    slab: { r: 10, depth: "4 ft" },
    crawl: B5_2021,
  },
  "7-8": {
    ceiling: 49,
    wall: ["20+5", "13+10"],
    mass: [19, 21],
    floor: 38,
    basement: B5_2021,
    slab: { r: 10, depth: "4 ft" },
    crawl: B5_2021,
  },
};

/** IRC Table R806.5: rigid board above the deck of an unvented roof with air-permeable insulation
 * below it (docs/references.md §8: zone 1A R-5 C; the other zones M). Keys as r702Key plus 1–4. */
const R806_5: Record<string, number> = {
  "1": 5,
  "2": 5,
  "3": 5,
  "4C": 10,
  "4": 15,
  "5": 20,
  "6": 25,
  "7": 30,
  "8": 35,
};

function r8065Key(site: ResolvedSite): string {
  if (site.zoneNumber === 4 && site.moisture === "C") return "4C";
  return String(Math.max(1, site.zoneNumber));
}

/** Row key: marine 4 reads with zone 5 (IECC footnote). */
export function iecczoneKey(site: Pick<ResolvedSite, "zoneNumber" | "moisture">): string {
  const n = site.zoneNumber;
  if (n <= 1) return "0-1";
  if (n === 4 && site.moisture === "C") return "5";
  if (n >= 7) return "7-8";
  return String(n);
}

export function iecczoneRow(edition: CodeEdition, key: string): ZoneRow {
  return (edition === "IECC/IRC 2018" ? IECC_2018 : IECC_2021)[key];
}

/** Table R702.7(3): minimum continuous insulation R for a Class III interior retarder. */
const R702_7_3: Record<
  CodeEdition,
  Record<string, { w2x4: number; w2x6: number; vented: "wsp-fibreboard-gypsum" | "fibreboard-gypsum" | null }>
> = {
  "IECC/IRC 2021": {
    "4C": { w2x4: 2.5, w2x6: 3.75, vented: "wsp-fibreboard-gypsum" },
    "5": { w2x4: 5, w2x6: 7.5, vented: "wsp-fibreboard-gypsum" },
    "6": { w2x4: 7.5, w2x6: 11.25, vented: "fibreboard-gypsum" },
    "7": { w2x4: 10, w2x6: 15, vented: null },
    "8": { w2x4: 12.5, w2x6: 20, vented: null },
  },
  "IECC/IRC 2018": {
    "4C": { w2x4: 2.5, w2x6: 3.75, vented: "wsp-fibreboard-gypsum" },
    "5": { w2x4: 5, w2x6: 7.5, vented: "wsp-fibreboard-gypsum" },
    "6": { w2x4: 7.5, w2x6: 11.25, vented: "fibreboard-gypsum" },
    "7": { w2x4: 10, w2x6: 15, vented: null },
    "8": { w2x4: 10, w2x6: 15, vented: null },
  },
};

export function r70273Threshold(edition: CodeEdition, zone: string, frame: "2x4" | "2x6"): number | null {
  const row = R702_7_3[edition][zone];
  return row ? (frame === "2x4" ? row.w2x4 : row.w2x6) : null;
}

function r702Key(site: ResolvedSite): string | null {
  if (site.zoneNumber === 4 && site.moisture === "C") return "4C";
  if (site.zoneNumber >= 5) return String(site.zoneNumber);
  return null;
}

/** Nominal insulation of an assembly, inch-pound R: cavity (framed layers' fill) and continuous
 * (unframed insulation), with where the continuous part sits relative to the framing/structure. */
export interface InsulationSummary {
  cavity: number;
  ci: number;
  ciOutboard: number;
  ciInboard: number;
  framedDepthMm: number | null;
  massOutboardOnly: boolean;
}

// Depends on the assembly alone, and a site check reads it for the code rows and the rules at every
// site: worked out once per resolved assembly (callers only read it).
const summaries = new WeakMap<ResolvedAssembly, Readonly<InsulationSummary>>();
export function summariseInsulation(a: ResolvedAssembly): Readonly<InsulationSummary> {
  let s = summaries.get(a);
  if (!s) {
    s = summarise(a);
    summaries.set(a, s);
  }
  return s;
}

function summarise(a: ResolvedAssembly): InsulationSummary {
  const framed = a.layers.filter((l) => l.framing && isInsulation(l));
  const frameIdx = framed.length ? framed[0].index : a.layers.findIndex((l) => l.input.role === "structure");
  let cavity = 0;
  let ciOutboard = 0;
  let ciInboard = 0;
  for (const l of a.layers) {
    if (!isInsulation(l)) continue;
    const r = rsiToRip(materialRsi(l.material, l.thickness_mm));
    if (l.framing) cavity += r;
    else if (frameIdx >= 0 && l.index > frameIdx) ciInboard += r;
    else ciOutboard += r;
  }
  const massOutboardOnly = ciInboard === 0 && cavity === 0;
  return {
    cavity,
    ci: ciOutboard + ciInboard,
    ciOutboard,
    ciInboard,
    framedDepthMm: framed.length ? Math.max(...framed.map((l) => l.thickness_mm)) : null,
    massOutboardOnly,
  };
}

const r = (v: number): string => `R-${(Math.round(v * 10) / 10).toString()}`;

function optionsRow(
  id: string,
  label: string,
  options: string[],
  s: Readonly<InsulationSummary>,
  ciValue: number,
  edition: CodeEdition,
): CodeRow {
  const parsed = options.map(opt);
  const passing = parsed.find(
    (o) => s.cavity >= o.cavity - 0.05 && ciValue >= o.ci - 0.05 && (o.cavity > 0 || o.ci > 0),
  );
  return {
    id,
    label,
    required: parsed.map((o) => o.text).join(" or "),
    provided: `${r(s.cavity)} cavity + ${r(ciValue)} continuous`,
    pass: passing !== undefined,
    note: passing
      ? `Meets "${passing.text}" (${edition}; nominal R of the insulation, not the effective R).`
      : `No option met (${edition}); R-values are the nominal insulation values the table uses.`,
  };
}

function simpleRow(
  id: string,
  label: string,
  required: number,
  provided: number,
  edition: CodeEdition,
  extra = "",
): CodeRow {
  return {
    id,
    label,
    required: r(required),
    provided: r(provided),
    pass: provided >= required - 0.05,
    note: `${edition}, nominal insulation R${extra}.`,
  };
}

const isFrameWall = (a: ResolvedAssembly): boolean =>
  (a.kind === "above-grade-wall" || a.kind === "rim-joist") && a.layers.some((l) => l.framing);

/** Vented cladding (IRC R702.7(3)): a drained/vented air space behind the cladding, or a
 * back-ventilated cladding. Returns the sheathing material group it sits over. */
function ventedCladding(a: ResolvedAssembly): { vented: boolean; over: "wsp" | "fibreboard-gypsum" | "other" } {
  const gap = a.layers.some(
    (l) => l.input.role === "drainage-gap" && (l.material.family === "air-space" || l.material.family === "drainage"),
  );
  const selfVented = a.layers.some((l) => l.input.role === "cladding" && l.material.vented_cladding);
  const sheathing: ResolvedLayer | undefined = a.layers.find((l) => l.input.role === "sheathing");
  // Fibreboard is told apart from structural panels by slug: both are wood-panel family.
  const over = !sheathing
    ? "other"
    : sheathing.material.family === "gypsum" || sheathing.material.slug === "fibreboard-sheathing"
      ? "fibreboard-gypsum"
      : sheathing.material.family === "wood-panel"
        ? "wsp"
        : "other";
  return { vented: gap || selfVented, over };
}

export function codeRows(a: ResolvedAssembly, site: ResolvedSite, interiorClass: InteriorClass): CodeRow[] {
  const edition = site.edition;
  const key = iecczoneKey(site);
  const row = iecczoneRow(edition, key);
  const s = summariseInsulation(a);
  const rows: CodeRow[] = [];
  const zoneLabel = `zone ${site.zone}${key === "5" && site.zoneNumber === 4 ? " (marine 4 reads with zone 5)" : ""}`;
  const iecc = edition === "IECC/IRC 2021" ? "IECC 2021 Table R402.1.3" : "IECC 2018 Table R402.1.2";
  const zoneNote =
    edition === "IECC/IRC 2018" && site.zoneNumber === 0 ? " Zone 0 is not in the 2018 tables; zone 1 is used." : "";

  switch (a.kind) {
    case "above-grade-wall":
    case "rim-joist": {
      if (isFrameWall(a)) {
        rows.push(
          optionsRow(
            "iecc-wall",
            `${iecc}, wood-frame wall, ${zoneLabel}${a.kind === "rim-joist" ? " (rim joist read as wall)" : ""}`,
            row.wall,
            s,
            s.ci,
            edition,
          ),
        );
      } else {
        const need = s.massOutboardOnly ? row.mass[0] : row.mass[1];
        rows.push(
          simpleRow(
            "iecc-mass-wall",
            `${iecc}, mass wall (${s.massOutboardOnly ? "insulation outside" : "insulation inside"}), ${zoneLabel}`,
            need,
            s.cavity + s.ci,
            edition,
          ),
        );
      }
      break;
    }
    case "roof": {
      rows.push(simpleRow("iecc-ceiling", `${iecc}, ceiling, ${zoneLabel}`, row.ceiling, s.cavity + s.ci, edition));
      // Unvented roof with air-permeable fill below rigid board: the board must keep the deck warm.
      const framedFill = a.layers.find(
        (l) => l.framing && (l.material.family === "fibrous-insulation" || l.material.family === "loose-fill"),
      );
      const vented = a.layers.some((l) => l.input.role === "drainage-gap" && l.material.family === "air-space");
      const board = framedFill
        ? a.layers.filter((l) => l.index < framedFill.index && !l.framing && isInsulation(l))
        : [];
      if (framedFill && !vented && board.length > 0) {
        const above = board.reduce((t, l) => t + rsiToRip(materialRsi(l.material, l.thickness_mm)), 0);
        const key = r8065Key(site);
        const irc = edition === "IECC/IRC 2021" ? "IRC 2021" : "IRC 2018";
        rows.push({
          id: "irc-r806-5",
          label: `${irc} Table R806.5, rigid board above an unvented roof deck, zone ${site.zone}`,
          required: r(R806_5[key]),
          provided: r(above),
          pass: above >= R806_5[key] - 0.05,
          note: `Board above the deck keeps the underside of the board above the dew point with air-permeable insulation below (${key === "1" ? "C" : "M, verify against the printed table"}).`,
        });
      }
      break;
    }
    case "floor":
      rows.push(simpleRow("iecc-floor", `${iecc}, floor, ${zoneLabel}`, row.floor, s.cavity + s.ci, edition));
      break;
    case "basement-wall":
      if (row.basement.length)
        rows.push(
          optionsRow("iecc-basement-wall", `${iecc}, basement wall, ${zoneLabel}`, row.basement, s, s.ci, edition),
        );
      else
        rows.push({
          id: "iecc-basement-wall",
          label: `${iecc}, basement wall, ${zoneLabel}`,
          required: "none",
          provided: `${r(s.cavity + s.ci)}`,
          pass: true,
          note: `${edition}: no prescriptive basement-wall insulation in this zone.`,
        });
      break;
    case "crawlspace-wall":
      if (row.crawl.length)
        rows.push(
          optionsRow("iecc-crawlspace-wall", `${iecc}, crawl-space wall, ${zoneLabel}`, row.crawl, s, s.ci, edition),
        );
      else
        rows.push({
          id: "iecc-crawlspace-wall",
          label: `${iecc}, crawl-space wall, ${zoneLabel}`,
          required: "none",
          provided: `${r(s.cavity + s.ci)}`,
          pass: true,
          note: `${edition}: no prescriptive crawl-space wall insulation in this zone.`,
        });
      break;
    case "slab":
      if (row.slab)
        rows.push(
          simpleRow(
            "iecc-slab",
            `${iecc}, slab edge, ${zoneLabel}`,
            row.slab.r,
            s.ci + s.cavity,
            edition,
            `; depth ${row.slab.depth} is not checked from a section`,
          ),
        );
      else
        rows.push({
          id: "iecc-slab",
          label: `${iecc}, slab, ${zoneLabel}`,
          required: "none",
          provided: `${r(s.ci)}`,
          pass: true,
          note: `${edition}: no prescriptive slab insulation in this zone.`,
        });
      break;
    case "crawlspace-floor":
      break; // ground cover: IRC R408.3 is a rule (flags), not an R row
  }
  if (zoneNote && rows.length) rows[rows.length - 1].note += zoneNote;

  // IRC R702.7 interior vapour retarder rows: frame walls only.
  if (a.kind === "above-grade-wall" && isFrameWall(a)) {
    const irc = edition === "IECC/IRC 2021" ? "IRC 2021" : "IRC 2018";
    const zn = site.zoneNumber;
    if (zn <= 2 && (interiorClass === "I" || interiorClass === "II")) {
      rows.push({
        id: "irc-r702-7-class",
        label: `${irc} Table R702.7(2), interior retarder, zone ${site.zone}`,
        required: "Class III only (Class I and II not permitted)",
        provided: `Class ${interiorClass}`,
        pass: false,
        note: "Zones 1–2: an interior Class I or II retarder traps inward-driven summer moisture.",
      });
    } else if ((zn === 3 || (zn === 4 && site.moisture !== "C")) && interiorClass === "I") {
      rows.push({
        id: "irc-r702-7-class",
        label: `${irc} Table R702.7(2), interior retarder, zone ${site.zone}`,
        required: "Class II or III (Class I not permitted)",
        provided: "Class I",
        pass: false,
        note: "Zones 3 and 4 (not marine): Class I interior retarders are not permitted.",
      });
    }
    const rk = r702Key(site);
    if (rk) {
      const frame: "2x4" | "2x6" = (s.framedDepthMm ?? 140) <= 110 ? "2x4" : "2x6";
      const need = r70273Threshold(edition, rk, frame) as number;
      const table = edition === "IECC/IRC 2021" ? "Table R702.7(3)" : "Table R702.7.1";
      const vc = ventedCladding(a);
      const ventOk =
        vc.vented &&
        ((R702_7_3[edition][rk].vented === "wsp-fibreboard-gypsum" && vc.over !== "other") ||
          (R702_7_3[edition][rk].vented === "fibreboard-gypsum" && vc.over === "fibreboard-gypsum"));
      const classIII = interiorClass === "III" || interiorClass === "none";
      const ciPass = s.ciOutboard >= need - 0.005;
      rows.push({
        id: "irc-r702-7-3",
        label: `${irc} ${table}, Class III interior retarder, zone ${rk === "4C" ? "marine 4" : rk}, ${frame} wall`,
        required: `continuous insulation ≥ ${r(need)} outboard${R702_7_3[edition][rk].vented ? `, or vented cladding over ${R702_7_3[edition][rk].vented === "fibreboard-gypsum" ? "fibreboard or gypsum" : "wood structural panel, fibreboard or gypsum"}` : ""} — or a Class I/II interior retarder`,
        provided: `${r(s.ciOutboard)} continuous outboard; interior Class ${interiorClass === "none" ? "none (above 10 perm)" : interiorClass}${vc.vented ? "; vented cladding" : ""}`,
        pass: !classIII || ciPass || ventOk,
        note: !classIII
          ? `A Class ${interiorClass} interior retarder is used, so this table does not govern.`
          : ciPass
            ? "Enough continuous insulation for a Class III interior retarder."
            : ventOk
              ? "Vented cladding over a qualifying sheathing permits Class III."
              : `Too little continuous insulation for a Class III interior retarder: add insulation to ${r(need)} or use a Class II interior retarder.`,
      });
    }
  }
  return rows;
}
