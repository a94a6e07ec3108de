"use client";

import type { ReactNode } from "react";
import { bandBarsGeometry, formatFrequencyHz, formatValue, INK, VERDICT_STYLE, type BandScenario, type BandTarget } from "@/lib/plots";
import { Axis, Grid } from "./axis";
import { HoverReadout } from "./hover-readout";
import { Legend } from "./legend";
import { Marker } from "./marker";
import { PlotFrame } from "./plot-frame";
import { SVG_ROOT_STYLE } from "./svg-text";

/** Props of {@link BandBarsPlot}. */
export interface BandBarsPlotProps {
  title: string;
  /** nominal band centres, Hz */
  bandsHz: readonly number[];
  fraction?: 1 | 3;
  /** per scenario: label, value per band (e.g. RT60 in s), optional verdict per band */
  scenarios: readonly BandScenario[];
  /** allowed band per frequency band (lib/reverb targetBands) */
  target?: readonly BandTarget[];
  mode?: "bars" | "steps";
  yTitle?: string;
  unit?: string;
  units?: string;
  caption?: ReactNode;
  areaHeight?: number;
  fallbackWidth?: number;
  className?: string;
}

/**
 * A value per frequency band for one or several scenarios (grouped, hatched bars or stepped lines) against a
 * shaded target region; each band's verdict is a shape above the bar: circle within, triangle near, × outside.
 */
export function BandBarsPlot(props: BandBarsPlotProps) {
  const unit = props.unit ?? "s";
  return (
    <PlotFrame title={props.title} units={props.units} caption={props.caption} geometry={(width) => bandBarsGeometry(props, { width, areaHeight: props.areaHeight })} fallbackWidth={props.fallbackWidth} className={props.className}>
      {(g) => {
        return (
          <>
            <svg data-plot-root width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`} role="img" aria-label={`${props.title}. ${g.summary}`} style={SVG_ROOT_STYLE} className="block h-auto max-w-full">
              <Grid area={g.area} y={g.yAxis} />
              <g transform={`translate(${g.area.x},${g.area.y})`}>
                {g.slots.map((s, i) => i > 0 && <line key={i} x1={s.x0} x2={s.x0} y1={0} y2={g.area.height} stroke={INK.line} strokeWidth={0.75} strokeDasharray="1 2" />)}
                {g.targetArea && <path d={g.targetArea} fill={INK.kiln} fillOpacity={0.13} stroke="none" />}
                {g.targetEdges && <path d={g.targetEdges} fill="none" stroke={INK.kiln} strokeOpacity={0.8} strokeWidth={1} strokeDasharray="4 3" />}
                {g.targetLine && <path d={g.targetLine} fill="none" stroke={INK.kiln} strokeWidth={0.75} strokeOpacity={0.5} />}
                {g.bars.map((b) => {
                  const st = g.styles[b.scenario]!;
                  return (
                    <g key={`${b.scenario}-${b.band}`}>
                      <rect x={b.x} y={b.y} width={b.width} height={b.height} fill={st.colour} fillOpacity={0.35} stroke={st.colour} strokeWidth={1.2} />
                      {b.hatch && <path d={b.hatch} stroke={st.colour} strokeWidth={0.9} />}
                    </g>
                  );
                })}
                {g.steps.map((s) => {
                  const st = g.styles[s.scenario]!;
                  return <path key={s.scenario} d={s.path} fill="none" stroke={st.colour} strokeWidth={2.2} strokeDasharray={st.dash || undefined} />;
                })}
                {g.verdictMarkers.map((m) => (
                  <Marker key={`${m.scenario}-${m.band}`} {...m} />
                ))}
              </g>
              <Axis axis={g.xAxis} area={g.area} />
              <Axis axis={g.yAxis} area={g.area} />
              <Legend legend={g.legend} />
            </svg>
            <HoverReadout
              area={g.area}
              positions={g.hoverX}
              label={`${props.title}: read-out; arrow keys move from band to band`}
              describe={(b) => {
                const t = props.target?.[b];
                return {
                  heading: `${formatFrequencyHz(props.bandsHz[b]!)} Hz band`,
                  rows: [
                    ...props.scenarios.map((s, k) => {
                      const v = s.values[b];
                      const verdict = s.verdicts?.[b];
                      return {
                        label: s.label,
                        value: v === null || v === undefined ? "–" : `${formatValue(v, 2)} ${unit}${verdict ? ` · ${VERDICT_STYLE[verdict].label}` : ""}`,
                        colour: g.styles[k]!.colour,
                        dash: props.mode === "steps" ? g.styles[k]!.dash : undefined,
                      };
                    }),
                    ...(t ? [{ label: "target", value: `${formatValue(t.lowerS, 2)}–${formatValue(t.upperS, 2)} ${unit}` }] : []),
                  ],
                };
              }}
            />
          </>
        );
      }}
    </PlotFrame>
  );
}
