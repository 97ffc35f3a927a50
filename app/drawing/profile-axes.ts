// Where each interface of a site-check case sits on the profile chart's two resistance axes, read
// back from the engine's result (the chart never re-runs the calculation):
// - thermal: the share of the case's total thermal resistance between the outdoor (or soil) side and
//   the interface. In steady state the temperature falls linearly in cumulative resistance, so the
//   share is (t − t_out) / (t_in − t_out), air films included.
// - vapour: the share of the case's total vapour resistance, summed from the permeances the engine
//   used for this case (1 / permeance per layer; layers outboard of the vapour boundary resist
//   nothing in that case).
import { dewPointFromVapourPressure } from "~/envelope/psychrometrics";
import type { ProfileCase } from "~/envelope/types";

export interface ProfilePoint {
  /** Interface index (0 = outer face of layer 1). */
  k: number;
  /** Cumulative thermal resistance from the outside, as a share of the case's total (0…1). */
  thermal: number;
  /** Cumulative vapour resistance from the outside, as a share of the case's total (0…1). */
  vapour: number;
  t_c: number;
  /** Dew point of the vapour present (after any condensation). */
  dewPoint_c: number;
  p_sat_pa: number;
  p_v_pa: number;
  /** Vapour pressure on the straight line, as if nothing condensed (the Glaser test line). */
  p_v_linear_pa: number;
  /** Interface temperature minus the dew point of the straight-line vapour pressure: below zero,
   * the vapour arriving would condense here. */
  margin_c: number;
  condensing: boolean;
}

export interface ProfileAxes {
  points: ProfilePoint[];
  /** False when indoors and outdoors are within a tenth of a kelvin: thermal shares then fall back
   * to shares of thickness (there is no gradient to read them from). */
  thermalFromTemperature: boolean;
}

const dewPoint = (pa: number): number => dewPointFromVapourPressure(Math.max(pa, 1e-3));

export function profileAxes(profile: ProfileCase): ProfileAxes {
  const { interfaces } = profile;
  const dT = profile.interior.t_c - profile.exterior.t_c;
  const thermalFromTemperature = Math.abs(dT) >= 0.1;
  const x0 = interfaces[0]?.position_mm ?? 0;
  const thickness = (interfaces[interfaces.length - 1]?.position_mm ?? 0) - x0;

  // Vapour resistance per layer, m²·s·Pa/ng; zero outboard of the case's vapour boundary.
  const resistance = interfaces.slice(1).map((_, i) => {
    const perm = profile.vapourLayers[i]?.case_perm_ng ?? Infinity;
    return i < profile.boundaryIndex || !(perm > 0) ? 0 : 1 / perm;
  });
  const cumulative = [0];
  for (const r of resistance) cumulative.push(cumulative[cumulative.length - 1] + (Number.isFinite(r) ? r : 0));
  const totalZ = cumulative[cumulative.length - 1];

  const clamp = (v: number): number => Math.min(1, Math.max(0, v));
  const points = interfaces.map(
    (p, k): ProfilePoint => ({
      k,
      thermal: thermalFromTemperature
        ? clamp((p.t_c - profile.exterior.t_c) / dT)
        : thickness > 0
          ? (p.position_mm - x0) / thickness
          : 0,
      vapour: totalZ > 0 ? cumulative[k] / totalZ : 0,
      t_c: p.t_c,
      dewPoint_c: dewPoint(p.p_v_pa),
      p_sat_pa: p.p_sat_pa,
      p_v_pa: p.p_v_pa,
      p_v_linear_pa: p.p_v_linear_pa,
      margin_c: p.t_c - dewPoint(p.p_v_linear_pa),
      condensing: p.condensing,
    }),
  );
  return { points, thermalFromTemperature };
}
