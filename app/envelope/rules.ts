// Trade rules as flags. Each names its source or says "common practice"; the wording is for a
// builder reading it on site, not for an engineer.
import { isInsulation, materialRsi, type ResolvedAssembly, type ResolvedLayer } from "./layers";
import type { CodeRow, Flag, ProfileCase, ResolvedSite, VapourResult } from "./types";
import { isBelowGrade } from "./thermal";
import { formatTemperature, rsiToRip } from "./units";
import { coreRange, dryCupPermeance, layerPermeance, retarderClass } from "./vapour";
import { summariseInsulation } from "./code-tables";

/** Design-day condensation below this rate is reported as a note: wood sheathing buffers a few
 * grams per square metre a day (Dryside screening threshold, common practice). */
export const SCREENING_RATE_G_M2_DAY = 1;

export interface RuleContext {
  assembly: ResolvedAssembly;
  site: ResolvedSite;
  vapour: VapourResult;
  winter: ProfileCase;
  summer: ProfileCase;
  codeRows: CodeRow[];
}

const classOf = (l: ResolvedLayer) => retarderClass(layerPermeance(l));
const isFoam = (l: ResolvedLayer): boolean => l.material.foam_plastic;
const isSheetRetarder = (l: ResolvedLayer): boolean => l.material.family === "sheet-retarder" || (l.material.family === "membrane" && classOf(l) === "I");
const innermostInsulation = (a: ResolvedAssembly): number => a.layers.reduce((m, l) => (isInsulation(l) ? l.index : m), -1);
const outermostInsulation = (a: ResolvedAssembly): number => a.layers.findIndex(isInsulation);

/** Absorptive ("reservoir") cladding: stores rain and drives vapour inward in sun. */
export function isReservoirCladding(l: ResolvedLayer): boolean {
  return (l.input.role === "cladding" || l.input.role === "roofing") &&
    (l.material.family === "masonry" || l.material.family === "concrete" || l.material.water_sensitive);
}

const isDrainageGap = (l: ResolvedLayer): boolean =>
  l.input.role === "drainage-gap" || l.material.family === "air-space" || l.material.family === "drainage";

/** Humid or cooling-dominated: zones 0–3, and zone 4 moist (common practice reading of IRC R702.7(2)). */
const humidOrCooling = (s: ResolvedSite): boolean => s.zoneNumber <= 3 || (s.zoneNumber === 4 && s.moisture === "A");

function thermalBarrierInboard(a: ResolvedAssembly, from: number): boolean {
  return a.layers.slice(from + 1).some((l) =>
    (l.material.family === "gypsum" && l.thickness_mm >= 12.7 - 0.3) ||
    ((l.material.family === "concrete" || l.material.family === "masonry") && l.thickness_mm >= 25.4));
}

/** IRC R316.5.3/R316.5.4 ignition-barrier alternatives (REFERENCES §8): 3/8 in gypsum, 1/4 in wood
 * structural panel, fibre-cement or hardboard, 1½ in mineral fibre, a listed coating. */
function isIgnitionBarrier(l: ResolvedLayer): boolean {
  const m = l.material;
  if (m.slug === "ignition-barrier-coating" || l.input.role === "thermal-barrier") return true;
  if (m.family === "gypsum") return l.thickness_mm >= 9.5 - 0.2;
  if (m.family === "wood-panel" || m.family === "cladding") return l.thickness_mm >= 6.35 - 0.2;
  if (m.family === "fibrous-insulation") return l.thickness_mm >= 38 - 0.5;
  return m.family === "concrete" || m.family === "masonry" || m.family === "metal";
}

function ignitionBarrierInboard(a: ResolvedAssembly, from: number): boolean {
  return a.layers.slice(from + 1).some(isIgnitionBarrier);
}

export function evaluateRules(ctx: RuleContext): Flag[] {
  const { assembly: a, site, vapour, winter, summer } = ctx;
  const flags: Flag[] = [];
  const layers = a.layers;
  const inner = innermostInsulation(a);
  const outer = outermostInsulation(a);
  const below = isBelowGrade(a.kind);

  // 1. Vapour sandwich: interior Class I sheet with a closed exterior.
  const interiorSheet = layers.find((l) => l.index > inner && isSheetRetarder(l) && classOf(l) === "I");
  const coreFirst = coreRange(a)?.first ?? outer;
  const exteriorClosedLayer = layers.find((l) => l.index < coreFirst &&
    (isFoam(l) || l.material.family === "membrane" || l.material.family === "sheet-retarder") &&
    (classOf(l) === "I" || classOf(l) === "II"));
  if (interiorSheet && exteriorClosedLayer && !below && humidOrCooling(site)) {
    flags.push({
      id: "interior-sheet-with-closed-exterior",
      severity: "stop",
      title: "Vapour barrier on both sides in a humid climate",
      explanation: `The ${interiorSheet.material.name.toLowerCase()} inside and the ${exteriorClosedLayer.material.name.toLowerCase()} outside leave the framing no way to dry, and in zone ${site.zone} summer vapour drives inward onto the interior sheet. Leave out the interior sheet (use a Class III finish or a variable-permeance retarder).`,
      source: "IRC 2021 Table R702.7(2) (Class I interior not permitted in zones 1–4 except marine 4), M; common practice",
    });
  } else if (vapour.bothSidesClosed && !below) {
    flags.push({
      id: "both-sides-closed",
      severity: "caution",
      title: "Closed to drying on both sides",
      explanation: `${vapour.explanation} Wood and fibrous layers caught between two closed sides cannot dry if they get wet during construction or from a leak. Open one side, or make sure nothing between them is moisture-sensitive.`,
      source: "common practice",
    });
  }

  // 2. Foam pressed flat against a WRB with no drainage gap behind absorptive cladding.
  const reservoir = layers.find(isReservoirCladding);
  for (let i = 0; i + 1 < layers.length; i++) {
    const pair = [layers[i], layers[i + 1]];
    const foam = pair.find((l) => isFoam(l) && l.material.family === "foam-board");
    const wrb = pair.find((l) => l.input.role === "water-resistive-barrier");
    if (!foam || !wrb) continue;
    const gapOutboard = layers.slice(0, Math.min(foam.index, wrb.index)).some(isDrainageGap);
    if (gapOutboard) continue;
    flags.push({
      id: "foam-against-wrb-no-gap",
      severity: reservoir ? "caution" : "note",
      title: "Rigid foam tight to the water-resistive barrier with no drainage gap",
      explanation: `Water that gets past the cladding is held between the ${foam.material.name.toLowerCase()} and the ${wrb.material.name.toLowerCase()} with nowhere to drain${reservoir ? `, and the ${reservoir.material.name.toLowerCase()} stores rain that sun drives inward` : ""}. Add a drainage gap (furring, a drainage mat or a textured wrap) outboard of the foam.`,
      source: "common practice",
    });
    break;
  }

  // 3. Solvent-based adhesive on polystyrene.
  for (const l of layers) {
    if (l.input.adhesive !== "solvent-based") continue;
    const touched = [layers[l.index - 1], l, layers[l.index + 1]].filter((x): x is ResolvedLayer => x !== undefined && x.material.solvent_sensitive);
    if (touched.length === 0) continue;
    flags.push({
      id: "solvent-adhesive-on-polystyrene",
      severity: "stop",
      title: "Solvent-based adhesive on polystyrene foam",
      explanation: `Solvents dissolve ${touched[0].material.name.toLowerCase()}. Use an adhesive the foam maker lists as compatible (usually water-based) or fasten mechanically.`,
      source: "common practice (foam manufacturers' installation instructions)",
    });
    break;
  }

  // 4. Foam plastic: thermal barrier (R316.4) or ignition barrier in crawl spaces (R316.5.4); rim
  // joists may go without up to 3¼ in (R316.5.11).
  const lastFoam = [...layers].reverse().find(isFoam);
  if (lastFoam) {
    const exposed = lastFoam.input.exposed === true || lastFoam.index === layers.length - 1;
    if (a.kind === "crawlspace-wall" || a.kind === "crawlspace-floor") {
      if (exposed || !ignitionBarrierInboard(a, lastFoam.index)) {
        flags.push({
          id: "foam-crawlspace-no-ignition-barrier",
          severity: "caution",
          title: "Foam plastic in a crawl space without an ignition barrier",
          explanation: `The ${lastFoam.material.name.toLowerCase()} faces the crawl space. Cover it with an ignition barrier (e.g. 3/8 in gypsum, 1/4 in wood structural panel, 1½ in mineral fibre, or a listed coating) unless the foam is tested for exposure.`,
          source: "IRC 2021 R316.5.4; alternatives per R316.5.3 (REFERENCES §8), C",
        });
      }
    } else if (a.kind === "rim-joist" && exposed && lastFoam.thickness_mm <= 82.6) {
      flags.push({
        id: "foam-rim-joist-exposed",
        severity: "note",
        title: "Exposed foam at the rim joist",
        explanation: `Foam up to 3¼ in thick may stay exposed at rim joists when its density is 0.5–2.0 lb/ft³ and its flame spread is 25 or less; check the product's listing.`,
        source: "IRC 2018 R316.5.11, C",
      });
    } else if (a.kind === "floor") {
      // Floor over a crawl space or garage: the walking side is covered by the subfloor (a 1/2 in
      // wood structural panel stands in for the thermal barrier); the underside faces the crawl space.
      const covered = a.layers.slice(lastFoam.index + 1).some((l) => (l.material.family === "wood-panel" && l.thickness_mm >= 11.9) || l.material.family === "gypsum");
      const firstFoam = layers.find(isFoam) as ResolvedLayer;
      const undersideBarrier = layers.slice(0, firstFoam.index).some(isIgnitionBarrier);
      if (!covered) {
        flags.push({
          id: "foam-floor-not-covered",
          severity: "stop",
          title: "Foam in a floor without a covering panel",
          explanation: `The ${lastFoam.material.name.toLowerCase()} needs at least a 1/2 in wood structural panel (or a thermal barrier) between it and the room above.`,
          source: "IRC 2021 R316.5.13 (floors), M; R316.4, C2",
        });
      }
      if (!undersideBarrier) {
        flags.push({
          id: "foam-crawlspace-no-ignition-barrier",
          severity: "caution",
          title: "Foam under the floor without an ignition barrier",
          explanation: `The underside of the ${firstFoam.material.name.toLowerCase()} faces the crawl space. Cover it with an ignition barrier (e.g. 3/8 in gypsum, 1/4 in wood structural panel, 1½ in mineral fibre, or a listed coating) unless the foam is tested for exposure.`,
          source: "IRC 2021 R316.5.4; alternatives per R316.5.3 (REFERENCES §8), C",
        });
      }
    } else if (a.kind !== "slab" && (exposed || !thermalBarrierInboard(a, lastFoam.index))) {
      flags.push({
        id: "foam-no-thermal-barrier",
        severity: "stop",
        title: "Foam plastic exposed to the interior",
        explanation: `The ${lastFoam.material.name.toLowerCase()} needs a thermal barrier between it and the living space: 1/2 in gypsum board or an approved equivalent.`,
        source: "IRC 2021 R316.4 (1/2 in gypsum, 15-minute thermal barrier), C2",
      });
    }
  }

  // 5. Below grade: insulation that takes on water, or foam in reach of insects.
  if (below) {
    const structureIdx = layers.findIndex((l) => l.input.role === "structure");
    const wet = layers.find((l) => isInsulation(l) && l.material.water_sensitive);
    if (wet) {
      const touchesConcrete = [layers[wet.index - 1], layers[wet.index + 1]].some((l) => l && (l.material.family === "concrete" || l.material.family === "masonry"));
      flags.push({
        id: "below-grade-water-sensitive-insulation",
        severity: touchesConcrete || wet.index < structureIdx ? "stop" : "caution",
        title: "Insulation below grade that absorbs water",
        explanation: `The ${wet.material.name.toLowerCase()} loses its R-value and can grow mould when it takes on water from the soil or from concrete${touchesConcrete ? " it touches" : ""}. Use a foam or other non-absorbent insulation against concrete and soil.`,
        source: "common practice (REFERENCES §8 below-grade guidance, M)",
      });
    }
    const soilSideFoam = layers.find((l) => l.index < structureIdx && l.material.insect_risk);
    if (soilSideFoam) {
      const protectedBy = layers.slice(0, soilSideFoam.index).some((l) => l.input.role === "soil-side-protection");
      if (!protectedBy) {
        flags.push({
          id: "below-grade-foam-insects",
          severity: site.zoneNumber <= 4 ? "caution" : "note",
          title: "Foam on the soil side without protection",
          explanation: `Insects tunnel through ${soilSideFoam.material.name.toLowerCase()} in contact with soil, and backfill and sun damage it. Protect it on the soil side, and where termites are heavy follow the local code's limits on foam below grade.`,
          source: "IRC 2021 R318.4 (foam plastic in termite areas), M; common practice",
        });
      }
    }
    // 6. Below-grade membrane without a drainage layer outboard.
    if (a.kind === "basement-wall" || a.kind === "crawlspace-wall") {
      const membrane = layers.find((l) => l.index < structureIdx && (l.material.family === "membrane" || l.material.family === "coating" || l.input.role === "soil-side-protection") && !isDrainageGap(l));
      if (membrane && !layers.slice(0, membrane.index).some((l) => isDrainageGap(l) || l.material.family === "aggregate")) {
        flags.push({
          id: "below-grade-membrane-no-drainage",
          severity: "caution",
          title: "Below-grade membrane without a drainage layer",
          explanation: `Water held against the ${membrane.material.name.toLowerCase()} by the soil builds pressure at every flaw. Put a drainage mat, drainage board or free-draining backfill outboard of it, leading to a footing drain.`,
          source: "IRC 2021 R405.1 (foundation drainage) and R406 (dampproofing/waterproofing), M; common practice",
        });
      }
    }
  }

  // 7. Class I interior retarder on a basement wall.
  if (a.kind === "basement-wall" && vapour.interiorClass === "I") {
    flags.push({
      id: "basement-class-i-interior",
      severity: "caution",
      title: "Class I vapour retarder on the inside of a basement wall",
      explanation: "Basement walls are exempt from the interior vapour retarder rule because they take on moisture from the soil and must dry inward. A sheet on the inside traps it against the framing. Use foam against the concrete and leave the interior open.",
      source: "IRC 2021 R702.7 exception (basement walls), C2; common practice",
    });
  }

  // 8. Winter: condensing surface below the indoor dew point. A design day overstates the season,
  // so small rates, and walls that meet IRC R702.7 (which rests on seasonal conditions), are notes.
  if (!below && (winter.margin_c < 0 || winter.condensingPlanes.length > 0)) {
    const condensing = winter.condensingPlanes.length > 0;
    // The code's vapour rows rest on seasonal conditions: a wall or roof that meets them is a note here.
    const failingVapourRow = ctx.codeRows.some((r) => r.id.startsWith("irc-r") && !r.pass);
    const passingCiRow = ctx.codeRows.some((r) => (r.id === "irc-r702-7-3" || r.id === "irc-r806-5") && r.pass);
    const classIIIPermittedWithoutCi = a.kind === "above-grade-wall" && (site.zoneNumber <= 3 || (site.zoneNumber === 4 && site.moisture !== "C"));
    const codeOk = !failingVapourRow && (passingCiRow || classIIIPermittedWithoutCi);
    const serious = condensing && !codeOk && winter.rate_g_m2_day >= SCREENING_RATE_G_M2_DAY;
    const surface = winter.firstCondensingSurface;
    flags.push({
      id: "winter-condensing-surface",
      severity: serious ? "caution" : "note",
      title: condensing ? "Winter condensation inside the assembly" : "Sheathing below the indoor dew point",
      explanation: condensing
        ? `At the winter design condition the ${surface?.label} is at ${formatTemperature(surface?.t_c ?? 0, "ip")} / ${formatTemperature(surface?.t_c ?? 0, "si")}, below the indoor dew point (${formatTemperature(winter.sourceDewPoint_c, "si")}), and the diffusion calculation collects ${winter.rate_g_m2_day.toFixed(1)} g/(m²·day) there on that day. ${codeOk ? "The assembly meets the code's vapour-retarder and continuous-insulation rows, whose limits rest on seasonal conditions; a design day overstates the seasonal total." : "Warm that surface with exterior insulation, or add a tighter interior retarder; a design day overstates the seasonal total, so a hygrothermal analysis can settle it."}`
        : `The ${winter.marginSurface} is ${(-winter.margin_c).toFixed(1)} K below the indoor dew point at the winter design condition; the interior retarder keeps diffusion below saturation, so this depends on that retarder and on air-tightness.`,
      source: "steady-state dew-point method (ASHRAE HoF ch.25/27), M; REFERENCES §7.1 (JLC) and §8 (first condensing surface), C/C2",
    });
  }

  // 9. Summer inward drive condensing on an interior sheet. Below grade the cool soil side can
  // instead collect indoor vapour driven outward; that is reported in its own words.
  if (summer.condensingPlanes.length > 0) {
    const sheetPlane = summer.condensingPlanes.find((pl) => [layers[pl.interfaceIndex], layers[pl.interfaceIndex - 1]].some((l) => l !== undefined && l.index > inner && isSheetRetarder(l)));
    const onSheet = sheetPlane !== undefined;
    const plane = sheetPlane ?? summer.firstCondensingSurface;
    const where = `${plane?.label} reaches ${formatTemperature(plane?.t_c ?? 0, "si")}`;
    const rate = `${summer.rate_g_m2_day.toFixed(1)} g/(m²·day)`;
    if (below && summer.interior.p_v_pa > summer.exterior.p_v_pa) {
      flags.push({
        id: "below-grade-summer-condensation",
        severity: "note",
        title: "Summer indoor humidity condenses toward the cool ground",
        explanation: `${summer.description}: ${where}, below the dew point of the indoor air, so indoor vapour diffusing outward collects there (${rate} on the design basis). Keep the basement dehumidified in summer, or close the interior face of the insulation.`,
        source: "steady-state dew-point method, M; common practice",
      });
    } else {
      flags.push({
        id: onSheet ? "summer-condensation-interior-sheet" : "summer-inward-condensation",
        severity: onSheet ? "stop" : "caution",
        title: onSheet ? "Summer condensation on the interior vapour barrier" : "Summer inward vapour drive condenses inside",
        explanation: `${summer.description}: ${where}, below the dew point of the incoming vapour, collecting ${rate}. ${onSheet ? "Remove the interior sheet or replace it with a variable-permeance retarder." : "Add a drainage/ventilation gap behind absorptive cladding or a vapour-resistant layer outboard."}`,
        source: "steady-state dew-point method, M; common practice (inward drive behind reservoir cladding)",
      });
    }
  }

  // 10/14. Failed code rows.
  for (const row of ctx.codeRows) {
    if (row.pass) continue;
    if (row.id === "irc-r702-7-3") {
      flags.push({ id: "exterior-foam-too-thin-for-class-iii", severity: "stop", title: "Exterior insulation too thin for a Class III interior", explanation: `${row.label}: requires ${row.required}; provided ${row.provided}. ${row.note}`, source: `${row.label}, C2/M` });
    } else if (row.id === "irc-r702-7-class") {
      flags.push({ id: "interior-retarder-not-permitted", severity: "stop", title: "Interior vapour retarder class not permitted here", explanation: `${row.label}: ${row.required}; provided ${row.provided}. ${row.note}`, source: `${row.label}, C/M` });
    } else {
      flags.push({ id: `insufficient-r-${row.id}`, severity: "caution", title: "Less insulation than the code row", explanation: `${row.label}: requires ${row.required}; provided ${row.provided}. Use the performance path or add insulation.`, source: `${row.label}, C` });
    }
  }

  // 11. Hot-humid: exterior foam under 10 % of total R.
  if (site.zoneNumber <= 3 && (a.kind === "above-grade-wall" || a.kind === "roof")) {
    const s = summariseInsulation(a);
    const extFoam = layers.filter((l) => !l.framing && isFoam(l) && l.index < (layers.findIndex((x) => x.framing) === -1 ? inner : layers.findIndex((x) => x.framing)));
    const extR = extFoam.reduce((t, l) => t + rsiToRip(materialRsi(l.material, l.thickness_mm)), 0);
    const totalR = s.cavity + s.ci;
    if (extR > 0 && totalR > 0 && extR < 0.1 * totalR) {
      flags.push({
        id: "hot-humid-exterior-foam-under-10pct",
        severity: "caution",
        title: "Exterior foam less than 10 % of the total R",
        explanation: `Exterior foam gives R-${extR.toFixed(1)} of R-${totalR.toFixed(1)} (${((100 * extR) / totalR).toFixed(0)} %). In zones 1–3 keep it at 10 % or more so its inner face stays above the dew point of air-conditioned indoor air, or leave it out.`,
        source: "DOE/PNNL Building America Solution Center, CZ 1–3 drawing notes (≥ 10 % of total R), C",
      });
    }
  }

  // 12. Sealed crawl space without a Class I ground cover.
  if (a.kind === "crawlspace-floor" && !layers.some((l) => classOf(l) === "I")) {
    flags.push({
      id: "crawlspace-no-class-i-ground-cover",
      severity: "stop",
      title: "No Class I ground cover in the crawl space",
      explanation: "A sealed (unvented) crawl space needs a continuous Class I vapour retarder over the earth, joints lapped 6 in and sealed, run 6 in up the stem walls and attached.",
      source: "IRC 2021 R408.3 item 1, C2",
    });
  }

  // 13. Open-cell spray foam in a cold-zone roof without a retarder.
  if (a.kind === "roof" && (site.zoneNumber >= 5 || (site.zoneNumber === 4 && site.moisture === "C"))) {
    // Open-cell foam told from closed-cell by its permeability: above 10 perm per inch.
    const openCell = layers.find((l) => l.material.family === "spray-foam" && retarderClass(dryCupPermeance(l.material, 25.4)) === "permeable");
    if (openCell && (vapour.interiorClass === "III" || vapour.interiorClass === "none")) {
      flags.push({
        id: "open-cell-roof-no-retarder",
        severity: "stop",
        title: "Open-cell spray foam under a cold roof without a vapour retarder",
        explanation: `Indoor vapour passes the ${openCell.material.name.toLowerCase()} and condenses on the cold roof deck in zone ${site.zone}. Add a Class II retarder on the interior (e.g. vapour-retarder primer) or use closed-cell foam or rigid insulation above the deck.`,
        source: "IRC 2021 R806.5 (unvented attics, Class II retarder in zones 5–8 with air-permeable insulation), M; common practice",
      });
    }
  }
  return flags;
}

export { SITE_CHECK_CAUTION as LOCAL_CODE_CAUTION } from "~/vocabulary/caution";
