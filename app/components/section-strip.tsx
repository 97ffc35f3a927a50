import { familyStyle } from "~/drawing/families";
import type { LayerStripEntry } from "~/models/detail.server";

/**
 * A thin bar of the layers from exterior (left) to interior (right). Thin layers get a minimum
 * width so membranes stay visible.
 */
export function SectionStrip({ layers, className = "" }: { layers: LayerStripEntry[]; className?: string }) {
  const widths = layers.map((layer) => Math.max(layer.thickness_mm, 6));
  const total = widths.reduce((sum, w) => sum + w, 0) || 1;
  let x = 0;
  return (
    <svg
      viewBox="0 0 100 8"
      preserveAspectRatio="none"
      className={`h-2 w-full ${className}`}
      role="img"
      aria-label={`Layers, exterior to interior: ${layers.map((l) => familyStyle(l.family).label).join(", ")}`}
    >
      {layers.map((layer, i) => {
        const w = (widths[i] / total) * 100;
        const style = familyStyle(layer.family);
        const rect = (
          <rect
            key={i}
            x={x}
            y={0}
            width={w}
            height={8}
            fill={style.fill}
            stroke={style.stroke}
            strokeWidth={0.15}
            vectorEffect="non-scaling-stroke"
          />
        );
        x += w;
        return rect;
      })}
    </svg>
  );
}
