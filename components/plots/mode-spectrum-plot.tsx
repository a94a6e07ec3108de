"use client";

import type { ReactNode } from "react";
import { formatValue, INK, modeSpectrumGeometry, type MarkerLine, type PlotMode } from "@/lib/plots";
import { Axis, Grid } from "./axis";
import { HoverReadout } from "./hover-readout";
import { Legend } from "./legend";
import { Marker } from "./marker";
import { PlotFrame } from "./plot-frame";
import { MarkerLines } from "./marker-lines";
import { SVG_ROOT_STYLE, TEXT } from "./svg-text";

/** Props of {@link ModeSpectrumPlot}. */
export interface ModeSpectrumPlotProps {
  title: string;
  /** room modes (lib/modes roomModes output fits) */
  modes: readonly PlotMode[];
  scale?: "log" | "linear";
  domainHz?: readonly [number, number];
  /** half-power bandwidth of each mode, Hz; draws f ± B/2 bars */
  bandwidthHz?: number;
  markers?: readonly MarkerLine[];
  units?: string;
  caption?: ReactNode;
  fallbackWidth?: number;
  className?: string;
}

const indices = (m: PlotMode) => `(${m.nx},${m.ny},${m.nz})`;

/**
 * Room modes as stems in three lanes by kind (axial solid with circles, tangential dashed with squares,
 * oblique dotted with triangles), optional bandwidth bars, log or linear frequency axis, and a read-out
 * listing the modes on each stem. Modes that coincide on screen share a stem and show their count.
 */
export function ModeSpectrumPlot(props: ModeSpectrumPlotProps) {
  return (
    <PlotFrame title={props.title} units={props.units} caption={props.caption} geometry={(width) => modeSpectrumGeometry(props, { width })} fallbackWidth={props.fallbackWidth} className={props.className}>
      {(g) => {
        return (
          <>
            <svg data-plot-root width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`} role="img" aria-label={`${props.title}. ${g.summary}`} style={SVG_ROOT_STYLE} className="block h-auto max-w-full">
              <Grid area={g.area} x={g.xAxis} />
              <g transform={`translate(${g.area.x},${g.area.y})`}>
                {g.lanes.map((l, i) => (
                  <g key={l.kind}>
                    {i % 2 === 1 && <rect y={l.y0} width={g.area.width} height={l.y1 - l.y0} fill={INK.sunk} fillOpacity={0.45} />}
                    {i > 0 && <line x1={0} x2={g.area.width} y1={l.y0} y2={l.y0} stroke={INK.line} />}
                  </g>
                ))}
                {g.stems.map((s, i) =>
                  s.bar ? (
                    <rect key={`b${i}`} x={s.bar.x0} y={s.bar.y - s.bar.height / 2} width={Math.max(1, s.bar.x1 - s.bar.x0)} height={s.bar.height} fill={g.lanes.find((l) => l.kind === s.kind)!.style.colour} fillOpacity={0.18} />
                  ) : null,
                )}
                {g.stems.map((s, i) => {
                  const lane = g.lanes.find((l) => l.kind === s.kind)!;
                  return (
                    <g key={`s${i}`}>
                      <line x1={s.x} x2={s.x} y1={s.yTop} y2={s.yBottom} stroke={lane.style.colour} strokeWidth={1.6} strokeDasharray={lane.style.dash || undefined} />
                      <Marker path={lane.markerPath} shape={lane.style.marker} x={s.x} y={s.yTop} colour={lane.style.colour} />
                      {s.countLabel && (
                        <text x={s.x + 6} y={s.yTop - 3} {...TEXT.tick} fontSize={10} fill={INK.ink} fontWeight={600}>
                          ×{s.modes.length}
                        </text>
                      )}
                    </g>
                  );
                })}
                <MarkerLines lines={g.markerLines} height={g.area.height} />
              </g>
              <Axis axis={g.xAxis} area={g.area} />
              <Axis axis={g.yAxis} area={g.area} />
              <Legend legend={g.legend} />
            </svg>
            <HoverReadout
              area={g.area}
              positions={g.hoverX}
              label={`${props.title}: read-out; arrow keys move from mode to mode`}
              describe={(i) => {
                const s = g.stems[g.hoverStem[i]!]!;
                const lane = g.lanes.find((l) => l.kind === s.kind)!;
                return {
                  heading: `${s.kind} ${s.modes.length > 1 ? `(${s.modes.length} modes)` : "mode"}`,
                  rows: s.modes.map((m) => ({ label: indices(m), value: `${formatValue(m.frequencyHz, 1)} Hz`, colour: lane.style.colour, dash: lane.style.dash })),
                };
              }}
            />
          </>
        );
      }}
    </PlotFrame>
  );
}
