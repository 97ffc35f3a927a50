import { Detail, DetailRevision } from "~/models/index.server";

export interface LibraryOverview {
  publishedCount: number;
  freeCount: number;
  recentRevisions: { slug: string; title: string; number: number; publishedAt: string; changeNote: string | null }[];
}

/** What the home page shows: the size of the library and what was revised lately. */
export async function getLibraryOverview(): Promise<LibraryOverview> {
  const [publishedCount, freeCount, recent] = await Promise.all([
    Detail.scope("live").count(),
    Detail.scope("live").count({ where: { tier: "free" } }),
    DetailRevision.findAll({
      where: { state: "published" },
      include: [{ model: Detail, as: "detail", attributes: ["slug"], required: true }],
      order: [["publishedAt", "DESC"]],
      limit: 5,
    }),
  ]);
  return {
    publishedCount,
    freeCount,
    recentRevisions: recent.map((revision) => ({
      slug: (revision.get("detail") as Detail).slug,
      title: revision.title,
      number: revision.number,
      publishedAt: (revision.publishedAt ?? revision.createdAt).toISOString(),
      changeNote: revision.changeNote,
    })),
  };
}
