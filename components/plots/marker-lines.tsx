import { INK, type DrawnMarkerLine } from "@/lib/plots";
import { TEXT } from "./svg-text";

/** Vertical marker lines with their labels (e.g. the Schroeder frequency), in plot-area coordinates. */
export function MarkerLines({ lines, height }: { lines: readonly DrawnMarkerLine[]; height: number }) {
  return (
    <>
      {lines.map((m) => (
        <g key={`${m.label}-${m.x}`}>
          <line x1={m.x} x2={m.x} y1={0} y2={height} stroke={INK.kiln} strokeWidth={1.25} strokeDasharray="6 3" />
          <text x={m.labelX} y={m.labelY} textAnchor={m.anchor} {...TEXT.tick} fill={INK.kiln}>
            {m.label}
          </text>
        </g>
      ))}
    </>
  );
}
