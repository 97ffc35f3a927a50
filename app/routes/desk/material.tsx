import {
  getCollectionProps,
  getFormProps,
  getInputProps,
  getSelectProps,
  getTextareaProps,
  useForm,
  type FieldMetadata,
} from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, Link, data } from "react-router";
import type { Route } from "./+types/material";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { FieldError, withoutKey } from "~/components/form-field";
import { MATERIAL_FAMILIES } from "~/envelope/material-schema";
import { MATERIAL_FLAGS, materialFormSchema, materialToForm } from "~/desk/material-form";
import { findMaterial, updateMaterial } from "~/desk/materials-edit.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.values.name ?? "Material"} — Desk — Dryside` },
];

export async function loader({ params }: Route.LoaderArgs) {
  const material = await findMaterial(params.slug);
  if (!material) throw data({ message: `No material “${params.slug}”.` }, { status: 404 });
  return { slug: material.slug, values: materialToForm(material) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: materialFormSchema(params.slug) });
  if (submission.status !== "success") return data({ result: submission.reply(), message: null }, { status: 400 });
  const outcome = await updateMaterial(user, params.slug, submission.value);
  if (!outcome) throw data({ message: `No material “${params.slug}”.` }, { status: 404 });
  return {
    result: submission.reply(),
    message: `Saved. ${outcome.refreshed} published detail${outcome.refreshed === 1 ? "" : "s"} recomputed.`,
  };
}

const FLAG_WORDS: Record<(typeof MATERIAL_FLAGS)[number], string> = {
  foam_plastic: "Foam plastic (needs a thermal barrier indoors)",
  water_sensitive: "Water-sensitive (loses R or decays when wet)",
  insect_risk: "Insect risk below grade",
  solvent_sensitive: "Attacked by solvent-based adhesives",
  vented_cladding: "Back-ventilated cladding",
};

const box = "w-full rounded border border-rule bg-sheet px-3 py-2 aria-[invalid=true]:border-stop";

function Field({ meta, label, hint }: { meta: FieldMetadata<string>; label: string; hint?: string }) {
  const hintId = `${meta.id}-hint`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={meta.id} className="text-sm font-medium">
        {label}
      </label>
      <input
        key={meta.key}
        {...withoutKey(getInputProps(meta, { type: "text", ariaDescribedBy: hint ? hintId : undefined }))}
        className={box}
      />
      {hint ? (
        <p id={hintId} className="text-xs text-graphite-soft">
          {hint}
        </p>
      ) : null}
      <FieldError meta={meta} />
    </div>
  );
}

export default function MaterialEditor({ loaderData, actionData }: Route.ComponentProps) {
  const schema = materialFormSchema(loaderData.slug);
  const [form, fields] = useForm({
    id: `material-${loaderData.slug}`,
    defaultValue: loaderData.values,
    lastResult: actionData?.result,
    onValidate: ({ formData }) => parseWithZod(formData, { schema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const sourceHint = "End with the status letter from docs/references.md: “…, C”, “…, C2”, “…, M” or “…, D”.";
  const flagProps = getCollectionProps(fields.flags, { type: "checkbox", options: [...MATERIAL_FLAGS] });
  return (
    <div className="space-y-6">
      <header>
        <p className="text-xs uppercase tracking-wide text-graphite-soft">
          <Link to="/desk/materials">Material library</Link> / {loaderData.slug}
        </p>
        <h1 className="text-3xl">{loaderData.values.name}</h1>
      </header>
      {actionData?.message ? (
        <p role="status" className="text-sm text-vapour" data-testid="material-saved">
          {actionData.message}
        </p>
      ) : null}
      {actionData?.result.status === "error" ? (
        <p role="alert" className="text-sm text-stop">
          Nothing was saved; see the fields marked below.
        </p>
      ) : null}
      <Form method="post" {...getFormProps(form)} className="grid max-w-3xl gap-4 md:grid-cols-2">
        <CsrfField />
        <Field meta={fields.name} label="Name" />
        <div className="flex flex-col gap-1">
          <label htmlFor={fields.family.id} className="text-sm font-medium">
            Family
          </label>
          <select key={fields.family.key} {...withoutKey(getSelectProps(fields.family))} className={box}>
            {MATERIAL_FAMILIES.map((family) => (
              <option key={family} value={family}>
                {family}
              </option>
            ))}
          </select>
          <FieldError meta={fields.family} />
        </div>
        <fieldset className="md:col-span-2 grid gap-4 md:grid-cols-2 rounded border border-rule p-3">
          <legend className="px-1 text-sm font-semibold">Thermal</legend>
          <div className="flex flex-col gap-1">
            <label htmlFor={fields.thermal_kind.id} className="text-sm font-medium">
              Value given as
            </label>
            <select key={fields.thermal_kind.key} {...withoutKey(getSelectProps(fields.thermal_kind))} className={box}>
              <option value="conductivity">conductivity, W/(m·K)</option>
              <option value="rsi_fixed">fixed RSI, m²·K/W (thin sheets, air spaces)</option>
            </select>
          </div>
          <Field meta={fields.thermal_value} label="Value" />
          <div className="md:col-span-2">
            <Field meta={fields.thermal_source} label="Source of the thermal value" hint={sourceHint} />
          </div>
        </fieldset>
        <fieldset className="md:col-span-2 grid gap-4 md:grid-cols-3 rounded border border-rule p-3">
          <legend className="px-1 text-sm font-semibold">Vapour</legend>
          <Field meta={fields.permeance_ng} label="Dry-cup permeance, ng/(s·m²·Pa)" />
          <Field meta={fields.at_thickness_mm} label="At thickness, mm (blank: fixed sheet)" />
          <Field meta={fields.wet_cup_ng} label="Wet-cup permeance (optional)" />
          <div className="md:col-span-3 flex flex-col gap-1">
            <label htmlFor={fields.curve.id} className="text-sm font-medium">
              Humidity curve (variable retarders): one “RH %, permeance” a line
            </label>
            <textarea key={fields.curve.key} {...withoutKey(getTextareaProps(fields.curve))} rows={3} className={box} />
            <FieldError meta={fields.curve} />
          </div>
          <div className="md:col-span-3">
            <Field meta={fields.vapour_source} label="Source of the vapour values" hint={sourceHint} />
          </div>
        </fieldset>
        <fieldset className="md:col-span-2">
          <legend className="text-sm font-semibold">Rule properties</legend>
          {flagProps.map(({ key, ...props }) => (
            <label key={key} className="flex items-center gap-2 text-sm">
              <input {...props} /> {FLAG_WORDS[props.value as (typeof MATERIAL_FLAGS)[number]]}
            </label>
          ))}
        </fieldset>
        <div className="md:col-span-2 flex flex-col gap-1">
          <label htmlFor={fields.notes.id} className="text-sm font-medium">
            Notes
          </label>
          <textarea key={fields.notes.key} {...withoutKey(getTextareaProps(fields.notes))} rows={2} className={box} />
        </div>
        {form.errors?.length ? (
          <p id={form.errorId} className="md:col-span-2 text-sm text-stop">
            {form.errors.join(" ")}
          </p>
        ) : null}
        <div>
          <button type="submit" className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">
            Save material
          </button>
        </div>
      </Form>
    </div>
  );
}
