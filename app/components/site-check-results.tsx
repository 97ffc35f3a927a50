import type { Flag, ProfileCase, SeasonalResult, SiteCheckResult, UpperWallProfiles } from "~/envelope";
import { asSentence, seasonalFigures, seasonalVerdictLabel, surfaceCheckLine } from "~/drawing/seasonal-geometry";
import { dewPointFromVapourPressure } from "~/envelope/psychrometrics";
import {
  formatR,
  formatTemperature,
  formatTemperatureDifference,
  formatU,
  formatRate,
  type UnitSystem,
} from "~/envelope/units";
import { ProfileChart } from "./profile-chart";
import { SeasonalChart } from "./seasonal-chart";
import { SITE_DEFAULT_LABELS } from "~/catalogue/vocabulary";

const SEVERITY_STYLE: Record<Flag["severity"], { label: string; className: string }> = {
  stop: { label: "Stop", className: "border-stop bg-stop/5 text-stop" },
  caution: { label: "Caution", className: "border-caution bg-caution/5 text-caution" },
  note: { label: "Note", className: "border-note bg-note/5 text-note" },
};

function CaseSummary({
  profile,
  units,
  title,
  testId,
}: {
  profile: ProfileCase;
  units: UnitSystem;
  title?: string;
  testId?: string;
}) {
  const condenses = profile.condensingPlanes.length > 0;
  return (
    <div className="rounded border border-rule bg-sheet p-3" data-testid={testId ?? `case-${profile.name}`}>
      <h4 className="text-sm font-semibold first-letter:uppercase">{title ?? profile.name}</h4>
      <p className="text-xs text-graphite-soft">{profile.description}</p>
      <p className={`mt-2 text-sm ${condenses ? "text-stop" : "text-vapour"}`}>
        {condenses
          ? `Condensation at ${profile.firstCondensingSurface?.label ?? profile.condensingPlanes[0].label}, about ${formatRate(profile.rate_g_m2_day, units)}`
          : "No condensation plane in steady state"}
      </p>
      <p className="text-xs text-graphite-soft">
        Through the clear cavity (the worst case), margin at {profile.marginSurface}:{" "}
        {formatTemperatureDifference(profile.margin_c, units)} {profile.margin_c >= 0 ? "above" : "below"} the dew point
        ({formatTemperature(profile.sourceDewPoint_c, units)})
      </p>
      {profile.studPath ? (
        <p className="text-xs text-graphite-soft" data-testid="stud-path-margin">
          Through the framing, same surface: {formatTemperatureDifference(profile.studPath.margin_c, units)}{" "}
          {profile.studPath.margin_c >= 0 ? "above" : "below"} the dew point
        </p>
      ) : null}
      {profile.notes.map((note) => (
        <p key={note} className="mt-1 text-xs text-graphite-soft">
          {note}
        </p>
      ))}
    </div>
  );
}

/** Interface temperatures on the clear-cavity path (the profile) and through the framing, side by side. */
function PathTable({ profile, units }: { profile: ProfileCase; units: UnitSystem }) {
  const stud = profile.studPath;
  if (!stud) return null;
  return (
    <table className="w-full text-sm tabular-nums" data-testid={`paths-${profile.name}`}>
      <caption className="mb-1 text-left text-sm font-semibold">
        {profile.name === "winter" ? "Winter" : "Summer"}: clear cavity beside the stud path
      </caption>
      <thead>
        <tr className="border-b border-graphite/40 text-left text-xs uppercase tracking-wide text-graphite-soft">
          <th className="py-1 pr-2 font-semibold">Interface</th>
          <th className="py-1 pr-2 text-right font-semibold">Clear cavity</th>
          <th className="py-1 pr-2 text-right font-semibold">Through framing</th>
          <th className="py-1 text-right font-semibold">Dew point</th>
        </tr>
      </thead>
      <tbody>
        {profile.interfaces.map((face, k) => (
          <tr key={`${k}-${face.label}`} className={`border-b border-rule ${face.condensing ? "text-stop" : ""}`}>
            <td className="py-0.5 pr-2">{face.label}</td>
            <td className="py-0.5 pr-2 text-right">{formatTemperature(face.t_c, units)}</td>
            <td className="py-0.5 pr-2 text-right">
              {stud.interfaces_t_c[k] === undefined ? "—" : formatTemperature(stud.interfaces_t_c[k], units)}
            </td>
            <td className="py-0.5 text-right">
              {formatTemperature(dewPointFromVapourPressure(Math.max(face.p_v_linear_pa, 1e-3)), units)}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function UpperWall({ upperWall, deep, units }: { upperWall: UpperWallProfiles; deep: ProfileCase; units: UnitSystem }) {
  return (
    <div data-testid="upper-wall">
      <h4 className="text-sm font-semibold">Top of the wall beside deep ground</h4>
      <p className="text-xs text-graphite-soft">
        Interior-insulated basements fail first at the top: the band above grade faces outdoor air, and just below grade
        the soil is at frost depth.
      </p>
      <div className="mt-2 grid gap-3 md:grid-cols-3">
        <CaseSummary profile={upperWall.aboveGrade} units={units} title="Above grade" testId="case-above-grade" />
        <CaseSummary
          profile={upperWall.frostDepth}
          units={units}
          title="Just below grade (frost depth)"
          testId="case-frost-depth"
        />
        <CaseSummary profile={deep} units={units} title="Deep ground" testId="case-deep-ground" />
      </div>
    </div>
  );
}

function Seasonal({ seasonal, units }: { seasonal: SeasonalResult; units: UnitSystem }) {
  const year = seasonal.climate;
  return (
    <div className="space-y-2" data-testid="seasonal">
      <h4 className="text-sm font-semibold">Through the year (monthly balance)</h4>
      <p
        className={`text-base font-semibold ${seasonal.verdict === "accumulates" ? "text-stop" : seasonal.verdict === "dries-within-year" ? "text-caution" : "text-vapour"}`}
        data-testid="seasonal-verdict"
        data-verdict={seasonal.verdict}
      >
        {seasonalVerdictLabel(seasonal)}
      </p>
      <p className="text-sm" data-testid="seasonal-figures">
        {seasonalFigures(seasonal, units)}
      </p>
      {seasonal.scopeNote ? (
        <p className="text-sm text-graphite-soft" data-testid="seasonal-scope">
          {seasonal.scopeNote}
        </p>
      ) : null}
      <p className={`text-sm ${seasonal.surface.pass ? "" : "font-semibold text-stop"}`} data-testid="seasonal-surface">
        {surfaceCheckLine(seasonal)}
      </p>
      <SeasonalChart seasonal={seasonal} units={units} className="rounded border border-rule bg-sheet p-2" />
      <p className="text-xs text-graphite-soft" data-testid="climate-year" data-source={year.source}>
        {year.source === "generated" ? (
          <span className="mr-1 rounded-sm border border-caution px-1 font-semibold uppercase tracking-wide text-caution">
            generated
          </span>
        ) : null}
        {year.source === "generated"
          ? "Site year generated by Dryside, not measured: "
          : year.source === "csv"
            ? "Site year from the uploaded file. "
            : "Site year as typed. "}
        {year.note}
      </p>
      <p className="text-xs text-graphite-soft">
        {asSentence(seasonal.method)} Indoor conditions each month by the same method as the design day. Interior
        surface: {asSentence(seasonal.surface.method)}
      </p>
    </div>
  );
}

/** The computed answer for one site: the same numbers the API and the printed sheet carry. */
export function SiteCheckResults({ result, units }: { result: SiteCheckResult; units: UnitSystem }) {
  const { site, thermal, profiles, code, flags, seasonal } = result;
  // Canadian sites read SI first; the inch-pound figure follows in brackets.
  const other: UnitSystem = units === "si" ? "ip" : "si";
  return (
    <div className="space-y-5" data-testid="site-check-results" data-units={units} data-country={site.country}>
      <div className="flex flex-wrap items-baseline gap-x-6 gap-y-1">
        <p>
          <span className="text-xs uppercase tracking-wide text-graphite-soft">Effective</span>{" "}
          <span className="font-serif text-2xl" data-testid="effective-r">
            {formatR(thermal.rsi, units)}
          </span>
          {site.canada ? (
            <span className="ml-2 text-sm text-graphite-soft">({formatR(thermal.rsi, other)})</span>
          ) : null}
        </p>
        <p className="tabular-nums" data-testid="effective-u">
          {formatU(thermal.u_si, units)}
        </p>
        <p className="text-sm text-graphite-soft" data-testid="site-line">
          {site.canada
            ? `${site.canada.province ? `${site.canada.province}, ` : ""}NBC zone ${site.canada.nbcZone}, ${Math.round(site.canada.hdd18)} heating degree-days below 18 °C${site.canada.place ? ` (${site.canada.place})` : ""} · design zone ${site.zone}`
            : `Zone ${site.zone}${site.zoneSource === "degree-days" ? " (from degree-days)" : ""}`}
          {` · winter ${formatTemperature(site.winter.t_c, units, 0)}`}
        </p>
      </div>
      <p className="text-sm" data-testid="indoor-basis">
        Checked at {site.indoor.basis}.
      </p>
      {site.defaulted.length ? (
        <p className="text-xs text-graphite-soft">
          Assumed from the zone: {site.defaulted.map((key) => SITE_DEFAULT_LABELS[key] ?? key).join(", ")}.
        </p>
      ) : null}
      {site.notes.length ? (
        <ul className="text-xs text-graphite-soft">
          {site.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      ) : null}

      <div className="grid gap-3 md:grid-cols-2">
        <CaseSummary
          profile={profiles.winter}
          units={units}
          title={profiles.upperWall ? "winter, deep ground" : undefined}
        />
        <CaseSummary profile={profiles.summer} units={units} />
      </div>
      {profiles.upperWall ? <UpperWall upperWall={profiles.upperWall} deep={profiles.winter} units={units} /> : null}
      <div className="space-y-4" data-testid="profile-charts">
        <ProfileChart profile={profiles.winter} units={units} className="rounded border border-rule bg-sheet p-2" />
        <ProfileChart profile={profiles.summer} units={units} className="rounded border border-rule bg-sheet p-2" />
        <p className="text-xs text-graphite-soft">
          Steady state on design-day conditions (dew-point method), through the clear cavity of framed layers; layer
          numbers as in the section drawing.
        </p>
      </div>
      {profiles.winter.studPath || profiles.summer.studPath ? (
        <div className="grid gap-4 md:grid-cols-2" data-testid="stud-path">
          <PathTable profile={profiles.winter} units={units} />
          <PathTable profile={profiles.summer} units={units} />
        </div>
      ) : null}

      {seasonal ? <Seasonal seasonal={seasonal} units={units} /> : null}

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
        <h4 className="text-sm font-semibold">
          Code compared: <span data-testid="code-edition">{code.edition}</span>
          {site.canada ? (
            <span className="font-normal text-graphite-soft">
              {" "}
              (National Building Code of Canada, for a Canadian site)
            </span>
          ) : null}
        </h4>
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
              <tr key={row.id} className="border-b border-rule align-top" data-row={row.id}>
                <td className="py-1 pr-2">
                  {row.label}
                  {row.note ? <span className="block text-xs text-graphite-soft">{row.note}</span> : null}
                </td>
                <td className="py-1 pr-2">{row.required}</td>
                <td className="py-1 pr-2">{row.provided}</td>
                <td className={`py-1 font-medium ${row.pass ? "text-vapour" : "text-stop"}`}>
                  {row.pass ? "meets" : "falls short"}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="rounded bg-paper-deep/70 p-3 text-xs text-graphite-soft" data-testid="check-caution">
        {result.caution}
      </p>
    </div>
  );
}
