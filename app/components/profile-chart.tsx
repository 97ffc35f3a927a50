import type { ReactElement } from "react";
import { profileGeometry, type ProfileGeometry } from "~/drawing/profile-geometry";
import type { ProfileCase } from "~/envelope/types";
import { formatTemperature, formatTemperatureDifference, type UnitSystem } from "~/envelope/units";
import { ShapeElements } from "./section-drawing";

export interface ProfileChartProps {
  /** The winter or summer case of a site-check result. */
  profile: ProfileCase;
  units: UnitSystem;
  className?: string;
}

/** Widths the chart is laid out for: one column on phones (a 360 px screen leaves about 280 px for it
 * inside the page and panel padding, so it draws near 1:1), two panels side by side elsewhere. */
export const PROFILE_CHART_WIDTHS = { narrow: 300, wide: 720 } as const;

function caseName(profile: ProfileCase): string {
  return profile.name === "winter" ? "Winter" : "Summer";
}

export function profileChartTitle(profile: ProfileCase): string {
  return `${caseName(profile)} profile: temperature by thermal resistance, vapour pressure by vapour resistance`;
}

function ChartSvg({
  chart,
  label,
  title,
  className,
}: {
  chart: ProfileGeometry;
  label: string;
  title: string;
  className: string;
}): ReactElement {
  return (
    <svg
      viewBox={`0 0 ${chart.width} ${chart.height}`}
      role="img"
      aria-label={label}
      className={className}
      style={{ width: "100%", height: "auto" }}
      data-layout={chart.layout}
      xmlns="http://www.w3.org/2000/svg"
    >
      <title>{title}</title>
      <ShapeElements shapes={chart.shapes} />
    </svg>
  );
}

/**
 * One site-check case as a titled figure: temperature against thermal resistance, vapour pressure
 * against vapour resistance, and the margin above the dew point at each interface. Drawn twice, for
 * phone and wider screens, so the type stays readable at either size; CSS shows one.
 */
export function ProfileChart({ profile, units, className }: ProfileChartProps): ReactElement {
  const first = profile.firstCondensingSurface;
  const summary = first
    ? `vapour condenses first at ${first.label}, ${formatTemperature(first.t_c, units)}`
    : `nothing condenses; margin ${formatTemperatureDifference(profile.margin_c, units)} at ${profile.marginSurface}`;
  const label = `${caseName(profile)} case: temperature from ${formatTemperature(profile.exterior.t_c, units)} outside to ${formatTemperature(profile.interior.t_c, units)} inside; ${summary}.`;
  const title = profileChartTitle(profile);
  return (
    <figure className={className} data-testid={`profile-chart-${profile.name}`}>
      <figcaption className="mb-1 text-sm font-semibold">{`${caseName(profile)} profile`}</figcaption>
      <ChartSvg
        chart={profileGeometry(profile, { units, width: PROFILE_CHART_WIDTHS.narrow })}
        label={label}
        title={title}
        className="block sm:hidden"
      />
      <ChartSvg
        chart={profileGeometry(profile, { units, width: PROFILE_CHART_WIDTHS.wide })}
        label={label}
        title={title}
        className="hidden sm:block"
      />
    </figure>
  );
}
