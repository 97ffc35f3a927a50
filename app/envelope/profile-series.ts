// Kept apart from profile.ts so the chart in the browser needs only psychrometrics, not the material schema.
import { dewPointFromVapourPressure } from "./psychrometrics";
import type { ProfileCase } from "./types";

/** Chart-ready series (position, temperature, dew point of the local vapour pressure, RH). */
export function profileChartSeries(
  profile: ProfileCase,
): { position_mm: number; t_c: number; dew_point_c: number; p_v_pa: number; p_sat_pa: number; rh: number }[] {
  return profile.interfaces.map((i) => ({
    position_mm: i.position_mm,
    t_c: i.t_c,
    dew_point_c: dewPointFromVapourPressure(Math.max(i.p_v_pa, 1e-3)),
    p_v_pa: i.p_v_pa,
    p_sat_pa: i.p_sat_pa,
    rh: i.rh,
  }));
}
