import type { ReactElement } from "react";
import { sectionGeometry, type SectionInput } from "~/drawing/section-geometry";
import type { Shape } from "~/drawing/shapes";
import { formatThickness, type UnitSystem } from "~/envelope/units";

const FONTS = {
  sans: "Inter, ui-sans-serif, system-ui, sans-serif",
  serif: "Merriweather, ui-serif, Georgia, serif",
} as const;

const ANCHOR = { start: "start", middle: "middle", end: "end" } as const;

/** Draws geometry primitives as SVG elements (shared by the section drawing and the profile chart). */
export function ShapeElements({ shapes }: { shapes: readonly Shape[] }): ReactElement {
  return (
    <>
      {shapes.map((s, i) => {
        switch (s.type) {
          case "rect":
            return (
              <rect
                key={i}
                x={s.x}
                y={s.y}
                width={s.w}
                height={s.h}
                fill={s.fill ?? "none"}
                stroke={s.stroke}
                strokeWidth={s.strokeWidth}
                strokeDasharray={s.dash?.join(" ")}
                opacity={s.opacity}
              />
            );
          case "line":
            return (
              <line
                key={i}
                x1={s.x1}
                y1={s.y1}
                x2={s.x2}
                y2={s.y2}
                stroke={s.stroke}
                strokeWidth={s.strokeWidth}
                strokeDasharray={s.dash?.join(" ")}
                opacity={s.opacity}
                strokeLinecap="round"
              />
            );
          case "polyline": {
            const points = s.points.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(" ");
            return s.closed ? (
              <polygon
                key={i}
                points={points}
                fill={s.fill ?? "none"}
                stroke={s.stroke}
                strokeWidth={s.strokeWidth}
                strokeDasharray={s.dash?.join(" ")}
                opacity={s.opacity}
                strokeLinejoin="round"
              />
            ) : (
              <polyline
                key={i}
                points={points}
                fill={s.fill ?? "none"}
                stroke={s.stroke}
                strokeWidth={s.strokeWidth}
                strokeDasharray={s.dash?.join(" ")}
                opacity={s.opacity}
                strokeLinejoin="round"
                strokeLinecap="round"
              />
            );
          }
          case "circle":
            return (
              <circle
                key={i}
                cx={s.cx}
                cy={s.cy}
                r={s.r}
                fill={s.fill ?? "none"}
                stroke={s.stroke}
                strokeWidth={s.strokeWidth}
                opacity={s.opacity}
              />
            );
          case "text":
            return (
              <text
                key={i}
                x={s.x}
                y={s.y}
                fontSize={s.size}
                fontWeight={s.weight === "bold" ? 700 : 400}
                textAnchor={ANCHOR[s.anchor]}
                fontFamily={FONTS[s.font]}
                fill={s.fill}
                letterSpacing={s.tracking}
              >
                {s.text}
              </text>
            );
        }
      })}
    </>
  );
}

export interface SectionDrawingProps {
  assembly: SectionInput;
  units: UnitSystem;
  /** Heading read by assistive technology, e.g. the detail title. */
  title: string;
  className?: string;
}

/** The generated section of a detail: layers exterior → interior with hatch, callouts and legend. */
export function SectionDrawing({ assembly, units, title, className }: SectionDrawingProps): ReactElement {
  const geometry = sectionGeometry(assembly, { units });
  const sides = geometry.sideLabels;
  const label = `Section, ${sides.exterior.toLowerCase()} to ${sides.interior.toLowerCase()}: ${geometry.bands
    .map((b) => `${b.number}. ${b.materialName}, ${formatThickness(b.thickness_mm, units)}`)
    .join("; ")}.`;
  return (
    <svg
      viewBox={`0 0 ${geometry.width} ${geometry.height}`}
      role="img"
      aria-label={label}
      className={className}
      style={{ width: "100%", height: "auto", display: "block" }}
      xmlns="http://www.w3.org/2000/svg"
    >
      <title>{`${title}: section drawing`}</title>
      <ShapeElements shapes={geometry.shapes} />
    </svg>
  );
}
