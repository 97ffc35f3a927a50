import { createHash } from "node:crypto";
import { expect, test } from "vitest";
import { contentHash } from "~/vocabulary/content-hash.server";

test("the content hash is SHA-256 (hex) of the front matter and body, as stored hashes were made", () => {
  const front = { slug: "a", title: "A" };
  const expected = createHash("sha256")
    .update(JSON.stringify({ frontMatter: front, body: "## Why it works\n" }))
    .digest("hex");
  expect(contentHash(front, "## Why it works\n")).toBe(expected);
  expect(contentHash(front, "## Why it works\n")).toMatch(/^[0-9a-f]{64}$/);
});

test('the primitive is SHA-256: the "abc" test vector of FIPS 180-2 Appendix B.1 (from memory)', () => {
  expect(createHash("sha256").update("abc").digest("hex")).toBe(
    "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
  );
});

test("any change to the front matter or the body changes the hash", () => {
  const base = contentHash({ slug: "a" }, "body");
  expect(contentHash({ slug: "b" }, "body")).not.toBe(base);
  expect(contentHash({ slug: "a" }, "body ")).not.toBe(base);
  expect(contentHash({ slug: "a" }, "body")).toBe(base);
});
