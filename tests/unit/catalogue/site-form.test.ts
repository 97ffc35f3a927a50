// The site-check form: the panel validates in the browser with the same schema the check API uses,
// through conform, so a bad value is reported on its field and everything typed is kept.
import { parseWithZod } from "@conform-to/zod/v4";
import { expect, test } from "vitest";
import { siteFormSchema, siteInputFromForm } from "~/catalogue/site-form";

function posted(fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  return form;
}

test("a zone alone is a site; blank fields are simply absent", () => {
  const submission = parseWithZod(posted({ zone: "5A", hdd: "", cdd: "", moisture: "", indoorRh: "", units: "ip" }), {
    schema: siteFormSchema,
  });
  expect(submission.status).toBe("success");
  if (submission.status !== "success") return;
  expect(siteInputFromForm(submission.value)).toEqual({ zone: "5A" });
});

test("degree-days in inch-pound units go to the engine as base-65/50 °F degree-days", () => {
  const submission = parseWithZod(
    posted({ zone: "", hdd: "7000", cdd: "1500", moisture: "A", indoorRh: "35", units: "ip" }),
    { schema: siteFormSchema },
  );
  expect(submission.status === "success" && siteInputFromForm(submission.value)).toEqual({
    hdd65: 7000,
    cdd50: 1500,
    moisture: "A",
    indoor: { rh: 35, t_c: undefined },
  });
});

test("an impossible indoor RH is reported on its field and the typed values come back", () => {
  const submission = parseWithZod(
    posted({ zone: "", hdd: "7000", cdd: "1500", moisture: "", indoorRh: "150", units: "ip" }),
    { schema: siteFormSchema },
  );
  expect(submission.status).toBe("error");
  const errors = submission.status === "error" ? (submission.error ?? {}) : {};
  expect(Object.keys(errors)).toEqual(["indoorRh"]);
  expect(errors.indoorRh?.join(" ")).toMatch(/above 95 %/);
  expect(submission.reply().initialValue).toMatchObject({ hdd: "7000", cdd: "1500", indoorRh: "150" });
});

test("neither a zone nor degree-days asks for one of them, on the zone field", () => {
  const submission = parseWithZod(posted({ zone: "", hdd: "", cdd: "", units: "si" }), { schema: siteFormSchema });
  const errors = submission.status === "error" ? (submission.error ?? {}) : {};
  expect(errors).toEqual({ zone: ["Choose a climate zone or enter heating degree-days"] });
});

test("a province without the country says the site is Canadian rather than asking for a US zone", () => {
  const parsed = siteFormSchema.safeParse({ province: "MB" });
  expect(parsed.success).toBe(false);
  expect(parsed.error?.issues.map((i) => i.message)).toContain(
    "A province or NBC zone is a Canadian site: choose Canada as the country",
  );
});
