import { colourLegendTicks, colourRamp, type ColourRamp, type RampName } from "./colour-ramp";
import { formatValue } from "./format";
import { leftMarginFor } from "./layout";
import { linearScale } from "./linear-scale";
import type { AxisGeometry, PlotCell, PlotTable, Rect, Tick } from "./types";

/** Inputs of {@link heatmapGeometry}: a grid of cells over a floor plan (lib/modes flatnessMap fits). */
export interface HeatmapInput {
  lengthM: number;
  widthM: number;
  /** cell-centre x (along the length), m, ascending; gridX = xM.length */
  xM: readonly number[];
  /** cell-centre y (along the width), m, ascending; gridY = yM.length */
  yM: readonly number[];
  /** one value per cell, index ix · gridY + iy */
  values: ArrayLike<number>;
  valueTitle: string;
  valueUnit: string;
  ramp?: RampName;
  /** colour domain; default the values' [min, max] */
  domain?: readonly [number, number];
}

/** One drawn cell, px in plot-area coordinates. */
export interface HeatmapCell {
  ix: number;
  iy: number;
  x: number;
  y: number;
  width: number;
  height: number;
  fill: string;
  value: number;
}

/** Geometry of a floor-plan heatmap: x = length to the right, y = width downward (a plan seen from above). */
export interface HeatmapGeometry {
  width: number;
  height: number;
  area: Rect;
  /** px per metre (the same along both axes: the plan is drawn to scale) */
  pxPerM: number;
  xAxis: AxisGeometry;
  yAxis: AxisGeometry;
  cells: HeatmapCell[];
  gridX: number;
  gridY: number;
  ramp: ColourRamp;
  /** horizontal colour bar below the x axis, in whole-drawing px */
  colourBar: { x: number; y: number; width: number; height: number; title: string; ticks: Tick[] };
  /** extremes of the values, with their cells */
  min: { value: number; ix: number; iy: number };
  max: { value: number; ix: number; iy: number };
  table: PlotTable;
  summary: string;
}

const r2 = (v: number) => Math.round(v * 100) / 100;

/**
 * Geometry of a value grid over a floor plan, drawn to scale within `maxAreaHeight`, with a colour bar.
 * @example heatmapGeometry({ lengthM: 4, widthM: 2, xM: [1, 3], yM: [1], values: [1, 2], valueTitle: "Std-dev", valueUnit: "dB" }, { width: 400 }).cells.length // 2
 */
export function heatmapGeometry(input: HeatmapInput, size: { width: number; maxAreaHeight?: number }): HeatmapGeometry {
  const { lengthM, widthM, xM, yM, values } = input;
  for (const [k, v] of [["lengthM", lengthM], ["widthM", widthM]] as const)
    if (!Number.isFinite(v) || v <= 0) throw new RangeError(`${k} must be a finite number > 0 (got ${v})`);
  const gridX = xM.length, gridY = yM.length;
  if (gridX === 0 || gridY === 0) throw new RangeError(`xM and yM must each hold at least one cell (got ${gridX} × ${gridY})`);
  if (values.length !== gridX * gridY) throw new RangeError(`values must hold gridX · gridY = ${gridX * gridY} values (got ${values.length})`);
  let lo = Infinity, hi = -Infinity, imin = 0, imax = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isFinite(v)) continue;
    if (v < lo) { lo = v; imin = i; }
    if (v > hi) { hi = v; imax = i; }
  }
  if (lo === Infinity) { lo = 0; hi = 0; }
  const ramp = colourRamp(input.domain ?? [lo, hi], { name: input.ramp ?? "cividis" });
  // The finest labels the y axis can get (count 10), so the margin always fits them.
  const yTicksProbe = linearScale([0, widthM], [0, 100], { nice: false, count: 10 }).ticks.map((t) => t.label);
  const left = leftMarginFor(yTicksProbe);
  const right = 16, top = 12, axisBand = 40, barBand = 58;
  const maxAreaHeight = size.maxAreaHeight ?? 420;
  let areaW = Math.max(80, size.width - left - right);
  let areaH = (areaW * widthM) / lengthM;
  if (areaH > maxAreaHeight) { areaH = maxAreaHeight; areaW = (areaH * lengthM) / widthM; }
  const pxPerM = areaW / lengthM;
  const area: Rect = { x: left, y: top, width: areaW, height: areaH };
  const xs = linearScale([0, lengthM], [0, areaW], { nice: false, count: Math.max(2, Math.floor(areaW / 60)) });
  const ys = linearScale([0, widthM], [0, areaH], { nice: false, count: Math.max(2, Math.floor(areaH / 45)) });
  const cells: HeatmapCell[] = [];
  const cw = lengthM / gridX, ch = widthM / gridY;
  for (let ix = 0; ix < gridX; ix++)
    for (let iy = 0; iy < gridY; iy++) {
      const value = values[ix * gridY + iy]!;
      // Edges at i·L/grid (CONTRACTS.md cell centres); rounding both edges keeps neighbours seamless.
      const x0 = r2(ix * cw * pxPerM), x1 = r2((ix + 1) * cw * pxPerM);
      const y0 = r2(iy * ch * pxPerM), y1 = r2((iy + 1) * ch * pxPerM);
      cells.push({ ix, iy, x: x0, y: y0, width: r2(x1 - x0), height: r2(y1 - y0), fill: ramp.colour(value), value });
    }
  // Beside the map when the width leaves room for it (a wide screen with a height-capped map), else below.
  const beside = size.width - (left + areaW + right) >= 260;
  const barWidth = beside ? 200 : Math.min(320, Math.max(120, areaW * 0.6));
  const colourBar = {
    x: beside ? left + areaW + 36 : left,
    y: beside ? top + 28 : top + areaH + axisBand + 20,
    width: barWidth,
    height: 10,
    title: `${input.valueTitle} (${input.valueUnit})`,
    ticks: colourLegendTicks(ramp, barWidth, Math.max(2, Math.floor(barWidth / 50))),
  };
  const at = (i: number) => ({ value: values[i] ?? 0, ix: Math.floor(i / gridY), iy: i % gridY });
  const min = at(imin), max = at(imax);
  const rows: PlotCell[][] = [];
  for (let ix = 0; ix < gridX; ix++) for (let iy = 0; iy < gridY; iy++) rows.push([xM[ix]!, yM[iy]!, values[ix * gridY + iy]!]);
  const u = input.valueUnit;
  const summary = `${input.valueTitle} over a ${formatValue(lengthM, 2)} × ${formatValue(widthM, 2)} m floor plan in ${gridX} × ${gridY} cells: lowest ${formatValue(min.value, 1)} ${u} at x ${formatValue(xM[min.ix]!, 2)} m, y ${formatValue(yM[min.iy]!, 2)} m; highest ${formatValue(max.value, 1)} ${u} at x ${formatValue(xM[max.ix]!, 2)} m, y ${formatValue(yM[max.iy]!, 2)} m.`;
  return {
    width: Math.max(size.width, left + areaW + right),
    height: top + areaH + axisBand + (beside ? 0 : barBand),
    area,
    pxPerM,
    xAxis: { orientation: "bottom", length: areaW, ticks: xs.ticks, title: "Length x (m)" },
    yAxis: { orientation: "left", length: areaH, ticks: ys.ticks, title: "Width y (m)" },
    cells,
    gridX,
    gridY,
    ramp,
    colourBar,
    min,
    max,
    table: { columns: [{ label: "x", unit: "m" }, { label: "y", unit: "m" }, { label: input.valueTitle, unit: u }], rows },
    summary,
  };
}

/**
 * The cell under a point (px in plot-area coordinates), clamped to the grid; undefined outside the area.
 * @example heatmapCellAt({ gridX: 2, gridY: 1, area: { x: 0, y: 0, width: 100, height: 50 } }, 75, 10) // { ix: 1, iy: 0 }
 */
export function heatmapCellAt(g: { gridX: number; gridY: number; area: Rect }, px: number, py: number): { ix: number; iy: number } | undefined {
  if (!Number.isFinite(px) || !Number.isFinite(py)) return undefined;
  if (px < 0 || py < 0 || px > g.area.width || py > g.area.height) return undefined;
  const ix = Math.min(g.gridX - 1, Math.floor((px / g.area.width) * g.gridX));
  const iy = Math.min(g.gridY - 1, Math.floor((py / g.area.height) * g.gridY));
  return { ix, iy };
}
