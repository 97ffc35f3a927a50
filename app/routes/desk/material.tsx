import { Form, Link, data } from "react-router";
import type { Route } from "./+types/material";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { MATERIAL_FAMILIES } from "~/envelope/material-schema";
import { MATERIAL_FLAGS, type MaterialFormValues } from "~/desk/material-form";
import { findMaterial, materialFormFromData, materialToForm, updateMaterial } from "~/desk/materials-edit.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.values.name ?? "Material"} — Desk — Dryside` }];

export async function loader({ params }: Route.LoaderArgs) {
  const material = await findMaterial(params.slug);
  if (!material) throw data({ message: `No material “${params.slug}”.` }, { status: 404 });
  return { slug: material.slug, values: materialToForm(material) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  const form = await requireCsrf(request);
  const values = materialFormFromData(form);
  const outcome = await updateMaterial(user, params.slug, values);
  if (!outcome) throw data({ message: `No material “${params.slug}”.` }, { status: 404 });
  if (!outcome.ok) return data({ values, errors: outcome.errors, message: null }, { status: 400 });
  return { values, errors: {} as Record<string, string[]>, message: `Saved. ${outcome.refreshed} published detail${outcome.refreshed === 1 ? "" : "s"} recomputed.` };
}

const FLAG_WORDS: Record<(typeof MATERIAL_FLAGS)[number], string> = {
  foam_plastic: "Foam plastic (needs a thermal barrier indoors)",
  water_sensitive: "Water-sensitive (loses R or decays when wet)",
  insect_risk: "Insect risk below grade",
  solvent_sensitive: "Attacked by solvent-based adhesives",
  vented_cladding: "Back-ventilated cladding",
};

const box = "w-full rounded border border-rule bg-sheet px-3 py-2 aria-[invalid=true]:border-stop";

function Field({ name, label, values, errors, hint }: { name: keyof MaterialFormValues; label: string; values: MaterialFormValues; errors: Record<string, string[]>; hint?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={`m-${name}`} className="text-sm font-medium">{label}</label>
      <input id={`m-${name}`} name={name} defaultValue={String(values[name])} className={box} aria-invalid={errors[name] ? true : undefined} />
      {hint ? <p className="text-xs text-graphite-soft">{hint}</p> : null}
      {errors[name] ? <p className="text-sm text-stop" data-testid={`error-${name}`}>{errors[name].join(" ")}</p> : null}
    </div>
  );
}

export default function MaterialEditor({ loaderData, actionData }: Route.ComponentProps) {
  const values = actionData?.values ?? loaderData.values;
  const errors = actionData?.errors ?? {};
  const sourceHint = "End with the status letter from REFERENCES.md: “…, C”, “…, C2”, “…, M” or “…, D”.";
  return (
    <div className="space-y-6">
      <header>
        <p className="text-xs uppercase tracking-wide text-graphite-soft"><Link to="/desk/materials">Material library</Link> / {loaderData.slug}</p>
        <h1 className="text-3xl">{values.name}</h1>
      </header>
      {actionData?.message ? <p role="status" className="text-sm text-vapour" data-testid="material-saved">{actionData.message}</p> : null}
      {Object.keys(errors).length ? <p role="alert" className="text-sm text-stop">Nothing was saved; see the fields marked below.</p> : null}
      <Form method="post" className="grid max-w-3xl gap-4 md:grid-cols-2" key={JSON.stringify(values)}>
        <CsrfField />
        <Field name="name" label="Name" values={values} errors={errors} />
        <div className="flex flex-col gap-1">
          <label htmlFor="m-family" className="text-sm font-medium">Family</label>
          <select id="m-family" name="family" defaultValue={values.family} className={box}>
            {MATERIAL_FAMILIES.map((family) => <option key={family} value={family}>{family}</option>)}
          </select>
        </div>
        <fieldset className="md:col-span-2 grid gap-4 md:grid-cols-2 rounded border border-rule p-3">
          <legend className="px-1 text-sm font-semibold">Thermal</legend>
          <div className="flex flex-col gap-1">
            <label htmlFor="m-thermal_kind" className="text-sm font-medium">Value given as</label>
            <select id="m-thermal_kind" name="thermal_kind" defaultValue={values.thermal_kind} className={box}>
              <option value="conductivity">conductivity, W/(m·K)</option>
              <option value="rsi_fixed">fixed RSI, m²·K/W (thin sheets, air spaces)</option>
            </select>
          </div>
          <Field name="thermal_value" label="Value" values={values} errors={errors} />
          <div className="md:col-span-2"><Field name="thermal_source" label="Source of the thermal value" values={values} errors={errors} hint={sourceHint} /></div>
        </fieldset>
        <fieldset className="md:col-span-2 grid gap-4 md:grid-cols-3 rounded border border-rule p-3">
          <legend className="px-1 text-sm font-semibold">Vapour</legend>
          <Field name="permeance_ng" label="Dry-cup permeance, ng/(s·m²·Pa)" values={values} errors={errors} />
          <Field name="at_thickness_mm" label="At thickness, mm (blank: fixed sheet)" values={values} errors={errors} />
          <Field name="wet_cup_ng" label="Wet-cup permeance (optional)" values={values} errors={errors} />
          <div className="md:col-span-3 flex flex-col gap-1">
            <label htmlFor="m-curve" className="text-sm font-medium">Humidity curve (variable retarders): one “RH %, permeance” a line</label>
            <textarea id="m-curve" name="curve" rows={3} defaultValue={values.curve} className={box} aria-invalid={errors.curve ? true : undefined} />
            {errors.curve ? <p className="text-sm text-stop">{errors.curve.join(" ")}</p> : null}
          </div>
          <div className="md:col-span-3"><Field name="vapour_source" label="Source of the vapour values" values={values} errors={errors} hint={sourceHint} /></div>
        </fieldset>
        <fieldset className="md:col-span-2">
          <legend className="text-sm font-semibold">Rule properties</legend>
          {MATERIAL_FLAGS.map((flag) => (
            <label key={flag} className="flex items-center gap-2 text-sm"><input type="checkbox" name="flags" value={flag} defaultChecked={values.flags.includes(flag)} /> {FLAG_WORDS[flag]}</label>
          ))}
        </fieldset>
        <div className="md:col-span-2 flex flex-col gap-1">
          <label htmlFor="m-notes" className="text-sm font-medium">Notes</label>
          <textarea id="m-notes" name="notes" rows={2} defaultValue={values.notes} className={box} />
        </div>
        {errors.form ? <p className="md:col-span-2 text-sm text-stop">{errors.form.join(" ")}</p> : null}
        <div><button type="submit" className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">Save material</button></div>
      </Form>
    </div>
  );
}
