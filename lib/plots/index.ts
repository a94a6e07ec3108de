/**
 * lib/plots — the geometry of every plot as plain data: scales with ticks ({ value, pos, label, major }),
 * path strings (d3-shape), rectangles, markers, colours, legend layout and the data table behind each plot.
 * Pure TypeScript with no React or DOM imports, so the same geometry feeds the SVG on screen (components/
 * plots), a PDF report (@react-pdf/renderer Svg/Path/Line/Text) and tests. Positions are px; data paths and
 * ticks are relative to the plot area's top-left corner (`area.x`, `area.y`).
 *
 * Errors: bad arguments throw RangeError/TypeError naming the field; "no result" is a documented undefined.
 */
export type { AxisGeometry, Margins, MarkerLine, MarkerShape, PlotCell, PlotColumn, PlotTable, PointMarker, Rect, SeriesStyle, Tick } from "./types";
export { formatFrequencyHz, formatValue } from "./format";
export { logDomainCovering, logFrequencyScale, logFrequencyTicks, type LogFrequencyScale } from "./log-frequency-scale";
export { linearScale, type LinearScale, type LinearScaleOptions } from "./linear-scale";
export { CHAR_WIDTH_EM, PLOT_FONT, estimateTextWidth, leftMarginFor, plotArea, px } from "./layout";
export { areaPath, linePath, splitRuns, type XY } from "./line-path";
export { isOpenMarker, markerIndices, markerPath } from "./markers";
export { INK, MODE_KIND_STYLE, OKABE_ITO, SERIES_COLOURS, SERIES_DASHES, SERIES_MARKERS, VERDICT_STYLE, seriesStyle, type Verdict } from "./palette";
export { SERIES_HATCHES, hatchPath, type Hatch } from "./hatch";
export { nearestIndex, nearestIndexOn } from "./nearest";
export { csvField, plotFileName, toCsv } from "./csv";
export { NO_VALUE_COLOUR, colourLegendTicks, colourRamp, type ColourRamp, type RampName } from "./colour-ramp";
export { bandDomain, bandSlots, bandTicks, groupedBars, type BandSlot } from "./band-slots";
export { LEGEND_METRICS, legendLayout, type LegendItem, type LegendLayout, type PlacedLegendItem } from "./legend-layout";
export { X_AXIS_BAND_PX, cartesianFrame, defaultAreaHeight, yTickCount, type CartesianFrame, type CartesianFrameInput } from "./cartesian-frame";
export { seriesTable, type XYSeries } from "./series-table";
export { centreLevels } from "./levels";
export {
  LEVEL_FLOOR_FOR_PLOTS_DB,
  frequencyResponseGeometry,
  placeMarkerLabels,
  type DrawnMarkerLine,
  type DrawnSeries,
  type FrequencyResponseGeometry,
  type FrequencyResponseInput,
  type FrequencySeries,
} from "./frequency-response-geometry";
export { MODE_KINDS, modeSpectrumGeometry, type ModeSpectrumGeometry, type ModeSpectrumInput, type ModeStem, type PlotMode, type PlotModeKind } from "./mode-spectrum-geometry";
export { bandBarsGeometry, type BandBarsGeometry, type BandBarsInput, type BandScenario, type BandTarget, type DrawnBar } from "./band-bars-geometry";
export { OUTSIDE_RANGE_DASH, absorptionGeometry, type AbsorptionGeometry, type AbsorptionInput, type AlphaPoint, type AlphaSeries, type DrawnAlphaSeries } from "./absorption-geometry";
export { heatmapCellAt, heatmapGeometry, type HeatmapCell, type HeatmapGeometry, type HeatmapInput } from "./heatmap-geometry";
