// Labels and search synonyms for the catalogue's facets. Shared by server and client (no imports).

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
  A: "Moist (A)",
  B: "Dry (B)",
  C: "Marine (C)",
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

export function labelFor(value: string): string {
  return VALUE_LABELS[value] ?? value;
}

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
  "ci": ["continuous insulation", "exterior insulation"],
  "continuous insulation": ["exterior insulation"],
  rainscreen: ["drainage gap", "vented air space", "furring"],
  "rim joist": ["band joist", "rim"],
  "band joist": ["rim joist"],
  foundation: ["basement", "crawlspace", "slab"],
  "smart vapor retarder": ["variable-permeance retarder"],
  "smart retarder": ["variable-permeance retarder"],
};
