import { estimateTextWidth, PLOT_FONT } from "./layout";
import type { MarkerShape } from "./types";

/** One legend entry: what its swatch shows. */
export interface LegendItem {
  label: string;
  colour: string;
  /** swatch kind: a line (with dash and optional marker), a filled box, or a marker alone */
  kind: "line" | "box" | "marker";
  dash?: string;
  marker?: MarkerShape;
  hollow?: boolean;
  /** box fill opacity (0…1), default 1 */
  fillOpacity?: number;
  /** hatch angle of a box swatch, degrees */
  hatchAngleDeg?: number;
  hatchSpacingPx?: number;
}

/** A legend entry placed in px, relative to the legend's top-left corner. */
export interface PlacedLegendItem extends LegendItem {
  x: number;
  y: number;
}

/** Legend layout: entries in rows that wrap at the available width. */
export interface LegendLayout {
  items: PlacedLegendItem[];
  width: number;
  height: number;
}

/** Swatch width, gap to label and gap between entries, px. */
export const LEGEND_METRICS = Object.freeze({ swatchPx: 26, labelGapPx: 6, itemGapPx: 18, rowHeightPx: 18 });

/**
 * Lays out legend entries left to right, wrapping into rows at `maxWidthPx` (labels measured by estimate).
 * y of each entry is the vertical centre of its row.
 * @example legendLayout([{ label: "A", colour: "#000", kind: "line" }], 300).height // 18
 */
export function legendLayout(items: readonly LegendItem[], maxWidthPx: number, fontSizePx = PLOT_FONT.legendPx): LegendLayout {
  if (!Number.isFinite(maxWidthPx) || maxWidthPx <= 0) throw new RangeError(`maxWidthPx must be a finite number > 0 (got ${maxWidthPx})`);
  const { swatchPx, labelGapPx, itemGapPx, rowHeightPx } = LEGEND_METRICS;
  const placed: PlacedLegendItem[] = [];
  let x = 0, row = 0, widest = 0;
  for (const item of items) {
    const w = swatchPx + labelGapPx + estimateTextWidth(item.label, fontSizePx);
    if (x > 0 && x + w > maxWidthPx) { row++; x = 0; }
    placed.push({ ...item, x, y: row * rowHeightPx + rowHeightPx / 2 });
    widest = Math.max(widest, x + w);
    x += w + itemGapPx;
  }
  return { items: placed, width: widest, height: items.length === 0 ? 0 : (row + 1) * rowHeightPx };
}
