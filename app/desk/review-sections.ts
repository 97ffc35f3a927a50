/** The parts of a revision a reviewer comments on, in page order. */
export const REVIEW_SECTIONS = ["metadata", "layers", "why-it-works", "install-sequence", "cautions", "references"] as const;
export type ReviewSection = (typeof REVIEW_SECTIONS)[number];

/** How each commentable part is named on the review page. */
export const REVIEW_SECTION_LABELS: Record<ReviewSection, string> = {
  metadata: "Metadata",
  layers: "Layers",
  "why-it-works": "Why it works",
  "install-sequence": "Install sequence",
  cautions: "Cautions",
  references: "References",
};
