import type { ReactElement } from "react";
import { profileGeometry } from "~/drawing/profile-geometry";
import type { ProfileCase } from "~/envelope/types";
import { formatTemperature, formatTemperatureDifference, type UnitSystem } from "~/envelope/units";
import { ShapeElements } from "./section-drawing";

export interface ProfileChartProps {
  /** The winter or summer case of a site-check result. */
  profile: ProfileCase;
  units: UnitSystem;
  className?: string;
}

/** Temperature (red) and dew point (teal) through the layers, with condensation planes marked. */
export function ProfileChart({ profile, units, className }: ProfileChartProps): ReactElement {
  const chart = profileGeometry(profile, { units });
  const first = profile.firstCondensingSurface;
  const summary = first
    ? `condensation first at ${first.label}, ${formatTemperature(first.t_c, units)}`
    : `no condensation; margin ${formatTemperatureDifference(profile.margin_c, units)} at ${profile.marginSurface}`;
  return (
    <svg
      viewBox={`0 0 ${chart.width} ${chart.height}`}
      role="img"
      aria-label={`${profile.name === "winter" ? "Winter" : "Summer"} case: temperature from ${formatTemperature(profile.exterior.t_c, units)} outside to ${formatTemperature(profile.interior.t_c, units)} inside; ${summary}.`}
      className={className}
      style={{ width: "100%", height: "auto", display: "block" }}
      xmlns="http://www.w3.org/2000/svg"
    >
      <title>{`${profile.name === "winter" ? "Winter" : "Summer"} temperature and dew-point profile`}</title>
      <ShapeElements shapes={chart.shapes} />
    </svg>
  );
}
