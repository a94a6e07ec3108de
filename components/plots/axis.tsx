import { INK, type AxisGeometry, type Rect } from "@/lib/plots";
import { TEXT } from "./svg-text";

/** Props of {@link Axis}. */
export interface AxisProps {
  axis: AxisGeometry;
  /** the plot area the axis belongs to */
  area: Rect;
  /** distance of a left axis title from the axis line, px (default: the left margin less 12) */
  titleOffsetPx?: number;
}

/**
 * A bottom or left axis from lib/plots ticks: axis line, major ticks with labels, short unlabelled minor
 * ticks, and the axis title with its unit.
 */
export function Axis({ axis, area, titleOffsetPx }: AxisProps) {
  if (axis.orientation === "bottom") {
    return (
      <g transform={`translate(${area.x},${area.y + area.height})`} aria-hidden="true">
        <line x1={0} x2={axis.length} y1={0} y2={0} stroke={INK.soft} strokeWidth={1} />
        {axis.ticks.map((t) => (
          <g key={`${t.value}-${t.pos}`} transform={`translate(${round(t.pos)},0)`}>
            <line y1={0} y2={t.major ? 5 : 3} stroke={INK.soft} strokeWidth={t.major ? 1 : 0.75} />
            {t.label && (
              <text y={17} textAnchor="middle" {...TEXT.tick}>
                {t.label}
              </text>
            )}
          </g>
        ))}
        {axis.title && (
          <text x={axis.length / 2} y={34} textAnchor="middle" {...TEXT.title}>
            {axis.title}
          </text>
        )}
      </g>
    );
  }
  const offset = titleOffsetPx ?? area.x - 12;
  return (
    <g transform={`translate(${area.x},${area.y})`} aria-hidden="true">
      <line x1={0} x2={0} y1={0} y2={axis.length} stroke={INK.soft} strokeWidth={1} />
      {axis.ticks.map((t) => (
        <g key={`${t.value}-${t.pos}-${t.label}`} transform={`translate(0,${round(t.pos)})`}>
          <line x1={0} x2={t.major ? -5 : -3} stroke={INK.soft} strokeWidth={t.major ? 1 : 0.75} />
          {t.label && (
            <text x={-8} dy="0.32em" textAnchor="end" {...TEXT.tick}>
              {t.label}
            </text>
          )}
        </g>
      ))}
      {axis.title && (
        <text transform={`translate(${-offset},${axis.length / 2}) rotate(-90)`} textAnchor="middle" {...TEXT.title}>
          {axis.title}
        </text>
      )}
    </g>
  );
}

/** Props of {@link Grid}. */
export interface GridProps {
  area: Rect;
  x?: AxisGeometry;
  y?: AxisGeometry;
}

/** Light grid lines behind the data: solid at major ticks, dotted at minor ones. */
export function Grid({ area, x, y }: GridProps) {
  return (
    <g transform={`translate(${area.x},${area.y})`} aria-hidden="true">
      <rect width={area.width} height={area.height} fill={INK.raised} />
      {x?.ticks.map((t) => (
        <line key={`x${t.value}`} x1={round(t.pos)} x2={round(t.pos)} y1={0} y2={area.height} stroke={INK.line} strokeWidth={t.major ? 1 : 0.6} strokeDasharray={t.major ? undefined : "1 2"} />
      ))}
      {y?.ticks.map((t) => (
        <line key={`y${t.value}-${t.label}`} x1={0} x2={area.width} y1={round(t.pos)} y2={round(t.pos)} stroke={INK.line} strokeWidth={1} />
      ))}
    </g>
  );
}

const round = (v: number) => Math.round(v * 100) / 100;
