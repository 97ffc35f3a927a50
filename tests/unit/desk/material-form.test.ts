// The desk's material editor: conform reads the form with the material schema, so every value needs
// its source with a status letter (docs/references.md), problems come back under their fields, and
// what was typed is kept.
import { parseWithZod } from "@conform-to/zod/v4";
import { expect, test } from "vitest";
import { materialFormSchema, materialToForm, type MaterialFormValues } from "~/desk/material-form";

const values: MaterialFormValues = {
  name: "Test board",
  family: "foam-board",
  thermal_kind: "conductivity",
  thermal_value: "0.029",
  thermal_source: "Test value for the form, D",
  permeance_ng: "60",
  at_thickness_mm: "25.4",
  wet_cup_ng: "",
  curve: "",
  vapour_source: "Test value for the form, D",
  flags: ["foam_plastic"],
  notes: "",
};

function posted(material: MaterialFormValues): FormData {
  const form = new FormData();
  for (const [key, value] of Object.entries(material))
    for (const item of Array.isArray(value) ? value : [value]) form.append(key, item);
  return form;
}

const schema = materialFormSchema("test-board");

test("a valid form becomes the material itself, flags as booleans and blank optional values left out", () => {
  const submission = parseWithZod(posted(values), { schema });
  expect(submission.status).toBe("success");
  if (submission.status !== "success") return;
  expect(submission.value).toMatchObject({
    slug: "test-board",
    thermal: { conductivity_w_mk: 0.029 },
    vapour: { permeance_ng: 60, at_thickness_mm: 25.4 },
    foam_plastic: true,
    water_sensitive: false,
  });
  expect(submission.value.vapour).not.toHaveProperty("wet_cup_ng");
  // Read back into the form, the material gives the same fields.
  expect(materialToForm(submission.value)).toEqual(values);
});

test("a value without its status letter is refused on its source field, and the typed text comes back", () => {
  const submission = parseWithZod(posted({ ...values, thermal_source: "somewhere", permeance_ng: "lots" }), { schema });
  expect(submission.status).toBe("error");
  const errors = submission.status === "error" ? (submission.error ?? {}) : {};
  expect(Object.keys(errors).sort()).toEqual(["permeance_ng", "thermal_source"]);
  expect(errors.thermal_source?.join(" ")).toMatch(/every value needs its source/);
  expect(submission.reply().initialValue).toMatchObject({ thermal_source: "somewhere", permeance_ng: "lots" });
});

test("a humidity curve must rise in RH; its problems land on the curve field", () => {
  const submission = parseWithZod(posted({ ...values, curve: "50, 60\n30, 200" }), { schema });
  const errors = submission.status === "error" ? (submission.error ?? {}) : {};
  expect(Object.keys(errors)).toEqual(["curve"]);
});
