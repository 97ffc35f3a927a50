import { BODY_SECTION_HEADINGS, bodySection } from "~/vocabulary/body-sections";
import { labelFor } from "./vocabulary";

/** Markdown reduced to plain words for the FULLTEXT index. */
export function plainText(markdown: string): string {
  return markdown
    .replace(/```[\s\S]*?```/g, " ")
    .replace(/!\[[^\]]*\]\([^)]*\)/g, " ")
    .replace(/\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/[#>*_`|~-]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

export interface SearchableDetail {
  assembly: string;
  substrate: string;
  below_grade: string;
  strategy: string;
  layers: { role: string; material: string }[];
  references: string[];
  body: string;
}

// How much of the rationale is indexed: the opening of "Why it works" says what the detail is about.
// Indexing whole bodies made every common trade word's posting list long and searches 3-4x slower at
// 10,000 details (npm run bench), for little gain in finding the right detail.
const RATIONALE_CHARS = 600;

/** Everything a builder might type to find a detail besides its title and summary. */
export function buildSearchText(detail: SearchableDetail, materialName: (slug: string) => string): string {
  const facets = [detail.assembly, detail.substrate, detail.below_grade, detail.strategy].map((value) =>
    labelFor(value),
  );
  const layers = detail.layers.map((layer) => `${materialName(layer.material)} ${layer.role.replaceAll("-", " ")}`);
  const rationale = plainText(bodySection(detail.body, BODY_SECTION_HEADINGS["why-it-works"]) || detail.body).slice(
    0,
    RATIONALE_CHARS,
  );
  return [...facets, ...layers, ...detail.references, rationale].join(" · ");
}
