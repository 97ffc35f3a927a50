import { Form, useFetcher } from "react-router";
import type { SiteCheckResult } from "~/envelope";
import type { UnitSystem } from "~/envelope/units";
import { CLIMATE_ZONE_IDS, MOISTURE_REGIMES, MOISTURE_REGIME_LABELS } from "~/vocabulary/climate-zones";
import { SiteCheckResults } from "./site-check-results";

type CheckResponse = { result: SiteCheckResult; units: UnitSystem } | { error: string; fieldErrors?: Record<string, string[]> };

export interface SiteValues {
  zone: string;
  hdd: string;
  cdd: string;
  moisture: string;
  indoorRh: string;
}

/**
 * Pick a zone or enter degree-days and indoor RH. Without JavaScript the form reloads the page with
 * the site in the URL; with it, a fetcher posts to the check API and only the results change.
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
  initial: { result: SiteCheckResult } | { fieldErrors: Record<string, string[]> } | null;
  claimedZones: string[];
}) {
  const fetcher = useFetcher<CheckResponse>();
  const latest = fetcher.data ?? null;
  const fieldErrors = latest && "fieldErrors" in latest ? latest.fieldErrors ?? {} : initial && "fieldErrors" in initial ? initial.fieldErrors : {};
  const result = latest && "result" in latest ? latest.result : !latest && initial && "result" in initial ? initial.result : null;
  const resultUnits = latest && "units" in latest ? latest.units : units;
  const degreeDayUnit = units === "ip" ? "°F·day, base 65/50 °F" : "K·day, base 18/10 °C";

  return (
    <section aria-labelledby="site-check-title" className="rounded border border-rule bg-paper-deep/40 p-4" data-testid="site-check-panel">
      <h2 id="site-check-title" className="text-xl">Site check</h2>
      <p className="mt-1 text-sm text-graphite-soft">
        Written for zones {claimedZones.join(", ")}. Check it for your own site: pick a zone or enter degree-days.
      </p>
      <Form
        method="get"
        preventScrollReset
        className="mt-3 grid gap-3 sm:grid-cols-[repeat(5,minmax(0,1fr))_auto] sm:items-end"
        onSubmit={(event) => {
          event.preventDefault();
          const data = new FormData(event.currentTarget);
          data.set("units", units);
          fetcher.submit(data, { method: "post", action: `/api/details/${slug}/check` });
        }}
      >
        <label className="text-sm">
          <span className="block text-xs text-graphite-soft">Climate zone</span>
          <select name="zone" defaultValue={values.zone} className="mt-1 w-full rounded border border-rule bg-sheet px-2 py-1.5" aria-invalid={Boolean(fieldErrors.zone)}>
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
          <input name="hdd" inputMode="decimal" defaultValue={values.hdd} placeholder={units === "ip" ? "e.g. 6500" : "e.g. 3600"} title={degreeDayUnit} className="mt-1 w-full rounded border border-rule bg-sheet px-2 py-1.5" aria-invalid={Boolean(fieldErrors.hdd)} />
        </label>
        <label className="text-sm">
          <span className="block text-xs text-graphite-soft">Cooling degree-days</span>
          <input name="cdd" inputMode="decimal" defaultValue={values.cdd} placeholder={units === "ip" ? "e.g. 2200" : "e.g. 1200"} title={degreeDayUnit} className="mt-1 w-full rounded border border-rule bg-sheet px-2 py-1.5" aria-invalid={Boolean(fieldErrors.cdd)} />
        </label>
        <label className="text-sm">
          <span className="block text-xs text-graphite-soft">Moisture regime</span>
          <select name="moisture" defaultValue={values.moisture} title="Needed with degree-days below zone 7" className="mt-1 w-full rounded border border-rule bg-sheet px-2 py-1.5" aria-invalid={Boolean(fieldErrors.moisture)}>
            <option value="">—</option>
            {MOISTURE_REGIMES.map((regime) => <option key={regime} value={regime}>{MOISTURE_REGIME_LABELS[regime]}</option>)}
          </select>
        </label>
        <label className="text-sm">
          <span className="block text-xs text-graphite-soft">Indoor RH in winter, %</span>
          <input name="indoorRh" inputMode="decimal" defaultValue={values.indoorRh} placeholder="35" className="mt-1 w-full rounded border border-rule bg-sheet px-2 py-1.5" aria-invalid={Boolean(fieldErrors.indoorRh)} />
        </label>
        <input type="hidden" name="units" value={units} />
        <button className="rounded bg-graphite px-4 py-1.5 text-sm font-medium text-paper hover:bg-black" data-testid="run-check">
          {fetcher.state !== "idle" ? "Checking…" : "Check"}
        </button>
      </Form>
      {Object.keys(fieldErrors).length ? (
        <ul className="mt-2 text-sm text-stop" role="alert" data-testid="site-errors">
          {Object.entries(fieldErrors).flatMap(([field, messages]) => messages.map((message) => <li key={`${field}-${message}`}>{message}</li>))}
        </ul>
      ) : null}
      {latest && "error" in latest && !latest.fieldErrors ? <p className="mt-2 text-sm text-stop" role="alert">{latest.error}</p> : null}
      <div className={`mt-5 ${fetcher.state !== "idle" ? "opacity-60" : ""}`}>{result ? <SiteCheckResults result={result} units={resultUnits} /> : null}</div>
    </section>
  );
}
