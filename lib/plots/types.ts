/** A tick on an axis: data value, its pixel position along the axis, and its label ('' = unlabelled). */
export interface Tick {
  value: number;
  /** px along the axis, from the plot area's origin (left edge for x, top edge for y) */
  pos: number;
  label: string;
  /** major ticks carry a label and a stronger grid line; minor ticks are short and unlabelled */
  major: boolean;
}

/** A rectangle in px. */
export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Margins around the plot area, px. */
export interface Margins {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** One axis, ready to draw: ticks, title and where it sits. */
export interface AxisGeometry {
  orientation: "bottom" | "left";
  /** length of the axis line, px (plot area width for bottom, height for left) */
  length: number;
  ticks: Tick[];
  /** axis title including its unit, e.g. "Frequency (Hz)" */
  title: string;
}

/** A cell of a data table (CSV, screen-reader table): a number, a string, or empty. */
export type PlotCell = number | string | null;

/** A column of a plot's data table. */
export interface PlotColumn {
  label: string;
  unit?: string;
}

/** The data behind a plot, as a table: one shape for CSV export, the screen-reader table and the PDF. */
export interface PlotTable {
  columns: readonly PlotColumn[];
  rows: readonly (readonly PlotCell[])[];
}

/** Marker shapes drawn at data points and in legends. */
export type MarkerShape = "circle" | "square" | "triangle" | "diamond" | "cross" | "plus" | "star" | "wye";

/** The visual identity of one data series: colour, dash pattern and marker. */
export interface SeriesStyle {
  colour: string;
  /** SVG stroke-dasharray ('' = solid) */
  dash: string;
  marker: MarkerShape;
}

/** A vertical marker line, e.g. the Schroeder frequency. */
export interface MarkerLine {
  value: number;
  label: string;
}

/** A marker drawn at a point, px. */
export interface PointMarker {
  x: number;
  y: number;
  shape: MarkerShape;
  /** SVG path string centred on (0, 0); translate to (x, y) */
  path: string;
  colour: string;
  hollow: boolean;
}
