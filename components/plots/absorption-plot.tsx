"use client";

import { useId, type ReactNode } from "react";
import { absorptionGeometry, formatFrequencyHz, INK, nearestIndex, OUTSIDE_RANGE_DASH, type AlphaSeries } from "@/lib/plots";
import { Axis, Grid } from "./axis";
import { HoverReadout } from "./hover-readout";
import { Legend } from "./legend";
import { Marker } from "./marker";
import { PlotFrame } from "./plot-frame";
import { SVG_ROOT_STYLE, svgId } from "./svg-text";

/** Props of {@link AbsorptionPlot}. */
export interface AbsorptionPlotProps {
  title: string;
  /** builds: label and spectrum points { frequencyHz, alpha, withinModelRange } (lib/porous absorptionSpectrum) */
  builds: readonly AlphaSeries[];
  units?: string;
  caption?: ReactNode;
  domainHz?: readonly [number, number];
  yTitle?: string;
  areaHeight?: number;
  fallbackWidth?: number;
  className?: string;
}

/**
 * Absorption coefficient α over log frequency for one or several builds, y from 0 to at least 1.0. Points
 * outside a model's fitted range are hollow and joined by dotted lines, with a legend entry saying so.
 */
export function AbsorptionPlot(props: AbsorptionPlotProps) {
  const id = useId();
  return (
    <PlotFrame title={props.title} units={props.units} caption={props.caption} geometry={(width) => absorptionGeometry(props, { width, areaHeight: props.areaHeight })} fallbackWidth={props.fallbackWidth} className={props.className}>
      {(g) => {
        const clip = svgId(id, "clip");
        const one = g.yAxis.ticks.find((t) => t.value === 1);
        return (
          <>
            <svg data-plot-root width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`} role="img" aria-label={`${props.title}. ${g.summary}`} style={SVG_ROOT_STYLE} className="block h-auto max-w-full">
              <defs>
                <clipPath id={clip}>
                  <rect x={-6} y={-6} width={g.area.width + 12} height={g.area.height + 12} />
                </clipPath>
              </defs>
              <Grid area={g.area} x={g.xAxis} y={g.yAxis} />
              <g transform={`translate(${g.area.x},${g.area.y})`}>
                {one && <line x1={0} x2={g.area.width} y1={one.pos} y2={one.pos} stroke={INK.faint} strokeWidth={1} />}
                <g clipPath={`url(#${clip})`}>
                  {g.builds.map((b) =>
                    b.runs.map((r, i) =>
                      r.withinModelRange ? (
                        <path key={`${b.label}-${i}`} d={r.path} fill="none" stroke={b.style.colour} strokeWidth={1.9} strokeDasharray={b.style.dash || undefined} strokeLinejoin="round" />
                      ) : (
                        <path key={`${b.label}-${i}`} d={r.path} fill="none" stroke={b.style.colour} strokeWidth={1.4} strokeDasharray={OUTSIDE_RANGE_DASH} strokeLinecap="round" />
                      ),
                    ),
                  )}
                  {g.builds.map((b) => b.markers.map((m, i) => <Marker key={`${b.label}-${i}`} {...m} />))}
                </g>
              </g>
              <Axis axis={g.xAxis} area={g.area} />
              <Axis axis={g.yAxis} area={g.area} />
              <Legend legend={g.legend} />
            </svg>
            <HoverReadout
              area={g.area}
              positions={g.hoverX}
              label={`${props.title}: read-out; arrow keys move along frequency`}
              describe={(i) => {
                const f = g.hoverHz[i]!;
                return {
                  heading: `${formatFrequencyHz(f)} Hz`,
                  rows: props.builds.map((b, k) => {
                    const j = nearestIndex(b.points.map((p) => p.frequencyHz), f);
                    const p = j === undefined ? undefined : b.points[j];
                    return {
                      label: b.label,
                      value: p ? `α ${p.alpha.toFixed(2)}${p.withinModelRange ? "" : " (outside fitted range)"}` : "–",
                      colour: g.builds[k]!.style.colour,
                      dash: g.builds[k]!.style.dash,
                      y: p ? g.mapY(p.alpha) : undefined,
                    };
                  }),
                };
              }}
            />
          </>
        );
      }}
    </PlotFrame>
  );
}
