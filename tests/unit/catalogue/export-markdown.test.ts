import { readdirSync, readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { exportDetailMarkdown } from "~/catalogue/export-markdown";
import { parseDetail } from "~/content/parse-detail";

// The oracle is the project's own content parser: an exported detail must read back as the same detail.
const files = readdirSync("content/details").filter((name) => name.endsWith(".md"));

test("every content file survives export and re-parse unchanged", () => {
  expect(files.length).toBeGreaterThan(0);
  for (const file of files) {
    const {
      body,
      bodyStartLine: _line,
      file: _file,
      ...frontMatter
    } = parseDetail(file, readFileSync(`content/details/${file}`, "utf8"));
    const exported = exportDetailMarkdown(frontMatter, body);
    const again = parseDetail(file, exported);
    const { body: body2, bodyStartLine: _l2, file: _f2, ...frontMatter2 } = again;
    expect(frontMatter2, file).toEqual(frontMatter);
    expect(body2.trim(), file).toBe(body.trim());
  }
});

test("the export opens with front matter in the content format's key order", () => {
  const {
    body,
    bodyStartLine: _line,
    file: _file,
    ...frontMatter
  } = parseDetail(files[0], readFileSync(`content/details/${files[0]}`, "utf8"));
  const exported = exportDetailMarkdown(frontMatter, body);
  expect(exported.startsWith("---\nslug: ")).toBe(true);
  const keys = exported
    .split("\n---")[0]
    .split("\n")
    .filter((line) => /^[a-z_]+:/.test(line))
    .map((line) => line.split(":")[0]);
  expect(keys.indexOf("title")).toBeLessThan(keys.indexOf("layers"));
  expect(keys.at(-1)).toBe("layers");
});
