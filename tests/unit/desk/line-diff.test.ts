import { expect, test } from "vitest";
import { changedHunks, diffLines } from "~/desk/line-diff";

test("a changed line reads as one removal and one addition, with unchanged lines kept in place", () => {
  expect(diffLines("a\nb\nc", "a\nB\nc")).toEqual([
    { kind: "same", text: "a" },
    { kind: "removed", text: "b" },
    { kind: "added", text: "B" },
    { kind: "same", text: "c" },
  ]);
});

test("identical bodies have no changes, and long unchanged runs fold into one gap", () => {
  expect(diffLines("x\ny", "x\ny").every((line) => line.kind === "same")).toBe(true);
  const before = Array.from({ length: 20 }, (_, i) => `line ${i}`).join("\n");
  const after = before.replace("line 10", "line ten");
  const hunks = changedHunks(diffLines(before, after), 1);
  expect(hunks).toEqual([
    { kind: "gap", count: 9 },
    { kind: "same", text: "line 9" },
    { kind: "removed", text: "line 10" },
    { kind: "added", text: "line ten" },
    { kind: "same", text: "line 11" },
    { kind: "gap", count: 8 },
  ]);
});
