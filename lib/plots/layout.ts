import type { Margins, Rect } from "./types";

/** Average advance of a character of the plot font (Inter with tabular figures), in em (common practice estimate). */
export const CHAR_WIDTH_EM = 0.58;

/** Font sizes used by every plot, px. */
export const PLOT_FONT = Object.freeze({ tickPx: 11, titlePx: 12, legendPx: 11.5, readoutPx: 12 });

/**
 * Estimated width of a single-line label in px (no text measurement in a pure module or a PDF worker).
 * @example estimateTextWidth("1k", 11) // 12.76
 */
export function estimateTextWidth(text: string, fontSizePx: number): number {
  return text.length * CHAR_WIDTH_EM * fontSizePx;
}

/**
 * The plot area inside a box of `width` × `height` px after margins; never negative.
 * @example plotArea(600, 300, { top: 10, right: 20, bottom: 40, left: 50 }) // { x: 50, y: 10, width: 530, height: 250 }
 */
export function plotArea(width: number, height: number, margins: Margins): Rect {
  for (const [k, v] of [["width", width], ["height", height], ...Object.entries(margins)] as [string, number][])
    if (!Number.isFinite(v) || v < 0) throw new RangeError(`${k} must be a finite number >= 0 (got ${v})`);
  return {
    x: margins.left,
    y: margins.top,
    width: Math.max(0, width - margins.left - margins.right),
    height: Math.max(0, height - margins.top - margins.bottom),
  };
}

/**
 * Left margin that fits the y tick labels and the rotated axis title.
 * @example leftMarginFor(["0.0", "0.5", "1.0"]) // 48
 */
export function leftMarginFor(labels: readonly string[], fontSizePx = PLOT_FONT.tickPx): number {
  const widest = labels.reduce((w, l) => Math.max(w, estimateTextWidth(l, fontSizePx)), 0);
  return Math.ceil(widest + 6 /* tick */ + 4 /* gap */ + 18 /* rotated title */);
}

/** Rounds a px value to 2 decimals for compact, stable SVG attributes. */
export function px(v: number): number {
  return Math.round(v * 100) / 100;
}
