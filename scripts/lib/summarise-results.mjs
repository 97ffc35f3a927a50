// Prints the one closing line of npm test: "N passed, N failed" over every vitest run.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

const dir = process.argv[2];
let passed = 0,
  failed = 0,
  skipped = 0,
  missing = [];
for (const name of ["vitest.json", "e2e.json"]) {
  try {
    const report = JSON.parse(readFileSync(join(dir, name), "utf8"));
    passed += report.numPassedTests;
    failed += report.numFailedTests + (report.numFailedTestSuites ?? 0);
    skipped += report.numPendingTests + report.numTodoTests;
  } catch {
    missing.push(name.replace(".json", ""));
  }
}
const typecheck = readdirSync(dir).includes("typecheck.txt")
  ? readFileSync(join(dir, "typecheck.txt"), "utf8").trim()
  : "typecheck not run";
if (typecheck !== "typecheck ok") failed += 1;
const lint = readdirSync(dir).includes("lint.txt")
  ? readFileSync(join(dir, "lint.txt"), "utf8").trim()
  : "lint not run";
if (lint !== "lint ok") failed += 1;
if (missing.length) {
  console.log(`(no results from: ${missing.join(", ")})`);
  failed += missing.length;
}
console.log(`${typecheck}; ${lint}; suites: ${missing.length ? "incomplete" : "complete"}`);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed ? 1 : 0);
