// Runs every demo detail through the site check for each climate zone it claims and prints the
// stop and caution flags and the failing code rows, so editors can revise details or explain them.
// Usage: npx tsx scripts/check-content.ts [content-folder] [--all] [--json]
//   --all   also print passing code rows and note-level flags
//   --json  print one JSON line per detail and zone instead of text
import path from "node:path";
import { formatProblem } from "../app/content/content-error.ts";
import { loadContent } from "../app/content/load-content.ts";
import type { Material } from "../app/envelope/material-schema.ts";
import { runSiteCheck } from "../app/envelope/site-check.ts";

const args = process.argv.slice(2);
const showAll = args.includes("--all");
const asJson = args.includes("--json");
const root = path.resolve(args.find((arg) => !arg.startsWith("--")) ?? "content");

const content = loadContent(root);
if (content.errors.length > 0) {
  for (const problem of content.errors) console.error(formatProblem(problem));
  console.error(`${content.errors.length} content problem(s); fix them before the site check.`);
  process.exit(1);
}
if (!content.materials) {
  console.error(`${root} has no materials/ folder; the site check needs the material library.`);
  process.exit(1);
}
const library = new Map<string, Material>(content.materials.map((entry) => [entry.slug, entry.material]));

let stops = 0;
let failingRows = 0;
let checks = 0;
for (const detail of content.details) {
  for (const zone of detail.zones) {
    checks++;
    const result = runSiteCheck({ kind: detail.assembly, layers: detail.layers }, { zone }, library);
    const flags = result.flags.filter((flag) => showAll || flag.severity !== "note");
    const rows = result.code.rows.filter((row) => showAll || !row.pass);
    stops += result.flags.filter((flag) => flag.severity === "stop").length;
    failingRows += result.code.rows.filter((row) => !row.pass).length;
    if (asJson) {
      console.log(JSON.stringify({ slug: detail.slug, zone, r_ip: result.thermal.r_ip, flags, rows }));
      continue;
    }
    if (flags.length === 0 && rows.length === 0) continue;
    console.log(`\n${detail.slug} @ ${zone}  (R-${result.thermal.r_ip.toFixed(1)}, ${detail.tier})`);
    for (const flag of flags) console.log(`  [${flag.severity}] ${flag.id}: ${flag.title}`);
    for (const row of rows) {
      console.log(
        `  [code ${row.pass ? "pass" : "FAIL"}] ${row.label}: required ${row.required}, provided ${row.provided}`,
      );
    }
  }
}
if (!asJson) {
  console.log(
    `\n${content.details.length} details, ${checks} detail-zone checks: ${stops} stop flag(s), ${failingRows} failing code row(s).`,
  );
}
process.exit(stops > 0 ? 2 : 0);
