export interface Suggestion {
  kind: "detail" | "material" | "term";
  text: string;
  hint: string;
  /** Details open directly; materials and terms become the search text. */
  href?: string;
}
