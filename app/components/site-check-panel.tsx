import {
  getFormProps,
  getInputProps,
  getSelectProps,
  getTextareaProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useId, useMemo } from "react";
import { Form, useFetcher } from "react-router";
import { siteFormSchema, siteTemperatureUnits, YEAR_SOURCES, type YearSource } from "~/catalogue/site-form";
import { MONTH_NAMES } from "~/envelope/climate-year";
import { DEFAULT_INDOOR_METHOD, indoorMethodChoices } from "~/envelope/indoor-climate";
import { NBC_ZONES } from "~/envelope/nbc-tables";
import { PROVINCES, type ProvinceCode, type SiteCheckResult } from "~/envelope/types";
import type { UnitSystem } from "~/envelope/units";
import { CLIMATE_ZONE_IDS, MOISTURE_REGIMES, MOISTURE_REGIME_LABELS } from "~/vocabulary/climate-zones";
import { withoutKey } from "./form-field";
import { SiteCheckResults } from "./site-check-results";

type CheckResponse =
  | { result: SiteCheckResult; units: UnitSystem }
  | { error: string; message?: string; fieldErrors?: Record<string, string[]> };

/** The site fields as typed (nested as the form names them), from the address or a failed check. */
export type SiteValues = Record<string, unknown>;

const PROVINCE_NAMES: Readonly<Record<ProvinceCode, string>> = {
  AB: "Alberta",
  BC: "British Columbia",
  MB: "Manitoba",
  NB: "New Brunswick",
  NL: "Newfoundland and Labrador",
  NS: "Nova Scotia",
  NT: "Northwest Territories",
  NU: "Nunavut",
  ON: "Ontario",
  PE: "Prince Edward Island",
  QC: "Quebec",
  SK: "Saskatchewan",
  YT: "Yukon",
};
const YEAR_LABELS: Readonly<Record<YearSource, string>> = {
  generated: "Generated from the site's degree-days (default)",
  typed: "Twelve monthly means, typed",
  csv: "A 12-row CSV file",
};
const BLANK_YEAR = Array.from({ length: 12 }, () => ({ t: "", rh: "" }));

/** A field's own messages, under it. */
function Problem({ errors, id }: { errors?: string[]; id: string }) {
  return errors?.length ? (
    <span id={id} className="mt-0.5 block text-xs text-stop">
      {errors.join(" ")}
    </span>
  ) : null;
}

/**
 * Pick a US zone, enter degree-days, or give a Canadian site; choose the indoor humidity method and
 * the year the seasonal balance runs over. Checked in the browser with the API's own schema. Without
 * JavaScript the form reloads the page with the site in the address; with it, a fetcher posts to the
 * check API and only the results change.
 */
export function SiteCheckPanel({
  slug,
  units,
  values,
  initial,
  claimedZones,
}: {
  slug: string;
  units: UnitSystem;
  values: SiteValues;
  initial: { result: SiteCheckResult; units?: UnitSystem } | { fieldErrors: Record<string, string[]> } | null;
  claimedZones: string[];
}) {
  const errorsId = useId();
  const fetcher = useFetcher<CheckResponse>();
  const latest = fetcher.data ?? null;
  // Problems only the engine finds (a missing moisture regime, say) come back from the server: as
  // field errors of the check API, or of the page's own check when the form was sent without JavaScript.
  const serverErrors = latest
    ? "fieldErrors" in latest
      ? latest.fieldErrors
      : null
    : initial && "fieldErrors" in initial
      ? initial.fieldErrors
      : null;
  const lastResult = useMemo<SubmissionResult<string[]> | null>(
    () => (serverErrors ? { status: "error", error: serverErrors } : null),
    [serverErrors],
  );
  const [form, fields] = useForm({
    defaultValue: {
      country: "US",
      yearSource: "generated",
      indoorMethod: DEFAULT_INDOOR_METHOD,
      ...values,
      yearMonths: Array.isArray(values.yearMonths) && values.yearMonths.length === 12 ? values.yearMonths : BLANK_YEAR,
      units,
    },
    lastResult,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: siteFormSchema }),
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onSubmit(event, { formData }) {
      // With JavaScript only the results change: the check API, not a page load.
      event.preventDefault();
      formData.set("units", units);
      fetcher.submit(formData, { method: "post", action: `/api/details/${slug}/check` });
    },
  });
  const problems = Object.values(form.allErrors).flat();
  const result =
    latest && "result" in latest ? latest.result : !latest && initial && "result" in initial ? initial.result : null;
  const resultUnits =
    latest && "units" in latest ? latest.units : initial && "units" in initial && initial.units ? initial.units : units;
  const degreeDayUnit = units === "ip" ? "°F·day, base 65/50 °F" : "K·day, base 18/10 °C";
  const control = "mt-1 w-full rounded border border-rule bg-sheet px-2 py-1.5 aria-[invalid=true]:border-stop";
  const described = problems.length ? errorsId : undefined;
  const country = fields.country.value === "CA" ? "CA" : "US";
  const monthUnit = siteTemperatureUnits({ country, units }) === "ip" ? "°F" : "°C";
  const months = fields.yearMonths.getFieldList();
  const csv = fields.yearCsv;

  return (
    <section
      aria-labelledby="site-check-title"
      className="rounded border border-rule bg-paper-deep/40 p-4"
      data-testid="site-check-panel"
    >
      <h2 id="site-check-title" className="text-xl">
        Site check
      </h2>
      <p className="mt-1 text-sm text-graphite-soft">
        Written for zones {claimedZones.join(", ")}. Check it for your own site: a US climate zone or degree-days, or a
        Canadian site.
      </p>
      {/* Without JavaScript the form reloads the page with the site in the URL, and the page runs the check.
          The radio buttons show their own fields by CSS alone, so that works without JavaScript too. */}
      <Form method="get" preventScrollReset {...getFormProps(form)} className="group/site mt-3 space-y-4">
        <fieldset className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <legend className="mb-1 text-xs text-graphite-soft">Site in</legend>
          {(["US", "CA"] as const).map((value) => (
            <label key={value} className="inline-flex items-center gap-1.5">
              <input {...withoutKey(getInputProps(fields.country, { type: "radio", value }))} key={value} />
              {value === "US" ? "the United States" : "Canada (NBC 2020, SI)"}
            </label>
          ))}
        </fieldset>

        <div
          className="grid gap-3 sm:grid-cols-4 group-has-[[name=country][value=CA]:checked]/site:hidden"
          data-testid="us-site"
        >
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Climate zone</span>
            <select
              key={fields.zone.key}
              {...withoutKey(getSelectProps(fields.zone))}
              aria-describedby={described}
              className={control}
            >
              <option value="">from degree-days…</option>
              {CLIMATE_ZONE_IDS.map((zone) => (
                <option key={zone} value={zone}>
                  {zone}
                  {claimedZones.includes(zone) ? " ✓" : ""}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Heating degree-days</span>
            <input
              key={fields.hdd.key}
              {...withoutKey(getInputProps(fields.hdd, { type: "text" }))}
              aria-describedby={described}
              inputMode="decimal"
              placeholder={units === "ip" ? "e.g. 6500" : "e.g. 3600"}
              title={degreeDayUnit}
              className={control}
            />
          </label>
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Cooling degree-days</span>
            <input
              key={fields.cdd.key}
              {...withoutKey(getInputProps(fields.cdd, { type: "text" }))}
              aria-describedby={described}
              inputMode="decimal"
              placeholder={units === "ip" ? "e.g. 2200" : "e.g. 1200"}
              title={degreeDayUnit}
              className={control}
            />
          </label>
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Moisture regime</span>
            <select
              key={fields.moisture.key}
              {...withoutKey(getSelectProps(fields.moisture))}
              aria-describedby={described}
              title="Needed with degree-days below zone 7"
              className={control}
            >
              <option value="">—</option>
              {MOISTURE_REGIMES.map((regime) => (
                <option key={regime} value={regime}>
                  {MOISTURE_REGIME_LABELS[regime]}
                </option>
              ))}
            </select>
          </label>
        </div>

        <div
          className="hidden gap-3 sm:grid-cols-3 group-has-[[name=country][value=CA]:checked]/site:grid"
          data-testid="canadian-site"
        >
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Province or territory</span>
            <select
              key={fields.province.key}
              {...withoutKey(getSelectProps(fields.province))}
              aria-describedby={described}
              className={control}
            >
              <option value="">—</option>
              {PROVINCES.map((code) => (
                <option key={code} value={code}>
                  {PROVINCE_NAMES[code]}
                </option>
              ))}
            </select>
            <Problem errors={fields.province.errors} id={fields.province.errorId} />
          </label>
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">NBC climate zone</span>
            <select
              key={fields.nbcZone.key}
              {...withoutKey(getSelectProps(fields.nbcZone))}
              aria-describedby={described}
              className={control}
            >
              <option value="">from degree-days or the province…</option>
              {NBC_ZONES.map((zone) => (
                <option key={zone} value={zone}>
                  Zone {zone}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Heating degree-days below 18 °C</span>
            <input
              key={fields.hdd18.key}
              {...withoutKey(getInputProps(fields.hdd18, { type: "text" }))}
              aria-describedby={described}
              inputMode="decimal"
              placeholder="e.g. 5670"
              title="K·day, base 18 °C (NBC Appendix C)"
              className={control}
            />
            <Problem errors={fields.hdd18.errors} id={fields.hdd18.errorId} />
          </label>
        </div>

        <div className="grid gap-3 sm:grid-cols-[3fr_1fr]">
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">Indoor humidity in winter, by</span>
            <select
              key={fields.indoorMethod.key}
              {...withoutKey(getSelectProps(fields.indoorMethod))}
              aria-describedby={described}
              className={control}
            >
              {indoorMethodChoices().map((choice) => (
                <option key={choice.id} value={choice.id} title={choice.source}>
                  {choice.label}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm">
            <span className="block text-xs text-graphite-soft">or a fixed RH, %</span>
            <input
              key={fields.indoorRh.key}
              {...withoutKey(getInputProps(fields.indoorRh, { type: "text" }))}
              aria-describedby={described}
              inputMode="decimal"
              placeholder="by the method"
              className={control}
            />
          </label>
        </div>

        <fieldset className="text-sm">
          <legend className="mb-1 text-xs text-graphite-soft">The year for the seasonal balance</legend>
          <div className="flex flex-wrap gap-x-5 gap-y-1">
            {YEAR_SOURCES.map((value) => (
              <label key={value} className="inline-flex items-center gap-1.5">
                <input {...withoutKey(getInputProps(fields.yearSource, { type: "radio", value }))} key={value} />
                {YEAR_LABELS[value]}
              </label>
            ))}
          </div>
          <p className="mt-1 text-xs text-graphite-soft group-has-[[name=yearSource][value=generated]:checked]/site:block hidden">
            Dryside fits an annual curve of monthly means to the site's degree-days and design temperatures; the results
            say so and how. Enter the site's monthly normals for a real year.
          </p>
          <div
            className="mt-2 hidden group-has-[[name=yearSource][value=typed]:checked]/site:block"
            data-testid="typed-year"
          >
            <div className="grid grid-cols-[auto_1fr_1fr] gap-x-2 gap-y-1 sm:grid-cols-[repeat(2,auto_1fr_1fr)] lg:grid-cols-[repeat(4,auto_1fr_1fr)]">
              {months.map((month, i) => {
                const row = month.getFieldset();
                return (
                  <div key={month.key} className="contents">
                    <span className="self-center text-xs text-graphite-soft">{MONTH_NAMES[i]}</span>
                    <input
                      key={row.t.key}
                      {...withoutKey(getInputProps(row.t, { type: "text" }))}
                      aria-label={`${MONTH_NAMES[i]} mean temperature, ${monthUnit}`}
                      inputMode="decimal"
                      placeholder={monthUnit}
                      className={control}
                    />
                    <input
                      key={row.rh.key}
                      {...withoutKey(getInputProps(row.rh, { type: "text" }))}
                      aria-label={`${MONTH_NAMES[i]} mean relative humidity, %`}
                      inputMode="decimal"
                      placeholder="% RH"
                      className={control}
                    />
                  </div>
                );
              })}
            </div>
          </div>
          <div
            className="mt-2 hidden group-has-[[name=yearSource][value=csv]:checked]/site:block"
            data-testid="csv-year"
          >
            <label className="block text-xs text-graphite-soft">
              Choose a file (month,temperature_c,rh_percent; one row a month)
              <input
                type="file"
                accept=".csv,text/csv,text/plain"
                className="mt-1 block text-sm"
                data-testid="csv-file"
                onChange={async (event) => {
                  // The file's text goes into the box below, so a bad line can be seen and fixed there.
                  const file = event.currentTarget.files?.[0];
                  if (file) form.update({ name: csv.name, value: await file.text() });
                }}
              />
            </label>
            <label className="mt-2 block text-xs text-graphite-soft">
              or paste it here
              <textarea
                key={csv.key}
                {...withoutKey(getTextareaProps(csv))}
                aria-describedby={csv.errors?.length ? csv.errorId : described}
                rows={6}
                spellCheck={false}
                placeholder={"month,temperature_c,rh_percent\n1,-10.2,82\n…"}
                className={`${control} font-mono text-xs`}
              />
            </label>
            <Problem errors={csv.errors} id={csv.errorId} />
          </div>
        </fieldset>

        <input type="hidden" name={fields.units.name} value={units} />
        <button
          type="submit"
          className="rounded bg-graphite px-4 py-1.5 text-sm font-medium text-paper hover:bg-black"
          data-testid="run-check"
        >
          {fetcher.state !== "idle" ? "Checking…" : "Check"}
        </button>
      </Form>
      {problems.length ? (
        <ul id={errorsId} className="mt-2 text-sm text-stop" role="alert" data-testid="site-errors">
          {problems.map((message) => (
            <li key={message}>{message}</li>
          ))}
        </ul>
      ) : null}
      {latest && "error" in latest && !latest.fieldErrors ? (
        <p className="mt-2 text-sm text-stop" role="alert">
          {latest.message ?? latest.error}
        </p>
      ) : null}
      <div className={`mt-5 ${fetcher.state !== "idle" ? "opacity-60" : ""}`}>
        {result ? <SiteCheckResults result={result} units={resultUnits} /> : null}
      </div>
    </section>
  );
}
