// The desk's detail form: conform reads the posted fields with the draft schema, every problem comes
// back under the field (or layer row) that caused it, and what was typed is kept as typed.
import type { Submission } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { describe, expect, test } from "vitest";
import { draftFormSchema, validateDraft, valuesFromFrontMatter, type DraftFormValues } from "~/desk/draft-form";

const values: DraftFormValues = {
  slug: "test-wall",
  title: "Test wall for the form",
  summary: "A summary long enough to pass the card rule.",
  assembly: "above-grade-wall",
  substrate: "wood-frame",
  below_grade: "none",
  strategy: "cavity-only",
  tier: "free",
  zones: ["5A"],
  sets: [],
  references: "IRC 2021 R702.7\n\n",
  change_note: "",
  body: "## Why it works\n\n## Install sequence\n\n## Cautions\n",
  layers: [
    {
      role: "cladding",
      material: "vinyl-siding",
      thickness_mm: "2",
      framing_material: "",
      framing_fraction: "",
      joints: "",
    },
    {
      role: "insulation",
      material: "fibreglass-batt",
      thickness_mm: "140",
      framing_material: "",
      framing_fraction: "0.23",
      joints: "",
    },
  ],
};
const knownMaterials = ["vinyl-siding", "fibreglass-batt", "softwood-lumber", "osb"];
const context = {
  author: "Test Author",
  revision: 1,
  revised: "2026-12-03",
  knownMaterials,
  knownSets: [] as string[],
  forSubmission: true,
};

/** The form as the browser posts it: conform's names, layer rows as `layers[i].field`. */
function posted(draft: DraftFormValues, intent: "save" | "submit" = "save"): FormData {
  const form = new FormData();
  form.append("intent", intent);
  for (const [key, value] of Object.entries(draft)) {
    if (key === "layers") continue;
    for (const item of Array.isArray(value) ? value : [value]) form.append(key, String(item));
  }
  draft.layers.forEach((layer, i) => {
    for (const [field, value] of Object.entries(layer)) form.append(`layers[${i}].${field}`, value);
  });
  return form;
}

/** The field errors of a parsed form; none when it parsed. */
function errorsOf(submission: Submission<unknown, string[], unknown>): Record<string, string[] | null> {
  return submission.status === "success" ? {} : (submission.error ?? {});
}

describe("the schema conform parses the form with (page and action alike)", () => {
  const schema = draftFormSchema({ revision: 1, knownMaterials, knownSets: [] });

  test("a valid form parses to the typed values, layer rows in posted order", () => {
    const submission = parseWithZod(posted(values), { schema });
    expect(submission.status).toBe("success");
    if (submission.status !== "success") return;
    expect(submission.value.layers.map((layer) => [layer.role, layer.material, layer.framing_fraction])).toEqual([
      ["cladding", "vinyl-siding", ""],
      ["insulation", "fibreglass-batt", "0.23"],
    ]);
    expect(submission.value.intent).toBe("save");
  });

  test("a single ticked zone is still a list, and empty fields read as empty text", () => {
    const form = posted({ ...values, zones: ["6A"], change_note: "" });
    const submission = parseWithZod(form, { schema });
    expect(submission.status === "success" && [submission.value.zones, submission.value.change_note]).toEqual([
      ["6A"],
      "",
    ]);
  });

  test("layer problems come back under their row's index path, and every typed value is kept", () => {
    const typed: DraftFormValues = {
      ...values,
      title: "Rim",
      zones: [],
      layers: [
        { ...values.layers[0], thickness_mm: "-5" },
        { ...values.layers[1], material: "unobtainium-board", framing_fraction: "1.5" },
        {
          role: "sheathing",
          material: "osb",
          thickness_mm: "thick",
          framing_material: "",
          framing_fraction: "",
          joints: "",
        },
      ],
    };
    const submission = parseWithZod(posted(typed), { schema });
    expect(submission.status).toBe("error");
    const errors = errorsOf(submission);
    expect(Object.keys(errors).sort()).toEqual([
      "layers[0].thickness_mm",
      "layers[1].framing_fraction",
      "layers[1].material",
      "layers[2].thickness_mm",
      "title",
      "zones",
    ]);
    expect(errors["layers[1].material"]).toEqual(["“unobtainium-board” is not in the material library."]);
    expect(errors["layers[2].thickness_mm"]?.join(" ")).toMatch(/thickness in millimetres/);
    expect(errors.zones).toEqual(["Tick at least one climate zone."]);

    const reply = submission.reply();
    expect(reply.initialValue).toMatchObject({
      title: "Rim",
      layers: [
        { thickness_mm: "-5" },
        { material: "unobtainium-board", framing_fraction: "1.5" },
        { thickness_mm: "thick" },
      ],
    });
  });

  test("fewer than two layers is the list's own error", () => {
    const submission = parseWithZod(posted({ ...values, layers: values.layers.slice(0, 1) }), { schema });
    expect(errorsOf(submission).layers).toEqual(["An assembly needs at least two layers."]);
  });

  test("submitting for review needs the body's required sections; saving a draft does not", () => {
    const draft = { ...values, body: "Just a paragraph." };
    expect(parseWithZod(posted(draft, "save"), { schema }).status).toBe("success");
    const submitted = parseWithZod(posted(draft, "submit"), { schema });
    expect(Object.keys(errorsOf(submitted))).toEqual(["body"]);
    expect(errorsOf(submitted).body?.join(" ")).toMatch(/“## Why it works”, “## Install sequence”, “## Cautions”/);
  });

  test("a revision above 1 needs its change note, reported on the change-note field", () => {
    const submission = parseWithZod(posted(values), {
      schema: draftFormSchema({ revision: 2, knownMaterials, knownSets: [] }),
    });
    expect(errorsOf(submission)).toEqual({ change_note: [expect.stringMatching(/what changed/)] });
  });

  test("an unknown set is reported on the sets field", () => {
    const submission = parseWithZod(posted({ ...values, sets: ["no-such-set"] }), { schema });
    expect(errorsOf(submission)).toEqual({ sets: ["There is no set “no-such-set”."] });
  });
});

describe("the server's check before saving", () => {
  test("a valid form becomes front matter with the desk's author, no reviewer yet, and default framing lumber", () => {
    const result = validateDraft(values, context);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.front).toMatchObject({
      author: "Test Author",
      reviewer: "(awaiting review)",
      revision: 1,
      references: ["IRC 2021 R702.7"],
    });
    expect(result.front.layers[1].framing).toEqual({ material: "softwood-lumber", fraction: 0.23 });
  });

  test("errors are keyed by the names conform gives the fields", () => {
    const result = validateDraft(
      { ...values, layers: [values.layers[0], { ...values.layers[1], thickness_mm: "0" }] },
      context,
    );
    expect(result.ok ? {} : result.errors).toEqual({ "layers[1].thickness_mm": [expect.stringMatching(/above 0/)] });
  });

  test("a layer's note stays with it while its material is unchanged", () => {
    const earlier = validateDraft(values, context);
    if (!earlier.ok) throw new Error("the base form must be valid");
    const keep = { layers: [earlier.front.layers[0], { ...earlier.front.layers[1], note: "Friction-fit, no gaps." }] };
    const kept = validateDraft(values, { ...context, keep });
    expect(kept.ok && kept.front.layers[1].note).toBe("Friction-fit, no gaps.");
    const swapped = validateDraft(
      { ...values, layers: [values.layers[0], { ...values.layers[1], material: "osb", framing_fraction: "" }] },
      { ...context, keep },
    );
    expect(swapped.ok && swapped.front.layers[1].note).toBeUndefined();
  });

  test("front matter read back into the form validates to the same front matter", () => {
    const first = validateDraft(values, context);
    if (!first.ok) throw new Error("the base form must be valid");
    const again = validateDraft(valuesFromFrontMatter(first.front, first.body), context);
    expect(again.ok && again.front).toEqual(first.front);
  });
});
