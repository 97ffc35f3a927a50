// Labels and search synonyms for the catalogue's facets. Shared by server and client (pure imports only).
import { MOISTURE_REGIME_LABELS } from "~/vocabulary/climate-zones";

export const FACET_LABELS = {
  zone: "Climate zone",
  regime: "Moisture regime",
  assembly: "Assembly",
  substrate: "Substrate",
  belowGrade: "Below grade",
  strategy: "Insulation strategy",
  interiorClass: "Interior retarder class",
  tier: "Access",
} as const;

export type FacetKey = keyof typeof FACET_LABELS;

export const VALUE_LABELS: Record<string, string> = {
  // moisture regimes (ASHRAE 169 / IECC R301)
  ...MOISTURE_REGIME_LABELS,
  // assemblies
  "above-grade-wall": "Above-grade wall",
  roof: "Roof or ceiling",
  floor: "Floor over unconditioned space",
  "crawlspace-wall": "Crawlspace wall",
  "crawlspace-floor": "Crawlspace floor",
  "basement-wall": "Basement wall",
  slab: "Slab on grade",
  "rim-joist": "Rim joist",
  // substrates
  "wood-frame": "Wood frame",
  "cast-concrete": "Cast concrete",
  "concrete-block": "Concrete block",
  icf: "Insulated concrete form",
  "wood-roof-deck": "Wood roof deck",
  "wood-floor-framing": "Wood floor framing",
  // below grade
  none: "Above grade",
  "vented-crawlspace": "Vented crawlspace",
  "sealed-crawlspace": "Sealed crawlspace",
  basement: "Basement",
  "slab-on-grade": "Slab on grade",
  // strategies
  "cavity-only": "Cavity only",
  "exterior-continuous": "Exterior continuous",
  "cavity-plus-exterior": "Cavity plus exterior",
  "interior-continuous": "Interior continuous",
  "spray-foam": "Spray foam",
  "flash-and-batt": "Flash and batt",
  "insulated-form": "Insulated form",
  "under-slab": "Under slab",
  // interior retarder class (IRC R702.7)
  I: "Class I",
  II: "Class II",
  III: "Class III",
  // tiers
  free: "Free",
  premium: "Premium",
};

// Values whose label depends on the facet they belong to.
const FACET_VALUE_LABELS: Partial<Record<FacetKey, Record<string, string>>> = {
  interiorClass: { none: "No interior retarder" },
};

export function labelFor(value: string, facet?: FacetKey): string {
  return (facet && FACET_VALUE_LABELS[facet]?.[value]) ?? VALUE_LABELS[value] ?? value;
}

/** Plain words for the site values the engine filled in from zone defaults. */
export const SITE_DEFAULT_LABELS: Record<string, string> = {
  "winter.t_c": "winter design temperature",
  "winter.rh": "winter outdoor humidity",
  "summer.t_c": "summer design temperature",
  "summer.rh": "summer outdoor humidity",
  "summer.cladding_t_c": "sun-warmed cladding temperature",
  ground_t_c: "ground temperature",
  "indoor.t_c": "indoor winter temperature",
  "indoor.rh": "indoor winter humidity",
  "indoor.summer_t_c": "indoor summer temperature",
  "indoor.summer_rh": "indoor summer humidity",
  edition: "code edition (2021)",
};

/** Trade words people type, mapped to the words details are written with. */
export const SEARCH_SYNONYMS: Record<string, string[]> = {
  "crawl space": ["crawlspace"],
  crawlspace: ["crawl space"],
  poly: ["polyethylene", "vapour barrier"],
  "vapor barrier": ["vapour retarder", "polyethylene"],
  "vapour barrier": ["vapour retarder", "polyethylene"],
  "vapor retarder": ["vapour retarder"],
  "rigid foam": ["xps", "eps", "polyiso", "foam board"],
  "foam board": ["rigid foam"],
  "spray foam": ["spf", "closed-cell", "open-cell"],
  spf: ["spray foam"],
  housewrap: ["water-resistive barrier", "wrb"],
  wrb: ["water-resistive barrier", "housewrap"],
  ci: ["continuous insulation", "exterior insulation"],
  "continuous insulation": ["exterior insulation"],
  rainscreen: ["drainage gap", "vented air space", "furring"],
  "rim joist": ["band joist", "rim"],
  "band joist": ["rim joist"],
  foundation: ["basement", "crawlspace", "slab"],
  "smart vapor retarder": ["variable-permeance retarder"],
  "smart retarder": ["variable-permeance retarder"],
};
