import { labelFor } from "~/catalogue/vocabulary";
import type { SiteCheckResult } from "~/envelope";
import { formatPermeance, formatR, formatThickness, type UnitSystem } from "~/envelope/units";

interface Row {
  role: string;
  materialName: string;
  thickness_mm: number;
  framing?: { material: string; fraction: number };
  joints?: string;
  note?: string;
}

const ROLE_LABEL = (role: string) => role.replaceAll("-", " ");

/** Layers exterior → interior; R and permeance columns come from the same site-check result the chart uses. */
export function LayerTable({
  layers,
  result,
  units,
}: {
  layers: Row[];
  result: SiteCheckResult | null;
  units: UnitSystem;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" data-testid="layer-table">
        <caption className="sr-only">Layers from exterior to interior</caption>
        <thead>
          <tr className="border-b border-graphite/40 text-left text-xs uppercase tracking-wide text-graphite-soft">
            <th className="py-1.5 pr-2 font-semibold">#</th>
            <th className="py-1.5 pr-2 font-semibold">Role</th>
            <th className="py-1.5 pr-2 font-semibold">Material</th>
            <th className="py-1.5 pr-2 text-right font-semibold">Thickness</th>
            <th className="py-1.5 pr-2 text-right font-semibold">R</th>
            <th className="py-1.5 pr-2 text-right font-semibold">Permeance</th>
            <th className="py-1.5 font-semibold">Class</th>
          </tr>
        </thead>
        <tbody>
          {layers.map((layer, i) => {
            const thermal = result?.thermal.layers[i];
            const vapour = result?.vapour.layers[i];
            return (
              <tr key={i} className="border-b border-rule align-top">
                <td className="py-1.5 pr-2 tabular-nums text-graphite-soft">{i + 1}</td>
                <td className="py-1.5 pr-2 capitalize">{ROLE_LABEL(layer.role)}</td>
                <td className="py-1.5 pr-2">
                  {layer.materialName}
                  {layer.framing ? (
                    <span className="block text-xs text-graphite-soft">
                      framed, {Math.round(layer.framing.fraction * 100)} % framing
                    </span>
                  ) : null}
                  {layer.joints ? (
                    <span className="block text-xs text-graphite-soft">joints {layer.joints}</span>
                  ) : null}
                  {layer.note ? <span className="block text-xs text-graphite-soft">{layer.note}</span> : null}
                </td>
                <td className="py-1.5 pr-2 text-right tabular-nums">{formatThickness(layer.thickness_mm, units)}</td>
                <td className="py-1.5 pr-2 text-right tabular-nums">{thermal ? formatR(thermal.rsi, units) : "—"}</td>
                <td className="py-1.5 pr-2 text-right tabular-nums">
                  {vapour ? formatPermeance(vapour.perm_ng, units) : "—"}
                </td>
                <td className="py-1.5">
                  {vapour ? (vapour.class === "permeable" ? "open" : labelFor(vapour.class)) : "—"}
                </td>
              </tr>
            );
          })}
        </tbody>
        {result ? (
          <tfoot>
            <tr className="text-sm">
              <td colSpan={4} className="py-1.5 pr-2 text-right text-graphite-soft">
                With air films ({result.thermal.films.map((f) => f.label).join(", ")})
              </td>
              <td className="py-1.5 pr-2 text-right font-semibold tabular-nums">
                {formatR(result.thermal.rsi, units)}
              </td>
              <td colSpan={2} />
            </tr>
          </tfoot>
        ) : null}
      </table>
    </div>
  );
}
