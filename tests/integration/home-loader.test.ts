import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";

useMigratedDatabase();

test("the home loader reports an empty library before anything is published", async () => {
  const { loader } = await import("~/routes/home");
  const data = await loader();
  expect(data.overview).toEqual({ publishedCount: 0, freeCount: 0, recentRevisions: [] });
});

test("the home loader counts published details and lists the latest revision first", async () => {
  const { Detail, DetailRevision } = await import("~/models/index.server");
  const base = {
    summary: "s",
    searchText: "",
    assembly: "above-grade-wall",
    substrate: "wood-frame",
    belowGrade: "none",
    strategy: "cavity-only",
    interiorClass: "II",
    rValueRsi: 3.2,
    layerStrip: [],
    zonesLabel: "5A",
  };
  const free = await Detail.create({
    ...base,
    slug: "free-wall",
    title: "Free wall",
    tier: "free",
    publishedRevisionId: null,
    publishedAt: new Date("2026-01-01"),
  });
  const paid = await Detail.create({
    ...base,
    slug: "paid-wall",
    title: "Paid wall",
    tier: "premium",
    publishedRevisionId: null,
    publishedAt: new Date("2026-02-01"),
  });
  const revision = {
    summary: "s",
    bodyMd: "b",
    frontMatter: {} as never /* the home loader never reads front matter */,
    authorId: null,
    authorName: "A. Editor",
    contentHash: "0".repeat(64),
    state: "published" as const,
  };
  const r1 = await DetailRevision.create({
    ...revision,
    detailId: free.id,
    number: 1,
    title: "Free wall",
    changeNote: null,
    publishedAt: new Date("2026-01-01"),
  });
  const r2 = await DetailRevision.create({
    ...revision,
    detailId: paid.id,
    number: 2,
    title: "Paid wall",
    changeNote: "Thicker foam",
    publishedAt: new Date("2026-02-01"),
  });
  await free.update({ publishedRevisionId: r1.id });
  await paid.update({ publishedRevisionId: r2.id });

  const { loader } = await import("~/routes/home");
  const { overview } = await loader();
  expect(overview.publishedCount).toBe(2);
  expect(overview.freeCount).toBe(1);
  expect(overview.recentRevisions[0]).toMatchObject({ slug: "paid-wall", number: 2, changeNote: "Thicker foam" });
});
