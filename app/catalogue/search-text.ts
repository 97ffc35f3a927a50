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

/** Everything a builder might type to find a detail besides its title and summary. */
export function buildSearchText(detail: SearchableDetail, materialName: (slug: string) => string): string {
  const facets = [detail.assembly, detail.substrate, detail.below_grade, detail.strategy].map((value) => labelFor(value));
  const layers = detail.layers.map((layer) => `${materialName(layer.material)} ${layer.role.replaceAll("-", " ")}`);
  return [...facets, ...layers, ...detail.references, plainText(detail.body)].join(" · ");
}
