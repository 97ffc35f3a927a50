import type { ReactElement } from "react";
import {
  seasonalFigures,
  seasonalGeometry,
  seasonalVerdictLabel,
  SEASONAL_CHART_WIDTHS,
  type SeasonalGeometry,
} from "~/drawing/seasonal-geometry";
import type { SeasonalResult } from "~/envelope/types";
import type { UnitSystem } from "~/envelope/units";
import { ShapeElements } from "./section-drawing";

function ChartSvg({
  chart,
  label,
  className,
}: {
  chart: SeasonalGeometry;
  label: string;
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
      <title>
        Seasonal balance: water held at the critical interface and the margin above the dew point, January to December
      </title>
      <ShapeElements shapes={chart.shapes} />
    </svg>
  );
}

/** The 12-month chart of the seasonal balance, drawn for phones and for wider screens; CSS shows one. */
export function SeasonalChart({
  seasonal,
  units,
  className,
}: {
  seasonal: SeasonalResult;
  units: UnitSystem;
  className?: string;
}): ReactElement {
  const label = `${seasonalVerdictLabel(seasonal)}. ${seasonalFigures(seasonal, units)}`;
  return (
    <figure className={className} data-testid="seasonal-chart" data-verdict={seasonal.verdict}>
      <ChartSvg
        chart={seasonalGeometry(seasonal, { units, width: SEASONAL_CHART_WIDTHS.narrow })}
        label={label}
        className="block sm:hidden"
      />
      <ChartSvg
        chart={seasonalGeometry(seasonal, { units, width: SEASONAL_CHART_WIDTHS.wide })}
        label={label}
        className="hidden sm:block"
      />
    </figure>
  );
}
