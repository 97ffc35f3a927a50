import { QueryTypes } from "sequelize";
import { liveDetailSql, sequelize } from "~/models/index.server";
import type { Suggestion } from "./suggestions";
import { SEARCH_SYNONYMS, labelFor } from "./vocabulary";

// The typeahead corpus stays small even for a large library: the newest titles, every material, the trade terms.
const TITLE_LIMIT = 1500;

export async function suggestionCorpus(): Promise<Suggestion[]> {
  const [details, materials] = await Promise.all([
    sequelize.query<{ slug: string; title: string; assembly: string }>(
      `SELECT d.slug, d.title, d.assembly FROM details d WHERE ${liveDetailSql("d")}
        ORDER BY d.published_at DESC LIMIT ${TITLE_LIMIT}`,
      { type: QueryTypes.SELECT },
    ),
    sequelize.query<{ name: string; family: string }>("SELECT name, family FROM materials ORDER BY name", {
      type: QueryTypes.SELECT,
    }),
  ]);
  return [
    ...details.map((d) => ({
      kind: "detail" as const,
      text: d.title,
      hint: labelFor(d.assembly),
      href: `/details/${d.slug}`,
    })),
    ...materials.map((m) => ({ kind: "material" as const, text: m.name, hint: "material" })),
    ...Object.keys(SEARCH_SYNONYMS).map((term) => ({ kind: "term" as const, text: term, hint: "trade term" })),
  ];
}
