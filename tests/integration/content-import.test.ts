import { cpSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";

useMigratedDatabase();

function copyOfContent(): string {
  const dir = mkdtempSync(join(tmpdir(), "dryside-content-"));
  cpSync("content", dir, { recursive: true });
  return dir;
}

async function counts() {
  const { Detail, DetailRevision, MaterialRecord, DetailSet } = await import("~/models/index.server");
  return {
    details: await Detail.count(),
    revisions: await DetailRevision.count(),
    materials: await MaterialRecord.count(),
    sets: await DetailSet.count(),
  };
}

test("a content file with a bad field is rejected with its file, line and field, and nothing is written", async () => {
  const dir = copyOfContent();
  const file = readdirSync(join(dir, "details")).sort()[0];
  const path = join(dir, "details", file);
  const lines = readFileSync(path, "utf8").split("\n");
  const tierLine = lines.findIndex((line) => line.startsWith("tier:"));
  lines[tierLine] = "tier: platinum";
  writeFileSync(path, lines.join("\n"));

  const { importContent, ImportRejected } = await import("~/catalogue/import.server");
  const error = await importContent(dir).catch((e: unknown) => e);
  expect(error).toBeInstanceOf(ImportRejected);
  const problems = (error as InstanceType<typeof ImportRejected>).problems;
  expect(problems).toEqual([expect.objectContaining({ file: `details/${file}`, line: tierLine + 1, field: "tier" })]);
  expect(await counts()).toEqual({ details: 0, revisions: 0, materials: 0, sets: 0 });
});

test("the demo library imports whole, and a second import changes nothing", async () => {
  const { importContent } = await import("~/catalogue/import.server");
  const first = await importContent("content");
  const files = readdirSync("content/details").filter((name) => name.endsWith(".md")).length;
  expect(first.details.created).toBe(files);
  expect(files).toBeGreaterThanOrEqual(36);
  const after = await counts();
  expect(after.details).toBe(files);
  expect(after.revisions).toBe(files);
  expect(after.sets).toBeGreaterThanOrEqual(4);

  const second = await importContent("content");
  expect(second.details).toMatchObject({ created: 0, revised: 0, unchanged: files });
  expect(second.materials).toMatchObject({ created: 0, updated: 0 });
  expect(await counts()).toEqual(after);
});

test("raising a file's revision adds a revision and supersedes the published one", async () => {
  const dir = copyOfContent();
  const file = readdirSync(join(dir, "details")).sort()[1];
  const path = join(dir, "details", file);
  const text = readFileSync(path, "utf8");
  const revision = Number(/^revision: (\d+)$/m.exec(text)![1]);
  let next = text
    .replace(/^revision: \d+$/m, `revision: ${revision + 1}`)
    .replace(/^revised: .*$/m, "revised: 2026-11-30");
  if (!/^revised:/m.test(next)) next = next.replace(/^revision: .*$/m, (line) => `${line}\nrevised: 2026-11-30`);
  next = /^change_note:/m.test(next)
    ? next.replace(/^change_note: .*$/m, 'change_note: "Install sequence clarified for the crew."')
    : next.replace(/^revision: .*$/m, (line) => `${line}\nchange_note: "Install sequence clarified for the crew."`);
  writeFileSync(path, next.replace("## Install sequence", "## Install sequence\n\nRead every step before starting."));

  const { importContent } = await import("~/catalogue/import.server");
  const summary = await importContent(dir);
  expect(summary.details.revised).toBe(1);

  const { Detail, DetailRevision } = await import("~/models/index.server");
  const detail = await Detail.findOne({ where: { slug: file.replace(/\.md$/, "") } });
  const revisions = await DetailRevision.findAll({ where: { detailId: detail!.id }, order: [["number", "ASC"]] });
  expect(revisions.map((r) => [r.number, r.state])).toEqual([
    [revision, "superseded"],
    [revision + 1, "published"],
  ]);
  expect(detail!.publishedRevisionId).toBe(revisions[1].id);
});
