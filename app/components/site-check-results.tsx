import type { Flag, ProfileCase, SiteCheckResult } from "~/envelope";
import { formatR, formatTemperature, formatTemperatureDifference, formatU, formatRate, type UnitSystem } from "~/envelope/units";
import { ProfileChart } from "./profile-chart";
import { SITE_DEFAULT_LABELS } from "~/catalogue/vocabulary";

const SEVERITY_STYLE: Record<Flag["severity"], { label: string; className: string }> = {
  stop: { label: "Stop", className: "border-stop bg-stop/5 text-stop" },
  caution: { label: "Caution", className: "border-caution bg-caution/5 text-caution" },
  note: { label: "Note", className: "border-note bg-note/5 text-note" },
};

function CaseSummary({ profile, units }: { profile: ProfileCase; units: UnitSystem }) {
  const condenses = profile.condensingPlanes.length > 0;
  return (
    <div className="rounded border border-rule bg-sheet p-3" data-testid={`case-${profile.name}`}>
      <h4 className="text-sm font-semibold capitalize">{profile.name}</h4>
      <p className="text-xs text-graphite-soft">{profile.description}</p>
      <p className={`mt-2 text-sm ${condenses ? "text-stop" : "text-vapour"}`}>
        {condenses
          ? `Condensation at ${profile.firstCondensingSurface?.label ?? profile.condensingPlanes[0].label}, about ${formatRate(profile.rate_g_m2_day, units)}`
          : "No condensation plane in steady state"}
      </p>
      <p className="text-xs text-graphite-soft">
        Margin at {profile.marginSurface}: {formatTemperatureDifference(profile.margin_c, units)} {profile.margin_c >= 0 ? "above" : "below"} the dew point ({formatTemperature(profile.sourceDewPoint_c, units)})
      </p>
    </div>
  );
}

/** The computed answer for one site: the same numbers the API and the printed sheet carry. */
export function SiteCheckResults({ result, units }: { result: SiteCheckResult; units: UnitSystem }) {
  const { site, thermal, profiles, code, flags } = result;
  return (
    <div className="space-y-5" data-testid="site-check-results">
      <div className="flex flex-wrap items-baseline gap-x-6 gap-y-1">
        <p>
          <span className="text-xs uppercase tracking-wide text-graphite-soft">Effective</span>{" "}
          <span className="font-serif text-2xl" data-testid="effective-r">{formatR(thermal.rsi, units)}</span>
        </p>
        <p className="tabular-nums" data-testid="effective-u">{formatU(thermal.u_si, units)}</p>
        <p className="text-sm text-graphite-soft">
          Zone {site.zone}
          {site.zoneSource === "degree-days" ? " (from degree-days)" : ""} · winter {formatTemperature(site.winter.t_c, units, 0)} · indoor{" "}
          {formatTemperature(site.indoor.t_c, units, 0)} at {Math.round(site.indoor.rh)} % RH
        </p>
      </div>
      {site.defaulted.length ? <p className="text-xs text-graphite-soft">Assumed from the zone: {site.defaulted.map((key) => SITE_DEFAULT_LABELS[key] ?? key).join(", ")}.</p> : null}

      <div className="grid gap-3 md:grid-cols-2">
        <CaseSummary profile={profiles.winter} units={units} />
        <CaseSummary profile={profiles.summer} units={units} />
      </div>
      <div className="space-y-4" data-testid="profile-charts">
        <ProfileChart profile={profiles.winter} units={units} className="rounded border border-rule bg-sheet p-2" />
        <ProfileChart profile={profiles.summer} units={units} className="rounded border border-rule bg-sheet p-2" />
        <p className="text-xs text-graphite-soft">Steady state on design-day conditions (dew-point method); layer numbers as in the section drawing.</p>
      </div>

      {flags.length ? (
        <ul className="space-y-2" data-testid="flags">
          {flags.map((flag) => {
            const style = SEVERITY_STYLE[flag.severity];
            return (
              <li key={flag.id} className={`rounded border-l-4 p-3 ${style.className}`} data-severity={flag.severity}>
                <p className="text-sm font-semibold">
                  {style.label}: {flag.title}
                </p>
                <p className="mt-1 text-sm text-graphite">{flag.explanation}</p>
                <p className="mt-1 text-xs text-graphite-soft">Source: {flag.source}</p>
              </li>
            );
          })}
        </ul>
      ) : (
        <p className="text-sm text-vapour">No rule flags for this site.</p>
      )}

      <div>
        <h4 className="text-sm font-semibold">Code rows compared ({code.edition})</h4>
        <table className="mt-2 w-full text-sm" data-testid="code-rows">
          <thead>
            <tr className="border-b border-graphite/40 text-left text-xs uppercase tracking-wide text-graphite-soft">
              <th className="py-1 pr-2 font-semibold">Row</th>
              <th className="py-1 pr-2 font-semibold">Required</th>
              <th className="py-1 pr-2 font-semibold">This detail</th>
              <th className="py-1 font-semibold">Result</th>
            </tr>
          </thead>
          <tbody>
            {code.rows.map((row) => (
              <tr key={row.id} className="border-b border-rule align-top">
                <td className="py-1 pr-2">
                  {row.label}
                  {row.note ? <span className="block text-xs text-graphite-soft">{row.note}</span> : null}
                </td>
                <td className="py-1 pr-2">{row.required}</td>
                <td className="py-1 pr-2">{row.provided}</td>
                <td className={`py-1 font-medium ${row.pass ? "text-vapour" : "text-stop"}`}>{row.pass ? "meets" : "falls short"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="rounded bg-paper-deep/70 p-3 text-xs text-graphite-soft" data-testid="check-caution">{result.caution}</p>
    </div>
  );
}
