import { expect, test } from "vitest";
import { validateDraft, valuesFromFormData, type DraftFormValues } from "~/desk/draft-form";

const values: DraftFormValues = {
  slug: "test-wall", title: "Test wall for the form", summary: "A summary long enough to pass the card rule.",
  assembly: "above-grade-wall", substrate: "wood-frame", below_grade: "none", strategy: "cavity-only", tier: "free",
  zones: ["5A"], sets: [], references: "IRC 2021 R702.7\n\n", change_note: "", body: "## Why it works\n\n## Install sequence\n\n## Cautions\n",
  layers: [
    { role: "cladding", material: "vinyl-siding", thickness_mm: "2", framing_material: "", framing_fraction: "", joints: "" },
    { role: "insulation", material: "fibreglass-batt", thickness_mm: "140", framing_material: "", framing_fraction: "0.23", joints: "" },
  ],
};
const context = { author: "Test Author", revision: 1, revised: "2026-12-03", knownMaterials: new Set(["vinyl-siding", "fibreglass-batt", "softwood-lumber"]), knownSets: new Set<string>(), forSubmission: true };

test("a valid form becomes front matter with the desk's author, no reviewer yet, and default framing lumber", () => {
  const result = validateDraft(values, context);
  expect(result.ok).toBe(true);
  if (!result.ok) return;
  expect(result.front).toMatchObject({ author: "Test Author", reviewer: "(awaiting review)", revision: 1, references: ["IRC 2021 R702.7"] });
  expect(result.front.layers[1].framing).toEqual({ material: "softwood-lumber", fraction: 0.23 });
});

test("repeated layer fields are read back in table order", () => {
  const form = new FormData();
  for (const [role, material] of [["cladding", "vinyl-siding"], ["structure", "osb"]]) {
    form.append("layer-role", role);
    form.append("layer-material", material);
    form.append("layer-thickness_mm", "10");
  }
  expect(valuesFromFormData(form).layers.map((layer) => [layer.role, layer.material, layer.framing_fraction])).toEqual([["cladding", "vinyl-siding", ""], ["structure", "osb", ""]]);
});

test("a revision above 1 needs its change note, reported on the change-note field", () => {
  const result = validateDraft(values, { ...context, revision: 2 });
  expect(result.ok ? {} : result.errors).toEqual({ change_note: [expect.stringMatching(/what changed/)] });
});
