import {
  getCollectionProps,
  getFormProps,
  getInputProps,
  getSelectProps,
  getTextareaProps,
  useForm,
  type FieldMetadata,
  type SubmissionResult,
} from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useEffect, useMemo, useState } from "react";
import { Form, useFetcher, useNavigation } from "react-router";
import {
  ASSEMBLY_KINDS,
  BELOW_GRADE_CONDITIONS,
  INSULATION_STRATEGIES,
  SUBSTRATES,
  TIERS,
} from "~/content/detail-schema";
import { CLIMATE_ZONE_IDS } from "~/vocabulary/climate-zones";
import { labelFor } from "~/catalogue/vocabulary";
import { draftFormSchema, liveLayers, type DraftFormValues } from "~/desk/draft-form";
import type { AssemblyKind, SiteCheckResult } from "~/envelope";
import type { UnitSystem } from "~/envelope/units";
import { CsrfField } from "~/components/csrf-field";
import { FieldError, withoutKey } from "~/components/form-field";
import { SectionDrawing } from "~/components/section-drawing";
import { SiteCheckResults } from "~/components/site-check-results";
import { LayerEditor, type MaterialOption } from "./layer-editor";

/** `value` once it has stopped changing for `ms` milliseconds. */
function useDebounced<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

const input = "w-full rounded border border-rule bg-sheet px-3 py-2 aria-[invalid=true]:border-stop";

function Select({ meta, label, options }: { meta: FieldMetadata<string>; label: string; options: readonly string[] }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={meta.id} className="text-sm font-medium">
        {label}
      </label>
      <select key={meta.key} {...withoutKey(getSelectProps(meta))} className={input}>
        <option value="">Choose…</option>
        {options.map((option) => (
          <option key={option} value={option}>
            {labelFor(option)}
          </option>
        ))}
      </select>
      <FieldError meta={meta} />
    </div>
  );
}

export interface DraftEditorProps {
  mode: "new" | "revision";
  /** The revision the form writes (1 for a new detail): a later one needs a change note. */
  revision: number;
  values: DraftFormValues;
  /** The action's answer to the last post: its errors and what was typed. */
  lastResult?: SubmissionResult<string[]> | null;
  materials: MaterialOption[];
  sets: { slug: string; title: string }[];
  units: UnitSystem;
  editable: boolean;
  /** Shown above the form: the revision number and state, or "new detail". */
  heading: string;
}

/** The detail form: metadata, zones, tier, sets, layers with a live site check, and the body with a live preview. */
export function DraftEditor({
  mode,
  revision,
  values,
  lastResult,
  materials,
  sets,
  units,
  editable,
  heading,
}: DraftEditorProps) {
  const navigation = useNavigation();
  const busy = navigation.state === "submitting";
  // The page checks with the action's own schema, given the library and the sets it shows.
  const schema = useMemo(
    () =>
      draftFormSchema({ revision, knownMaterials: materials.map((m) => m.slug), knownSets: sets.map((s) => s.slug) }),
    [revision, materials, sets],
  );
  // Conform keeps its own copy of the values: a revalidation (after an upload, say) hands over an equal
  // `values` that must not wipe the typing, and a 400 brings back exactly what was typed.
  const [form, fields] = useForm({
    id: `draft-${mode}`,
    defaultValue: values,
    lastResult,
    onValidate: ({ formData }) => parseWithZod(formData, { schema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const [siteZone, setSiteZone] = useState(values.zones[0] ?? "5A");
  const [indoorRh, setIndoorRh] = useState("");

  // conform's live value follows every keystroke; the preview and the check read it. A read-only
  // revision's controls are disabled, so they post nothing and conform's value lacks them: show the
  // revision as loaded instead.
  const assembly = editable ? (fields.assembly.value ?? "") : values.assembly;
  const liveLayerValue = editable ? fields.layers.value : values.layers;
  const layers = useMemo(() => liveLayers(liveLayerValue), [liveLayerValue]);
  const body = editable ? (fields.body.value ?? "") : values.body;

  const preview = useFetcher<{ html: string }>();
  const settledBody = useDebounced(body, 400);
  // biome-ignore lint/correctness/useExhaustiveDependencies: re-run only when the text settles, not when the fetcher re-renders
  useEffect(() => {
    preview.submit({ markdown: settledBody }, { method: "post", action: "/desk/api/preview" });
  }, [settledBody]);

  const check = useFetcher<{ result?: SiteCheckResult; units?: UnitSystem; message?: string }>();
  const stackPayload = useMemo(
    () => JSON.stringify({ assembly, layers, site: { zone: siteZone, indoorRh, units } }),
    [assembly, layers, siteZone, indoorRh, units],
  );
  const settledStack = useDebounced(stackPayload, 450);
  // biome-ignore lint/correctness/useExhaustiveDependencies: re-run only when the stack or the site settles
  useEffect(() => {
    check.submit({ payload: settledStack }, { method: "post", action: "/desk/api/check" });
  }, [settledStack]);

  const materialBySlug = useMemo(() => new Map(materials.map((m) => [m.slug, m])), [materials]);
  // Rows with a known material and a thickness are drawn as typed.
  const drawing = layers.flatMap((layer) => {
    const material = materialBySlug.get(layer.material);
    if (!material || !(Number(layer.thickness_mm) > 0)) return [];
    const framing = Number(layer.framing_fraction);
    return {
      role: layer.role,
      family: material.family,
      materialName: material.name,
      thickness_mm: Number(layer.thickness_mm),
      ...(framing > 0 && framing < 1
        ? { framing: { fraction: framing, family: materialBySlug.get(layer.framing_material)?.family ?? "lumber" } }
        : {}),
    };
  });

  const invalidFields = Object.keys(form.allErrors).filter((name) => name !== "").length;
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-10" data-testid="draft-editor">
      <CsrfField />
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-xs uppercase tracking-wide text-graphite-soft">Desk</p>
          <h1 className="text-3xl">{values.title || "New detail"}</h1>
          <p className="text-sm text-graphite-soft" data-testid="revision-heading">
            {heading}
          </p>
        </div>
        {editable ? (
          <div className="flex gap-3">
            <button
              type="submit"
              name="intent"
              value="save"
              disabled={busy}
              className="rounded border border-rule px-4 py-2"
            >
              Save draft
            </button>
            {mode === "revision" ? (
              <button
                type="submit"
                name="intent"
                value="submit"
                disabled={busy}
                className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep"
              >
                Submit for review
              </button>
            ) : null}
          </div>
        ) : null}
      </header>
      {form.errors?.length ? (
        <p
          id={form.errorId}
          role="alert"
          className="rounded border border-stop/40 bg-stop/5 px-3 py-2 text-sm text-stop"
        >
          {form.errors.join(" ")}
        </p>
      ) : null}
      {invalidFields ? (
        <p
          role="alert"
          className="rounded border border-stop/40 bg-stop/5 px-3 py-2 text-sm text-stop"
          data-testid="form-errors"
        >
          {lastResult?.status === "error" ? "Nothing was saved: " : ""}
          {invalidFields} field{invalidFields > 1 ? "s need" : " needs"} attention. Your text is kept below.
        </p>
      ) : null}

      <fieldset className="grid gap-4 md:grid-cols-2" disabled={!editable}>
        <legend className="mb-2 text-xl font-serif">Metadata</legend>
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor={fields.title.id} className="text-sm font-medium">
            Title
          </label>
          <input
            key={fields.title.key}
            {...withoutKey(getInputProps(fields.title, { type: "text" }))}
            className={input}
          />
          <FieldError meta={fields.title} />
        </div>
        {mode === "new" ? (
          <div className="flex flex-col gap-1 md:col-span-2">
            <label htmlFor={fields.slug.id} className="text-sm font-medium">
              Slug (the address: lower-case words joined by hyphens)
            </label>
            <input
              key={fields.slug.key}
              {...withoutKey(getInputProps(fields.slug, { type: "text" }))}
              className={input}
            />
            <FieldError meta={fields.slug} />
          </div>
        ) : (
          // The slug belongs to the detail; the server ignores a changed one.
          <input type="hidden" name={fields.slug.name} value={values.slug} />
        )}
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor={fields.summary.id} className="text-sm font-medium">
            Summary
          </label>
          <textarea
            key={fields.summary.key}
            {...withoutKey(getTextareaProps(fields.summary))}
            rows={2}
            className={input}
          />
          <FieldError meta={fields.summary} />
        </div>
        <Select meta={fields.assembly} label="Assembly" options={ASSEMBLY_KINDS} />
        <Select meta={fields.substrate} label="Substrate" options={SUBSTRATES} />
        <Select meta={fields.below_grade} label="Below grade" options={BELOW_GRADE_CONDITIONS} />
        <Select meta={fields.strategy} label="Insulation strategy" options={INSULATION_STRATEGIES} />
        <fieldset className="md:col-span-2" aria-describedby={fields.zones.errors ? fields.zones.errorId : undefined}>
          <legend className="text-sm font-medium">Climate zones it is written for</legend>
          <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
            {getCollectionProps(fields.zones, { type: "checkbox", options: [...CLIMATE_ZONE_IDS] }).map(
              ({ key, ...props }) => (
                <label key={key} className="flex items-center gap-1 text-sm">
                  <input {...props} aria-describedby={undefined} />
                  {props.value}
                </label>
              ),
            )}
          </div>
          <FieldError meta={fields.zones} />
        </fieldset>
        <fieldset aria-describedby={fields.tier.errors ? fields.tier.errorId : undefined}>
          <legend className="text-sm font-medium">Tier</legend>
          <div className="mt-1 flex gap-4">
            {getCollectionProps(fields.tier, { type: "radio", options: [...TIERS] }).map(({ key, ...props }) => (
              <label key={key} className="flex items-center gap-1 text-sm">
                <input {...props} aria-describedby={undefined} /> {props.value}
              </label>
            ))}
          </div>
          <FieldError meta={fields.tier} />
        </fieldset>
        <fieldset aria-describedby={fields.sets.errors ? fields.sets.errorId : undefined}>
          <legend className="text-sm font-medium">Sets</legend>
          <div className="mt-1 flex flex-col gap-1">
            {getCollectionProps(fields.sets, { type: "checkbox", options: sets.map((set) => set.slug) }).map(
              ({ key, ...props }, i) => (
                <label key={key} className="flex items-center gap-1 text-sm">
                  <input {...props} aria-describedby={undefined} /> {sets[i].title}
                </label>
              ),
            )}
          </div>
          <FieldError meta={fields.sets} />
        </fieldset>
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor={fields.references.id} className="text-sm font-medium">
            References (one a line)
          </label>
          <textarea
            key={fields.references.key}
            {...withoutKey(getTextareaProps(fields.references))}
            rows={3}
            className={input}
          />
          <FieldError meta={fields.references} />
        </div>
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor={fields.change_note.id} className="text-sm font-medium">
            Change note (what changed in this revision; members who saved the detail receive it)
          </label>
          <input
            key={fields.change_note.key}
            {...withoutKey(getInputProps(fields.change_note, { type: "text" }))}
            className={input}
          />
          <FieldError meta={fields.change_note} />
        </div>
      </fieldset>

      <section aria-labelledby="layers-heading" className="space-y-4">
        <h2 id="layers-heading" className="text-xl">
          Layers, exterior to interior
        </h2>
        <LayerEditor form={form} layers={fields.layers} materials={materials} disabled={!editable} />
        <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
          <figure className="rounded border border-rule bg-sheet p-3">
            {drawing.length >= 1 ? (
              <SectionDrawing
                assembly={{ kind: (assembly || "above-grade-wall") as AssemblyKind, layers: drawing }}
                units={units}
                title={values.title || "Draft"}
              />
            ) : (
              <p className="text-sm text-graphite-soft">
                The section appears once a layer has a material and a thickness.
              </p>
            )}
          </figure>
          <div className="space-y-3" data-testid="desk-site-check">
            <div className="flex flex-wrap items-end gap-3">
              {/* Not part of the detail: what the live check assumes, so these controls post nothing. */}
              <label className="flex flex-col text-sm">
                Check for zone
                <select
                  value={siteZone}
                  onChange={(e) => setSiteZone(e.target.value)}
                  className="rounded border border-rule bg-sheet px-2 py-1"
                  aria-label="Check for zone"
                >
                  {CLIMATE_ZONE_IDS.map((zone) => (
                    <option key={zone} value={zone}>
                      {zone}
                    </option>
                  ))}
                </select>
              </label>
              <label className="flex flex-col text-sm">
                Indoor RH %
                <input
                  value={indoorRh}
                  onChange={(e) => setIndoorRh(e.target.value)}
                  placeholder="default"
                  inputMode="decimal"
                  className="w-24 rounded border border-rule bg-sheet px-2 py-1"
                />
              </label>
              <span className="text-xs text-graphite-soft" aria-live="polite">
                {check.state !== "idle" ? "Checking…" : ""}
              </span>
            </div>
          </div>
        </div>
        <div aria-live="polite">
          {check.data?.result ? (
            <SiteCheckResults result={check.data.result} units={check.data.units ?? units} />
          ) : check.data?.message ? (
            <p className="text-sm text-graphite-soft" data-testid="check-message">
              {check.data.message}
            </p>
          ) : null}
        </div>
      </section>

      <section aria-labelledby="body-heading" className="space-y-2">
        <h2 id="body-heading" className="text-xl">
          Body
        </h2>
        <p className="text-sm text-graphite-soft">
          Markdown with the sections “## Why it works”, “## Install sequence” (numbered) and “## Cautions”.
        </p>
        <div className="grid gap-4 lg:grid-cols-2">
          <div className="flex flex-col gap-1">
            <label htmlFor={fields.body.id} className="sr-only">
              Body (Markdown)
            </label>
            <textarea
              key={fields.body.key}
              {...withoutKey(getTextareaProps(fields.body))}
              rows={24}
              readOnly={!editable}
              className={`${input} font-mono text-sm`}
            />
            <FieldError meta={fields.body} />
          </div>
          <div
            className="prose prose-stone max-w-none rounded border border-rule bg-sheet p-4 prose-headings:font-serif"
            data-testid="body-preview"
            // biome-ignore lint/security/noDangerouslySetInnerHtml: the server's renderer and sanitiser made this HTML, as for the published page
            dangerouslySetInnerHTML={{ __html: preview.data?.html ?? "" }}
          />
        </div>
      </section>
    </Form>
  );
}
