import { cartesianFrame, defaultAreaHeight, yTickCount, type CartesianFrame } from "./cartesian-frame";
import { formatFrequencyHz, formatValue } from "./format";
import { estimateTextWidth, PLOT_FONT } from "./layout";
import type { LegendItem } from "./legend-layout";
import { linearScale } from "./linear-scale";
import { linePath } from "./line-path";
import { logDomainCovering, logFrequencyScale } from "./log-frequency-scale";
import { isOpenMarker, markerIndices, markerPath } from "./markers";
import { INK, seriesStyle } from "./palette";
import { seriesTable } from "./series-table";
import type { MarkerLine, PlotTable, PointMarker, SeriesStyle } from "./types";

/** Levels at or below this are treated as "no level" (exact nulls of the modal sum report −300 dB). */
export const LEVEL_FLOOR_FOR_PLOTS_DB = -200;

/** One curve of a frequency-response plot. */
export interface FrequencySeries {
  label: string;
  /** ascending, Hz */
  frequenciesHz: readonly number[];
  /** dB, aligned with frequenciesHz; null or ≤ −200 dB leaves a gap */
  levelsDb: readonly (number | null)[];
}

/** Inputs of {@link frequencyResponseGeometry}. */
export interface FrequencyResponseInput {
  series: readonly FrequencySeries[];
  /** x domain, Hz; default: the data's range widened to 1-2-5 values */
  domainHz?: readonly [number, number];
  /** y domain, dB; default: the data's range (at most 48 dB below the top), niced */
  levelDomainDb?: readonly [number, number];
  /** a shaded frequency region with a label, e.g. below the Schroeder frequency */
  shadedBand?: { fromHz: number; toHz: number; label: string };
  /** vertical marker lines */
  markers?: readonly MarkerLine[];
  yTitle?: string;
}

/** A drawn series. */
export interface DrawnSeries {
  label: string;
  style: SeriesStyle;
  path: string;
  markers: PointMarker[];
}

/** A vertical line with its label position, px in plot-area coordinates. */
export interface DrawnMarkerLine {
  x: number;
  label: string;
  labelX: number;
  labelY: number;
  anchor: "start" | "end";
}

/** Geometry of a frequency-response plot. */
export interface FrequencyResponseGeometry extends CartesianFrame {
  series: DrawnSeries[];
  band?: { x0: number; x1: number; label: string; labelX: number; labelY: number; anchor: "start" | "end" };
  markerLines: DrawnMarkerLine[];
  /** x positions (px) of the hover grid and the frequencies they stand for */
  hoverX: number[];
  hoverHz: number[];
  table: PlotTable;
  summary: string;
  /** maps used by read-outs (px in plot-area coordinates) */
  mapX: (frequencyHz: number) => number;
  mapY: (levelDb: number) => number;
}

const usable = (v: number | null | undefined): v is number => v !== null && v !== undefined && Number.isFinite(v) && v > LEVEL_FLOOR_FOR_PLOTS_DB;

/**
 * Geometry of a frequency-response plot (dB over log frequency), ready for SVG or PDF: axes, one path per
 * series with colour, dash and a few markers, an optional shaded band and vertical marker lines.
 * @param size.width whole drawing width, px; size.areaHeight plot-area height, px (default from width)
 * @example frequencyResponseGeometry({ series: [{ label: "Seat 1", frequenciesHz: [20, 200], levelsDb: [0, -6] }] }, { width: 600 }).series[0].path
 */
export function frequencyResponseGeometry(input: FrequencyResponseInput, size: { width: number; areaHeight?: number }): FrequencyResponseGeometry {
  input.series.forEach((s, i) => {
    if (s.frequenciesHz.length !== s.levelsDb.length) throw new RangeError(`series[${i}] (${s.label}): ${s.frequenciesHz.length} frequencies but ${s.levelsDb.length} levels`);
  });
  const allHz = input.series.flatMap((s) => s.frequenciesHz as number[]);
  const domainHz = input.domainHz ?? logDomainCovering(allHz) ?? [20, 200];
  const levels = input.series.flatMap((s) => s.levelsDb.filter(usable));
  let yDomain: [number, number];
  if (input.levelDomainDb) yDomain = [input.levelDomainDb[0], input.levelDomainDb[1]];
  else if (levels.length === 0) yDomain = [-10, 10];
  else {
    const hi = Math.max(...levels), lo = Math.max(Math.min(...levels), hi - 48);
    yDomain = [lo - 1, hi + 1];
  }
  const areaHeight = size.areaHeight ?? defaultAreaHeight(size.width);
  const y = linearScale(yDomain, [areaHeight, 0], { count: yTickCount(areaHeight) });
  const styles = input.series.map((_, i) => seriesStyle(i));
  const legendItems: LegendItem[] = input.series.map((s, i) => ({ label: s.label, colour: styles[i]!.colour, kind: "line", dash: styles[i]!.dash, marker: styles[i]!.marker }));
  if (input.shadedBand) legendItems.push({ label: input.shadedBand.label, colour: INK.sunk, kind: "box" });
  const frame = cartesianFrame({
    width: size.width,
    areaHeight,
    xTitle: "Frequency (Hz)",
    yTitle: input.yTitle ?? "Level (dB)",
    yTicks: () => y.ticks,
    xTicks: (w) => logFrequencyScale(domainHz, [0, w]).ticks,
    legendItems,
  });
  const x = logFrequencyScale(domainHz, [0, frame.area.width]);
  const inY = (py: number) => py >= -0.5 && py <= areaHeight + 0.5;
  const series: DrawnSeries[] = input.series.map((s, i) => {
    const style = styles[i]!;
    const points = s.frequenciesHz.map((f, k) => ({ x: f, y: usable(s.levelsDb[k]) ? (s.levelsDb[k] as number) : null }));
    const markers: PointMarker[] = [];
    for (const k of markerIndices(points.length, Math.max(3, Math.round(frame.area.width / 90)), input.series.length > 1 ? i / input.series.length : 0)) {
      const p = points[k]!;
      if (p.y === null) continue;
      const mx = x.map(p.x!), my = y.map(p.y);
      if (!inY(my) || mx < 0 || mx > frame.area.width) continue;
      markers.push({ x: mx, y: my, shape: style.marker, path: markerPath(style.marker, 7), colour: style.colour, hollow: !isOpenMarker(style.marker) && i % 2 === 1 });
    }
    return { label: s.label, style, path: linePath(points, x.map, y.map), markers };
  });
  let band: FrequencyResponseGeometry["band"];
  if (input.shadedBand) {
    const b = input.shadedBand;
    const x0 = Math.max(0, x.map(Math.max(b.fromHz, domainHz[0]))), x1 = Math.min(frame.area.width, x.map(Math.min(b.toHz, domainHz[1])));
    if (x1 > x0) {
      const fits = estimateTextWidth(b.label, PLOT_FONT.tickPx) + 8 <= x1 - x0;
      band = { x0, x1, label: b.label, labelX: fits ? x0 + 5 : x1 + 5, labelY: 14, anchor: "start" };
    }
  }
  const markerLines = placeMarkerLabels(
    (input.markers ?? []).filter((m) => m.value >= domainHz[0] && m.value <= domainHz[1]).map((m) => ({ x: x.map(m.value), label: m.label })),
    frame.area.width,
    band ? [{ x0: band.labelX, x1: band.labelX + estimateTextWidth(band.label, PLOT_FONT.tickPx), row: 0 }] : [],
  );
  const hoverHz = [...(input.series[0]?.frequenciesHz ?? [])];
  const table = seriesTable({ label: "Frequency", unit: "Hz" }, { label: "Level", unit: "dB" }, input.series.map((s) => ({ label: s.label, x: s.frequenciesHz, y: s.levelsDb.map((v) => (usable(v) ? v : null)) })));
  const summary =
    input.series.length === 0
      ? "No data."
      : `${input.series.length} ${input.series.length === 1 ? "curve" : "curves"} (${input.series.map((s) => s.label).join(", ")}) from ${formatFrequencyHz(domainHz[0])} to ${formatFrequencyHz(domainHz[1])} Hz` +
        (levels.length ? `, levels ${formatValue(Math.min(...levels), 1)} to ${formatValue(Math.max(...levels), 1)} dB.` : ".");
  return { ...frame, series, band, markerLines, hoverX: hoverHz.map(x.map), hoverHz, table, summary, mapX: x.map, mapY: y.map };
}

/**
 * Places labels of vertical lines at the top of the plot area: right of the line, or left of it near the right
 * edge; a label that would overlap an earlier one moves down a row (14 px).
 */
export function placeMarkerLabels(
  lines: readonly { x: number; label: string }[],
  areaWidth: number,
  taken: { x0: number; x1: number; row: number }[] = [],
): DrawnMarkerLine[] {
  const used = [...taken];
  return [...lines]
    .sort((a, b) => a.x - b.x)
    .map((l) => {
      const w = estimateTextWidth(l.label, PLOT_FONT.tickPx);
      const anchor: "start" | "end" = l.x + 4 + w > areaWidth ? "end" : "start";
      const x0 = anchor === "start" ? l.x + 4 : l.x - 4 - w;
      const x1 = x0 + w;
      let row = 0;
      while (used.some((u) => u.row === row && x0 < u.x1 + 4 && x1 > u.x0 - 4)) row++;
      used.push({ x0, x1, row });
      return { x: l.x, label: l.label, labelX: anchor === "start" ? l.x + 4 : l.x - 4, labelY: 14 + row * 14, anchor };
    });
}
