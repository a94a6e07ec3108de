"use client";

import { useId, useState, type KeyboardEvent, type PointerEvent, type ReactNode } from "react";
import { formatValue, heatmapCellAt, heatmapGeometry, INK, type RampName } from "@/lib/plots";
import { Axis } from "./axis";
import { ReadoutBox, readoutText, type Readout } from "./hover-readout";
import { PlotFrame } from "./plot-frame";
import { SVG_ROOT_STYLE, svgId, TEXT } from "./svg-text";

/** Props of {@link Heatmap}. */
export interface HeatmapProps {
  title: string;
  /** room floor, m: x along the length, y along the width */
  lengthM: number;
  widthM: number;
  /** cell-centre coordinates, m (lib/modes flatnessMap xM / yM) */
  xM: readonly number[];
  yM: readonly number[];
  /** one value per cell, index ix · gridY + iy (flatnessMap stdDevDb) */
  values: ArrayLike<number>;
  valueTitle: string;
  valueUnit: string;
  domain?: readonly [number, number];
  ramp?: RampName;
  /**
   * Overlay drawn over the map in room metres (x right, y down from the y = 0 wall), e.g. seats and subwoofers:
   * <PlanMarker kind="seat" xM={2.9} yM={2.05} label="S1" />.
   */
  children?: ReactNode;
  units?: string;
  caption?: ReactNode;
  maxAreaHeight?: number;
  fallbackWidth?: number;
  className?: string;
}

/**
 * A value grid over a floor plan drawn to scale (x = length, y = width), with a colour bar, an overlay slot
 * in room metres, and a read-out of the cell under the pointer or moved with the arrow keys.
 */
export function Heatmap(props: HeatmapProps) {
  const id = useId();
  const [cell, setCell] = useState<{ ix: number; iy: number } | null>(null);
  const input = { ...props, values: props.values };
  return (
    <PlotFrame title={props.title} units={props.units} caption={props.caption} geometry={(width) => heatmapGeometry(input, { width, maxAreaHeight: props.maxAreaHeight })} fallbackWidth={props.fallbackWidth} className={props.className}>
      {(g) => {
        const grad = svgId(id, "ramp");
        const active = cell && cell.ix < g.gridX && cell.iy < g.gridY ? g.cells[cell.ix * g.gridY + cell.iy] : undefined;
        const readout: Readout | null = active
          ? {
              heading: `x ${formatValue(props.xM[active.ix]!, 2)} m, y ${formatValue(props.yM[active.iy]!, 2)} m`,
              rows: [{ label: props.valueTitle, value: `${formatValue(active.value, 2)} ${props.valueUnit}` }],
            }
          : null;
        const onPointer = (e: PointerEvent<HTMLDivElement>) => {
          const box = e.currentTarget.getBoundingClientRect();
          const c = heatmapCellAt(g, e.clientX - box.left, e.clientY - box.top);
          if (c) setCell(c);
        };
        const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
          const d: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, -1], ArrowDown: [0, 1] };
          if (e.key === "Escape") { setCell(null); return; }
          let next: { ix: number; iy: number } | null = null;
          const cur = cell ?? { ix: g.min.ix, iy: g.min.iy };
          if (e.key === "Home") next = { ix: 0, iy: 0 };
          else if (e.key === "End") next = { ix: g.gridX - 1, iy: g.gridY - 1 };
          else if (d[e.key]) next = cell ? { ix: Math.max(0, Math.min(g.gridX - 1, cur.ix + d[e.key]![0])), iy: Math.max(0, Math.min(g.gridY - 1, cur.iy + d[e.key]![1])) } : cur;
          if (!next) return;
          e.preventDefault();
          setCell(next);
        };
        return (
          <>
            <svg data-plot-root width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`} role="img" aria-label={`${props.title}. ${g.summary}`} style={SVG_ROOT_STYLE} className="block h-auto max-w-full">
              <defs>
                <linearGradient id={grad} x1="0" x2="1" y1="0" y2="0">
                  {g.ramp.stops.map((s) => (
                    <stop key={s.offset} offset={s.offset} stopColor={s.colour} />
                  ))}
                </linearGradient>
              </defs>
              <g transform={`translate(${g.area.x},${g.area.y})`} shapeRendering="crispEdges">
                {g.cells.map((c) => (
                  <rect key={`${c.ix}-${c.iy}`} x={c.x} y={c.y} width={c.width + 0.4} height={c.height + 0.4} fill={c.fill} />
                ))}
              </g>
              <rect x={g.area.x} y={g.area.y} width={g.area.width} height={g.area.height} fill="none" stroke={INK.ink} strokeWidth={1.5} />
              <svg x={g.area.x} y={g.area.y} width={g.area.width} height={g.area.height} viewBox={`0 0 ${props.lengthM} ${props.widthM}`} overflow="visible">
                {props.children}
              </svg>
              <Axis axis={g.xAxis} area={g.area} />
              <Axis axis={g.yAxis} area={g.area} />
              <g transform={`translate(${g.colourBar.x},${g.colourBar.y})`}>
                <text y={-6} {...TEXT.title}>
                  {g.colourBar.title}
                </text>
                <rect width={g.colourBar.width} height={g.colourBar.height} fill={`url(#${grad})`} stroke={INK.soft} strokeWidth={0.6} />
                {g.colourBar.ticks.map((t) => (
                  <g key={t.value} transform={`translate(${t.pos},${g.colourBar.height})`}>
                    <line y2={4} stroke={INK.soft} />
                    <text y={15} textAnchor="middle" {...TEXT.tick}>
                      {t.label}
                    </text>
                  </g>
                ))}
                <text x={g.colourBar.width + 10} y={g.colourBar.height / 2} dy="0.32em" {...TEXT.tick}>
                  {g.ramp.highIsDark ? "darker = higher" : "lighter = higher"}
                </text>
              </g>
            </svg>
            <div
              className="no-print absolute print:hidden"
              style={{ left: g.area.x, top: g.area.y, width: g.area.width, height: g.area.height }}
              tabIndex={0}
              role="group"
              aria-roledescription="map read-out"
              aria-label={`${props.title}: read-out; arrow keys move from cell to cell`}
              onPointerMove={onPointer}
              onPointerDown={onPointer}
              onPointerLeave={(e) => { if (document.activeElement !== e.currentTarget) setCell(null); }}
              onKeyDown={onKey}
              onBlur={() => setCell(null)}
            >
              {active && readout && (
                <>
                  <svg className="pointer-events-none absolute inset-0 overflow-visible" width={g.area.width} height={g.area.height} aria-hidden="true">
                    <rect x={active.x} y={active.y} width={active.width} height={active.height} fill="none" stroke={INK.raised} strokeWidth={3} />
                    <rect x={active.x} y={active.y} width={active.width} height={active.height} fill="none" stroke={INK.ink} strokeWidth={1.5} />
                  </svg>
                  <ReadoutBox
                    readout={readout}
                    side={active.x > g.area.width * 0.6 ? "left" : "right"}
                    style={{ left: active.x > g.area.width * 0.6 ? active.x - 8 : active.x + active.width + 8, top: Math.min(Math.max(0, active.y - 8), Math.max(0, g.area.height - 48)) }}
                  />
                </>
              )}
              <span className="sr-only" aria-live="polite">
                {readout ? readoutText(readout) : ""}
              </span>
            </div>
          </>
        );
      }}
    </PlotFrame>
  );
}

/** Props of {@link PlanMarker}. */
export interface PlanMarkerProps {
  kind: "seat" | "subwoofer" | "speaker";
  /** position on the floor plan, m */
  xM: number;
  yM: number;
  label?: string;
}

/**
 * A seat (ring), subwoofer (square) or speaker (triangle) on a floor-plan overlay, sized in room metres;
 * white halo so it reads on both ends of the colour ramp.
 */
export function PlanMarker({ kind, xM, yM, label }: PlanMarkerProps) {
  const r = 0.11;
  const shape =
    kind === "seat" ? (
      <circle cx={xM} cy={yM} r={r} />
    ) : kind === "subwoofer" ? (
      <rect x={xM - r} y={yM - r} width={2 * r} height={2 * r} />
    ) : (
      <path d={`M${xM},${yM - r * 1.2}L${xM + r * 1.1},${yM + r * 0.8}L${xM - r * 1.1},${yM + r * 0.8}Z`} />
    );
  return (
    <g>
      <g fill={kind === "seat" ? INK.raised : INK.ink} stroke={INK.raised} strokeWidth={0.07}>
        {shape}
      </g>
      <g fill="none" stroke={INK.ink} strokeWidth={0.03}>
        {shape}
      </g>
      {label && (
        <text x={xM} y={yM - r - 0.07} textAnchor="middle" fontSize={0.17} fontWeight={600} fill={INK.ink} stroke={INK.raised} strokeWidth={0.05} paintOrder="stroke">
          {label}
        </text>
      )}
    </g>
  );
}
