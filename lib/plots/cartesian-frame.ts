import { leftMarginFor, plotArea, PLOT_FONT } from "./layout";
import { legendLayout, type LegendItem, type LegendLayout } from "./legend-layout";
import type { AxisGeometry, Rect, Tick } from "./types";

/** The frame shared by every x/y plot: overall size, plot area, both axes and the legend block. */
export interface CartesianFrame {
  /** whole drawing, px */
  width: number;
  height: number;
  /** the plot area; tick positions and data paths are relative to its top-left corner */
  area: Rect;
  xAxis: AxisGeometry;
  yAxis: AxisGeometry;
  /** legend block, placed below the x axis title; items relative to (legend.x, legend.y) */
  legend: LegendLayout & { x: number; y: number };
}

/** Space for the x tick labels and the x axis title below the plot area, px. */
export const X_AXIS_BAND_PX = 40;
const TOP_PX = 12;
const RIGHT_PX = 16;
const LEGEND_GAP_PX = 8;

/** Inputs of {@link cartesianFrame}. */
export interface CartesianFrameInput {
  width: number;
  /** plot area height, px */
  areaHeight: number;
  xTitle: string;
  yTitle: string;
  /** y ticks for a given plot-area height (range [areaHeight, 0]) */
  yTicks: (areaHeight: number) => Tick[];
  /** x ticks for a given plot-area width (range [0, areaWidth]) */
  xTicks: (areaWidth: number) => Tick[];
  legendItems: readonly LegendItem[];
  /** extra left margin labels, e.g. lane names, when they are not the y ticks */
  yLabelsForMargin?: readonly string[];
  /** space above the plot area, px (default 12; more when labels sit above the area) */
  topPx?: number;
}

/**
 * Lays out an x/y plot: the left margin from the widest y label, the plot area, the x axis band and the
 * legend rows below it. Widths below 160 px are drawn at 160 px.
 * @example cartesianFrame({ width: 600, areaHeight: 200, ... }).area.width // 600 − left − 16
 */
export function cartesianFrame(input: CartesianFrameInput): CartesianFrame {
  if (!Number.isFinite(input.width) || input.width <= 0) throw new RangeError(`width must be a finite number > 0 (got ${input.width})`);
  if (!Number.isFinite(input.areaHeight) || input.areaHeight <= 0) throw new RangeError(`areaHeight must be a finite number > 0 (got ${input.areaHeight})`);
  const width = Math.max(160, input.width);
  const yTicks = input.yTicks(input.areaHeight);
  const left = leftMarginFor(input.yLabelsForMargin ?? yTicks.map((t) => t.label), PLOT_FONT.tickPx);
  const areaWidth = Math.max(40, width - left - RIGHT_PX);
  const legend = legendLayout(input.legendItems, Math.max(60, width - left));
  const bottom = X_AXIS_BAND_PX + (legend.height > 0 ? LEGEND_GAP_PX + legend.height : 0) + 4;
  const top = input.topPx ?? TOP_PX;
  const height = top + input.areaHeight + bottom;
  const area = plotArea(width, height, { top, right: width - left - areaWidth, bottom, left });
  return {
    width,
    height,
    area,
    xAxis: { orientation: "bottom", length: area.width, ticks: input.xTicks(area.width), title: input.xTitle },
    yAxis: { orientation: "left", length: area.height, ticks: yTicks, title: input.yTitle },
    legend: { ...legend, x: left, y: top + input.areaHeight + X_AXIS_BAND_PX + LEGEND_GAP_PX },
  };
}

/**
 * Default plot-area height for a plot `width` px wide: 42 % of the width, within [180, 340] px.
 * @example defaultAreaHeight(600) // 252
 */
export function defaultAreaHeight(width: number): number {
  return Math.round(Math.min(340, Math.max(180, width * 0.42)));
}

/** Number of y ticks that keeps labels about 40 px apart. */
export function yTickCount(areaHeight: number): number {
  return Math.max(2, Math.min(10, Math.floor(areaHeight / 40)));
}
