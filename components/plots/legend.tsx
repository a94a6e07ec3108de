import { hatchPath, INK, LEGEND_METRICS, markerPath, type LegendLayout } from "@/lib/plots";
import { Marker } from "./marker";
import { TEXT } from "./svg-text";

/** Props of {@link Legend}. */
export interface LegendProps {
  legend: LegendLayout & { x: number; y: number };
}

/** The legend block inside the SVG (so exports and the PDF carry it): colour, dash, marker and hatch swatches. */
export function Legend({ legend }: LegendProps) {
  if (legend.items.length === 0) return null;
  const { swatchPx, labelGapPx } = LEGEND_METRICS;
  return (
    <g transform={`translate(${legend.x},${legend.y})`}>
      {legend.items.map((item, i) => (
        <g key={`${item.label}-${i}`} transform={`translate(${item.x},${item.y})`}>
          {item.kind === "line" && (
            <line x1={1} x2={swatchPx - 1} y1={0} y2={0} stroke={item.colour} strokeWidth={2} strokeDasharray={item.dash || undefined} strokeLinecap="butt" />
          )}
          {item.kind === "box" && (
            <g>
              <rect x={1} y={-6} width={swatchPx - 2} height={12} fill={item.colour} fillOpacity={item.fillOpacity ?? 1} stroke={item.dash ? item.colour : INK.soft} strokeWidth={item.dash ? 1 : 0.6} strokeDasharray={item.dash || undefined} />
              {item.hatchAngleDeg !== undefined && (
                <path
                  d={hatchPath({ x: 1, y: -6, width: swatchPx - 2, height: 12 }, { angleDeg: item.hatchAngleDeg as 0 | 45 | 90 | 135, spacingPx: item.hatchSpacingPx ?? 4 })}
                  stroke={item.colour}
                  strokeWidth={0.9}
                />
              )}
            </g>
          )}
          {item.marker && <Marker path={markerPath(item.marker, item.kind === "marker" ? 9 : 7)} shape={item.marker} x={swatchPx / 2} y={0} colour={item.colour} hollow={item.hollow} />}
          <text x={swatchPx + labelGapPx} dy="0.32em" {...TEXT.legend}>
            {item.label}
          </text>
        </g>
      ))}
    </g>
  );
}
