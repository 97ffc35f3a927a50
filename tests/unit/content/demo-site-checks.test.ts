// Every demo detail is run through its own site check at every zone it claims. A stop or caution
// there must be answered in the detail's front matter (site_check_flags, with the reason), or the
// detail must be revised or claim fewer zones (docs/content-format.md).
import path from "node:path";
import { expect, test } from "vitest";
import { loadContent } from "~/content/load-content";
import { buildMaterialLibrary, runSiteCheck } from "~/envelope";

const loaded = loadContent(path.resolve(__dirname, "../../../content"));
const lib = buildMaterialLibrary((loaded.materials ?? []).map((m) => m.material));

const checks = loaded.details.flatMap((detail) =>
  detail.zones.map((zone) => ({
    detail,
    zone,
    flags: runSiteCheck({ kind: detail.assembly, layers: detail.layers }, { zone }, lib).flags,
  })),
);

test("no demo detail claims a zone where its own site check stops or cautions without saying why", () => {
  const unanswered: string[] = [];
  for (const { detail, zone, flags } of checks) {
    for (const flag of flags) {
      if (flag.severity === "note") continue;
      const answered = (detail.site_check_flags ?? []).some(
        (a) => flag.id === a.flag && (a.zones === undefined || a.zones.includes(zone as never)),
      );
      if (!answered) unanswered.push(`${detail.slug} @ ${zone}: ${flag.id} (${flag.severity})`);
    }
  }
  expect(unanswered).toEqual([]);
});

test("no demo detail carries a stop in a zone it claims, whatever it says", () => {
  const stops = checks.flatMap(({ detail, zone, flags }) =>
    flags.filter((f) => f.severity === "stop").map((f) => `${detail.slug} @ ${zone}: ${f.id}`),
  );
  expect(stops).toEqual([]);
});

test("every answered flag still arises in a zone it names (no stale reasons)", () => {
  for (const detail of loaded.details) {
    for (const accepted of detail.site_check_flags ?? []) {
      const zones = accepted.zones ?? detail.zones;
      const raised = checks.some(
        (c) =>
          c.detail === detail &&
          zones.includes(c.zone as never) &&
          c.flags.some((f) => f.id === accepted.flag && f.severity !== "note"),
      );
      expect(raised, `${detail.slug}: ${accepted.flag}`).toBe(true);
    }
  }
});

test("no detail states the conditions its site check ran at: only the engine's result says that", () => {
  for (const detail of loaded.details) {
    expect(detail.body, detail.slug).not.toMatch(/checked at|design day \(indoor|indoor \d+ ?°C ?\/ ?\d+ ?%/i);
  }
});
