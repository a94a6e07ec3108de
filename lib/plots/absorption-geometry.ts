import { cartesianFrame, defaultAreaHeight, yTickCount, type CartesianFrame } from "./cartesian-frame";
import { formatFrequencyHz } from "./format";
import type { LegendItem } from "./legend-layout";
import { linearScale } from "./linear-scale";
import { linePath, splitRuns } from "./line-path";
import { logDomainCovering, logFrequencyScale } from "./log-frequency-scale";
import { isOpenMarker, markerIndices, markerPath } from "./markers";
import { INK, seriesStyle } from "./palette";
import type { PlotCell, PlotTable, PointMarker, SeriesStyle } from "./types";

/** One point of an absorption spectrum (lib/porous SpectrumPoint fits). */
export interface AlphaPoint {
  frequencyHz: number;
  alpha: number;
  /** false where a porous layer is outside its model's fitted range */
  withinModelRange: boolean;
}

/** One build's spectrum. */
export interface AlphaSeries {
  label: string;
  /** ascending frequency */
  points: readonly AlphaPoint[];
}

/** Inputs of {@link absorptionGeometry}. */
export interface AbsorptionInput {
  builds: readonly AlphaSeries[];
  domainHz?: readonly [number, number];
  yTitle?: string;
}

/** A build as drawn: runs inside the fitted range in the build's style, runs outside it dotted and thin. */
export interface DrawnAlphaSeries {
  label: string;
  style: SeriesStyle;
  runs: { withinModelRange: boolean; path: string }[];
  markers: PointMarker[];
}

export interface AbsorptionGeometry extends CartesianFrame {
  builds: DrawnAlphaSeries[];
  /** whether any point lies outside a fitted range (the legend then explains hollow markers) */
  anyOutside: boolean;
  hoverX: number[];
  hoverHz: number[];
  mapX: (frequencyHz: number) => number;
  mapY: (alpha: number) => number;
  table: PlotTable;
  summary: string;
}

/** Dash of line pieces outside a model's fitted range. */
export const OUTSIDE_RANGE_DASH = "1.5 3";

/**
 * Geometry of absorption coefficient α over log frequency for several builds. The y axis runs from 0 (or the
 * lowest α, which can dip below 0 outside a fitted range) to at least 1.0. Line pieces between points
 * outside a model's fitted range are dotted and their markers hollow; a legend entry says so.
 * @example absorptionGeometry({ builds: [{ label: "50 mm panel", points: [{ frequencyHz: 125, alpha: 0.2, withinModelRange: true }] }] }, { width: 600 }).yAxis.ticks.at(-1).label // "1.0"
 */
export function absorptionGeometry(input: AbsorptionInput, size: { width: number; areaHeight?: number }): AbsorptionGeometry {
  input.builds.forEach((b, i) =>
    b.points.forEach((p, k) => {
      if (!Number.isFinite(p.frequencyHz) || p.frequencyHz <= 0) throw new RangeError(`builds[${i}].points[${k}].frequencyHz must be a finite number > 0 (got ${p.frequencyHz})`);
      if (!Number.isFinite(p.alpha)) throw new RangeError(`builds[${i}].points[${k}].alpha must be finite (got ${p.alpha})`);
    }),
  );
  const all = input.builds.flatMap((b) => b.points as AlphaPoint[]);
  const domainHz = input.domainHz ?? logDomainCovering(all.map((p) => p.frequencyHz)) ?? [50, 5000];
  const lo = Math.min(0, ...all.map((p) => Math.floor(p.alpha * 10) / 10));
  const hi = Math.max(1, ...all.map((p) => Math.ceil(p.alpha * 10) / 10));
  const areaHeight = size.areaHeight ?? defaultAreaHeight(size.width);
  const y = linearScale([lo, hi], [areaHeight, 0], { count: yTickCount(areaHeight), decimals: 1 });
  const styles = input.builds.map((_, i) => seriesStyle(i));
  const anyOutside = all.some((p) => !p.withinModelRange);
  const legendItems: LegendItem[] = input.builds.map((b, i) => ({ label: b.label, colour: styles[i]!.colour, kind: "line", dash: styles[i]!.dash, marker: styles[i]!.marker }));
  if (anyOutside) legendItems.push({ label: "outside the model's fitted range", colour: INK.soft, kind: "line", dash: OUTSIDE_RANGE_DASH, marker: "circle", hollow: true });
  const frame = cartesianFrame({
    width: size.width,
    areaHeight,
    xTitle: "Frequency (Hz)",
    yTitle: input.yTitle ?? "Absorption coefficient α",
    yTicks: () => y.ticks,
    xTicks: (w) => logFrequencyScale(domainHz, [0, w]).ticks,
    legendItems,
  });
  const x = logFrequencyScale(domainHz, [0, frame.area.width]);
  const builds: DrawnAlphaSeries[] = input.builds.map((b, i) => {
    const style = styles[i]!;
    const pts = b.points.filter((p) => p.frequencyHz >= domainHz[0] * 0.999 && p.frequencyHz <= domainHz[1] * 1.001);
    const runs = splitRuns(pts, (a, c) => a.withinModelRange && c.withinModelRange).map((r) => ({
      withinModelRange: r.value,
      path: linePath(r.points.map((p) => ({ x: p.frequencyHz, y: p.alpha })), x.map, y.map),
    }));
    // Every point when sparse (octave or third-octave data); otherwise evenly spaced ones plus each outside point's run ends.
    const idx = pts.length <= 32 ? pts.map((_, k) => k) : markerIndices(pts.length, Math.max(4, Math.round(frame.area.width / 60)), input.builds.length > 1 ? i / input.builds.length : 0);
    const markers = idx.map((k) => {
      const p = pts[k]!;
      return { x: x.map(p.frequencyHz), y: y.map(p.alpha), shape: style.marker, path: markerPath(style.marker, 7), colour: style.colour, hollow: !isOpenMarker(style.marker) && !p.withinModelRange };
    });
    return { label: b.label, style, runs, markers };
  });
  const hoverHz = (input.builds[0]?.points ?? []).map((p) => p.frequencyHz);
  const shared = input.builds.every((b) => b.points.length === hoverHz.length && b.points.every((p, k) => p.frequencyHz === hoverHz[k]));
  const table: PlotTable = shared
    ? {
        columns: [{ label: "Frequency", unit: "Hz" }, ...input.builds.flatMap((b) => [{ label: `${b.label} α` }, { label: `${b.label} within fitted range` }])],
        rows: hoverHz.map((f, k) => [f, ...input.builds.flatMap((b) => [b.points[k]!.alpha, b.points[k]!.withinModelRange ? "yes" : "no"] as PlotCell[])]),
      }
    : {
        columns: [{ label: "Build" }, { label: "Frequency", unit: "Hz" }, { label: "α" }, { label: "Within fitted range" }],
        rows: input.builds.flatMap((b) => b.points.map((p) => [b.label, p.frequencyHz, p.alpha, p.withinModelRange ? "yes" : "no"] as PlotCell[])),
      };
  const summary = input.builds.length
    ? `Absorption coefficient of ${input.builds.map((b) => b.label).join(", ")} from ${formatFrequencyHz(domainHz[0])} to ${formatFrequencyHz(domainHz[1])} Hz` +
      (anyOutside ? "; some points lie outside a model's fitted range (hollow markers)." : ".")
    : "No builds.";
  return { ...frame, builds, anyOutside, hoverX: hoverHz.map(x.map), hoverHz, mapX: x.map, mapY: y.map, table, summary };
}
