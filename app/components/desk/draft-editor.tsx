import { useEffect, useMemo, useRef, useState } from "react";
import { Form, useFetcher, useNavigation } from "react-router";
import { ASSEMBLY_KINDS, BELOW_GRADE_CONDITIONS, INSULATION_STRATEGIES, SUBSTRATES, TIERS } from "~/content/detail-schema";
import { CLIMATE_ZONE_IDS } from "~/vocabulary/climate-zones";
import { labelFor } from "~/catalogue/vocabulary";
import type { DraftFormValues, FieldErrors } from "~/desk/draft-form";
import type { AssemblyKind, SiteCheckResult } from "~/envelope";
import type { UnitSystem } from "~/envelope/units";
import { CsrfField } from "~/components/csrf-field";
import { SectionDrawing } from "~/components/section-drawing";
import { SiteCheckResults } from "~/components/site-check-results";
import { LayerEditor, newLayerKey, type EditableLayer, type MaterialOption } from "./layer-editor";

/** Runs `effect` once `value` has stopped changing for `ms` milliseconds. */
function useDebounced<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

const input = "w-full rounded border border-rule bg-sheet px-3 py-2 aria-[invalid=true]:border-stop";

function FieldError({ id, errors }: { id: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return <p id={`${id}-error`} className="text-sm text-stop" data-testid={`error-${id}`}>{errors.join(" ")}</p>;
}

function Select({ name, label, value, options, errors, onChange, disabled }: { name: string; label: string; value: string; options: readonly string[]; errors: FieldErrors; onChange?: (value: string) => void; disabled?: boolean }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={`f-${name}`} className="text-sm font-medium">{label}</label>
      <select id={`f-${name}`} name={name} defaultValue={onChange ? undefined : value} value={onChange ? value : undefined} onChange={onChange ? (e) => onChange(e.target.value) : undefined} className={input} aria-invalid={errors[name] ? true : undefined} aria-describedby={errors[name] ? `${name}-error` : undefined} disabled={disabled}>
        <option value="">Choose…</option>
        {options.map((option) => <option key={option} value={option}>{labelFor(option)}</option>)}
      </select>
      <FieldError id={name} errors={errors[name]} />
    </div>
  );
}

export interface DraftEditorProps {
  mode: "new" | "revision";
  values: DraftFormValues;
  errors: FieldErrors;
  materials: MaterialOption[];
  sets: { slug: string; title: string }[];
  units: UnitSystem;
  editable: boolean;
  /** Shown above the form: the revision number and state, or "new detail". */
  heading: string;
}

/** The detail form: metadata, zones, tier, sets, layers with a live site check, and the body with a live preview. */
export function DraftEditor({ mode, values, errors, materials, sets, units, editable, heading }: DraftEditorProps) {
  const navigation = useNavigation();
  const busy = navigation.state === "submitting";
  const [assembly, setAssembly] = useState(values.assembly);
  const [zones, setZones] = useState<string[]>(values.zones);
  const [layers, setLayers] = useState<EditableLayer[]>(() => values.layers.map((layer) => ({ ...layer, key: newLayerKey() })));
  const [body, setBody] = useState(values.body);
  const [siteZone, setSiteZone] = useState(values.zones[0] ?? "5A");
  const [indoorRh, setIndoorRh] = useState("");

  // A 400 answer brings back what was typed: reset the controlled parts to it. Compared by content,
  // because a revalidation (after an upload, say) hands over an equal copy that must not wipe the typing.
  const lastValues = useRef(JSON.stringify(values));
  useEffect(() => {
    const next = JSON.stringify(values);
    if (lastValues.current === next) return;
    lastValues.current = next;
    setAssembly(values.assembly);
    setZones(values.zones);
    setLayers(values.layers.map((layer) => ({ ...layer, key: newLayerKey() })));
    setBody(values.body);
  }, [values]);

  const preview = useFetcher<{ html: string }>();
  const settledBody = useDebounced(body, 400);
  useEffect(() => {
    preview.submit({ markdown: settledBody }, { method: "post", action: "/desk/api/preview" });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the fetcher identity is stable enough; re-run only on text
  }, [settledBody]);

  const check = useFetcher<{ result?: SiteCheckResult; units?: UnitSystem; message?: string }>();
  const stackPayload = useMemo(
    () => JSON.stringify({ assembly, layers: layers.map(({ key: _key, ...layer }) => layer), site: { zone: siteZone, indoorRh, units } }),
    [assembly, layers, siteZone, indoorRh, units],
  );
  const settledStack = useDebounced(stackPayload, 450);
  useEffect(() => {
    check.submit({ payload: settledStack }, { method: "post", action: "/desk/api/check" });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- re-run only when the stack or site changes
  }, [settledStack]);

  const materialBySlug = useMemo(() => new Map(materials.map((m) => [m.slug, m])), [materials]);
  const drawable = layers.filter((layer) => materialBySlug.has(layer.material) && Number(layer.thickness_mm) > 0);
  const drawing = drawable.map((layer) => {
    const material = materialBySlug.get(layer.material)!;
    const framing = Number(layer.framing_fraction);
    return {
      role: layer.role,
      family: material.family,
      materialName: material.name,
      thickness_mm: Number(layer.thickness_mm),
      ...(framing > 0 && framing < 1 ? { framing: { fraction: framing, family: materialBySlug.get(layer.framing_material)?.family ?? "lumber" } } : {}),
    };
  });

  const formErrors = Object.keys(errors).length;
  return (
    <Form method="post" className="space-y-10" data-testid="draft-editor" noValidate>
      <CsrfField />
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-xs uppercase tracking-wide text-graphite-soft">Desk</p>
          <h1 className="text-3xl">{values.title || "New detail"}</h1>
          <p className="text-sm text-graphite-soft" data-testid="revision-heading">{heading}</p>
        </div>
        {editable ? (
          <div className="flex gap-3">
            <button type="submit" name="intent" value="save" disabled={busy} className="rounded border border-rule px-4 py-2">Save draft</button>
            {mode === "revision" ? <button type="submit" name="intent" value="submit" disabled={busy} className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">Submit for review</button> : null}
          </div>
        ) : null}
      </header>
      {formErrors ? (
        <p role="alert" className="rounded border border-stop/40 bg-stop/5 px-3 py-2 text-sm text-stop" data-testid="form-errors">
          Nothing was saved: {formErrors} field{formErrors > 1 ? "s need" : " needs"} attention. Your text is kept below.
        </p>
      ) : null}

      <fieldset className="grid gap-4 md:grid-cols-2" disabled={!editable}>
        <legend className="mb-2 text-xl font-serif">Metadata</legend>
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor="f-title" className="text-sm font-medium">Title</label>
          <input id="f-title" name="title" defaultValue={values.title} key={`title-${values.title}`} className={input} aria-invalid={errors.title ? true : undefined} />
          <FieldError id="title" errors={errors.title} />
        </div>
        {mode === "new" ? (
          <div className="flex flex-col gap-1 md:col-span-2">
            <label htmlFor="f-slug" className="text-sm font-medium">Slug (the address: lower-case words joined by hyphens)</label>
            <input id="f-slug" name="slug" defaultValue={values.slug} key={`slug-${values.slug}`} className={input} aria-invalid={errors.slug ? true : undefined} />
            <FieldError id="slug" errors={errors.slug} />
          </div>
        ) : (
          <input type="hidden" name="slug" value={values.slug} />
        )}
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor="f-summary" className="text-sm font-medium">Summary</label>
          <textarea id="f-summary" name="summary" rows={2} defaultValue={values.summary} key={`summary-${values.summary}`} className={input} aria-invalid={errors.summary ? true : undefined} />
          <FieldError id="summary" errors={errors.summary} />
        </div>
        <Select name="assembly" label="Assembly" value={assembly} options={ASSEMBLY_KINDS} errors={errors} onChange={setAssembly} />
        <Select name="substrate" label="Substrate" value={values.substrate} options={SUBSTRATES} errors={errors} key={`substrate-${values.substrate}`} />
        <Select name="below_grade" label="Below grade" value={values.below_grade} options={BELOW_GRADE_CONDITIONS} errors={errors} key={`bg-${values.below_grade}`} />
        <Select name="strategy" label="Insulation strategy" value={values.strategy} options={INSULATION_STRATEGIES} errors={errors} key={`strategy-${values.strategy}`} />
        <fieldset className="md:col-span-2">
          <legend className="text-sm font-medium">Climate zones it is written for</legend>
          <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
            {CLIMATE_ZONE_IDS.map((zone) => (
              <label key={zone} className="flex items-center gap-1 text-sm">
                <input type="checkbox" name="zones" value={zone} checked={zones.includes(zone)} onChange={(e) => setZones(e.target.checked ? [...zones, zone] : zones.filter((z) => z !== zone))} />
                {zone}
              </label>
            ))}
          </div>
          <FieldError id="zones" errors={errors.zones} />
        </fieldset>
        <fieldset>
          <legend className="text-sm font-medium">Tier</legend>
          <div className="mt-1 flex gap-4" key={`tier-${values.tier}`}>
            {TIERS.map((tier) => (
              <label key={tier} className="flex items-center gap-1 text-sm">
                <input type="radio" name="tier" value={tier} defaultChecked={values.tier === tier} /> {tier}
              </label>
            ))}
          </div>
          <FieldError id="tier" errors={errors.tier} />
        </fieldset>
        <fieldset>
          <legend className="text-sm font-medium">Sets</legend>
          <div className="mt-1 flex flex-col gap-1" key={`sets-${values.sets.join(",")}`}>
            {sets.map((set) => (
              <label key={set.slug} className="flex items-center gap-1 text-sm">
                <input type="checkbox" name="sets" value={set.slug} defaultChecked={values.sets.includes(set.slug)} /> {set.title}
              </label>
            ))}
          </div>
          <FieldError id="sets" errors={errors.sets} />
        </fieldset>
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor="f-references" className="text-sm font-medium">References (one a line)</label>
          <textarea id="f-references" name="references" rows={3} defaultValue={values.references} key={`refs-${values.references}`} className={input} aria-invalid={errors.references ? true : undefined} />
          <FieldError id="references" errors={errors.references} />
        </div>
        <div className="flex flex-col gap-1 md:col-span-2">
          <label htmlFor="f-change_note" className="text-sm font-medium">Change note (what changed in this revision; members who saved the detail receive it)</label>
          <input id="f-change_note" name="change_note" defaultValue={values.change_note} key={`note-${values.change_note}`} className={input} aria-invalid={errors.change_note ? true : undefined} />
          <FieldError id="change_note" errors={errors.change_note} />
        </div>
      </fieldset>

      <section aria-labelledby="layers-heading" className="space-y-4">
        <h2 id="layers-heading" className="text-xl">Layers, exterior to interior</h2>
        <LayerEditor layers={layers} onChange={setLayers} materials={materials} errors={errors} disabled={!editable} />
        <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
          <figure className="rounded border border-rule bg-sheet p-3">
            {drawing.length >= 1 ? <SectionDrawing assembly={{ kind: (assembly || "above-grade-wall") as AssemblyKind, layers: drawing }} units={units} title={values.title || "Draft"} /> : <p className="text-sm text-graphite-soft">The section appears once a layer has a material and a thickness.</p>}
          </figure>
          <div className="space-y-3" data-testid="desk-site-check">
            <div className="flex flex-wrap items-end gap-3">
              <label className="flex flex-col text-sm">
                Check for zone
                <select value={siteZone} onChange={(e) => setSiteZone(e.target.value)} className="rounded border border-rule bg-sheet px-2 py-1" aria-label="Check for zone">
                  {CLIMATE_ZONE_IDS.map((zone) => <option key={zone} value={zone}>{zone}</option>)}
                </select>
              </label>
              <label className="flex flex-col text-sm">
                Indoor RH %
                <input value={indoorRh} onChange={(e) => setIndoorRh(e.target.value)} placeholder="default" inputMode="decimal" className="w-24 rounded border border-rule bg-sheet px-2 py-1" />
              </label>
              <span className="text-xs text-graphite-soft" aria-live="polite">{check.state !== "idle" ? "Checking…" : ""}</span>
            </div>
          </div>
        </div>
        <div aria-live="polite">
          {check.data?.result ? (
            <SiteCheckResults result={check.data.result} units={check.data.units ?? units} />
          ) : check.data?.message ? (
            <p className="text-sm text-graphite-soft" data-testid="check-message">{check.data.message}</p>
          ) : null}
        </div>
      </section>

      <section aria-labelledby="body-heading" className="space-y-2">
        <h2 id="body-heading" className="text-xl">Body</h2>
        <p className="text-sm text-graphite-soft">Markdown with the sections “## Why it works”, “## Install sequence” (numbered) and “## Cautions”.</p>
        <div className="grid gap-4 lg:grid-cols-2">
          <div className="flex flex-col gap-1">
            <label htmlFor="f-body" className="sr-only">Body (Markdown)</label>
            <textarea id="f-body" name="body" rows={24} value={body} onChange={(e) => setBody(e.target.value)} readOnly={!editable} className={`${input} font-mono text-sm`} aria-invalid={errors.body ? true : undefined} />
            <FieldError id="body" errors={errors.body} />
          </div>
          <div className="prose prose-stone max-w-none rounded border border-rule bg-sheet p-4 prose-headings:font-serif" data-testid="body-preview" dangerouslySetInnerHTML={{ __html: preview.data?.html ?? "" }} />
        </div>
      </section>
    </Form>
  );
}
