import { readdirSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { RULES } from "~/envelope/rules";

test("every rule has a unique id, a source and its own test file", () => {
  const ids = RULES.map((r) => r.id);
  expect(new Set(ids).size).toBe(ids.length);
  const files = new Set(readdirSync(join(__dirname)).filter((f) => f.endsWith(".test.ts")));
  for (const rule of RULES) {
    expect(rule.source.length, rule.id).toBeGreaterThan(5);
    expect(files.has(`${rule.id}.test.ts`), rule.id).toBe(true);
  }
});
