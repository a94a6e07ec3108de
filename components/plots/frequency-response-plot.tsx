"use client";

import { useId, type ReactNode } from "react";
import {
  formatFrequencyHz, formatValue, frequencyResponseGeometry, INK, nearestIndex, type FrequencyResponseInput, type FrequencySeries, type MarkerLine,
} from "@/lib/plots";
import { Axis, Grid } from "./axis";
import { HoverReadout } from "./hover-readout";
import { Legend } from "./legend";
import { Marker } from "./marker";
import { PlotFrame } from "./plot-frame";
import { MarkerLines } from "./marker-lines";
import { SVG_ROOT_STYLE, svgId, TEXT } from "./svg-text";

/** Props of {@link FrequencyResponsePlot}. */
export interface FrequencyResponsePlotProps {
  title: string;
  /** curves: label, ascending frequencies (Hz) and levels (dB; null or ≤ −200 dB leaves a gap) */
  series: readonly FrequencySeries[];
  units?: string;
  caption?: ReactNode;
  domainHz?: readonly [number, number];
  levelDomainDb?: readonly [number, number];
  /** shaded region, e.g. { fromHz: 20, toHz: 118, label: "below Schroeder frequency" } */
  shadedBand?: FrequencyResponseInput["shadedBand"];
  /** vertical marker lines, e.g. [{ value: 118, label: "Schroeder 118 Hz" }] */
  markers?: readonly MarkerLine[];
  yTitle?: string;
  /** plot-area height, px (default from the width) */
  areaHeight?: number;
  fallbackWidth?: number;
  className?: string;
}

/** Several curves of level (dB) over log frequency, with an optional shaded band, marker lines and a read-out. */
export function FrequencyResponsePlot(props: FrequencyResponsePlotProps) {
  const id = useId();
  return (
    <PlotFrame title={props.title} units={props.units} caption={props.caption} geometry={(width) => frequencyResponseGeometry(props, { width, areaHeight: props.areaHeight })} fallbackWidth={props.fallbackWidth} className={props.className}>
      {(g) => {
        const clip = svgId(id, "clip");
        return (
          <>
            <svg data-plot-root width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`} role="img" aria-label={`${props.title}. ${g.summary}`} style={SVG_ROOT_STYLE} className="block h-auto max-w-full">
              <defs>
                <clipPath id={clip}>
                  <rect width={g.area.width} height={g.area.height} />
                </clipPath>
              </defs>
              <Grid area={g.area} x={g.xAxis} y={g.yAxis} />
              <g transform={`translate(${g.area.x},${g.area.y})`}>
                {g.band && (
                  <g>
                    <rect x={g.band.x0} width={g.band.x1 - g.band.x0} height={g.area.height} fill={INK.sunk} fillOpacity={0.85} />
                    <line x1={g.band.x1} x2={g.band.x1} y1={0} y2={g.area.height} stroke={INK.faint} strokeWidth={1} strokeDasharray="2 2" />
                  </g>
                )}
                <g clipPath={`url(#${clip})`}>
                  {g.series.map((s) => (
                    <path key={s.label} d={s.path} fill="none" stroke={s.style.colour} strokeWidth={1.9} strokeDasharray={s.style.dash || undefined} strokeLinejoin="round" strokeLinecap="round" />
                  ))}
                  {g.series.map((s) => s.markers.map((m, i) => <Marker key={`${s.label}-${i}`} {...m} />))}
                </g>
                <MarkerLines lines={g.markerLines} height={g.area.height} />
                {g.band && (
                  <text x={g.band.labelX} y={g.band.labelY} textAnchor={g.band.anchor} {...TEXT.note}>
                    {g.band.label}
                  </text>
                )}
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
                  rows: props.series.map((s, k) => {
                    const j = nearestIndex(s.frequenciesHz, f);
                    const v = j === undefined ? null : s.levelsDb[j];
                    const ok = v !== null && v !== undefined && Number.isFinite(v) && v > -200;
                    return { label: s.label, value: ok ? `${formatValue(v, 1)} dB` : "–", colour: g.series[k]!.style.colour, dash: g.series[k]!.style.dash, y: ok ? g.mapY(v) : undefined };
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
