import { BODY_SECTION_HEADINGS } from "~/vocabulary/body-sections";

/** The parts of a revision a reviewer comments on, in page order. Stored as review_comments.section. */
export const REVIEW_SECTIONS = [
  "metadata",
  "layers",
  "why-it-works",
  "install-sequence",
  "cautions",
  "references",
] as const;
export type ReviewSection = (typeof REVIEW_SECTIONS)[number];

/** How each commentable part is named on the review page. */
export const REVIEW_SECTION_LABELS: Record<ReviewSection, string> = {
  metadata: "Metadata",
  layers: "Layers",
  ...BODY_SECTION_HEADINGS,
  references: "References",
};
