import { symbol, symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolStar, symbolTriangle, symbolWye, type SymbolType } from "d3";
import type { MarkerShape } from "./types";

const FILLED: Record<Exclude<MarkerShape, "cross" | "plus">, SymbolType> = {
  circle: symbolCircle,
  square: symbolSquare,
  triangle: symbolTriangle,
  diamond: symbolDiamond,
  star: symbolStar,
  wye: symbolWye,
};

/**
 * SVG path of a marker centred on (0, 0) with about `sizePx` across (d3-shape symbols, area-matched so
 * shapes look equally heavy). "cross" (×) and "plus" (+) are open strokes: draw them with a stroke,
 * no fill; every other shape can be filled or hollow.
 * @example markerPath("plus", 8) // "M-4,0H4M0,-4V4"
 */
export function markerPath(shape: MarkerShape, sizePx: number): string {
  if (!Number.isFinite(sizePx) || sizePx <= 0) throw new RangeError(`sizePx must be a finite number > 0 (got ${sizePx})`);
  const h = Math.round((sizePx / 2) * 100) / 100;
  if (shape === "plus") return `M${-h},0H${h}M0,${-h}V${h}`;
  if (shape === "cross") {
    const d = Math.round(h * 0.85 * 100) / 100;
    return `M${-d},${-d}L${d},${d}M${-d},${d}L${d},${-d}`;
  }
  const type = FILLED[shape];
  if (!type) throw new TypeError(`shape must be one of circle, square, triangle, diamond, cross, plus, star, wye (got ${String(shape)})`);
  // d3 symbol size is an area in px²; a circle of diameter s has area π s²/4.
  return symbol(type, (Math.PI * sizePx * sizePx) / 4).digits(2)() ?? "";
}

/** Whether a marker shape is drawn as strokes only. */
export function isOpenMarker(shape: MarkerShape): boolean {
  return shape === "cross" || shape === "plus";
}

/**
 * Indices at which to place markers along a series of `length` points: `count` evenly spaced, shifted by
 * `phase` (0…1) of one spacing so that markers of different series do not sit on top of each other.
 * @example markerIndices(101, 5, 0) // [0, 25, 50, 75, 100]
 */
export function markerIndices(length: number, count: number, phase = 0): number[] {
  if (!Number.isInteger(length) || length < 0) throw new RangeError(`length must be an integer >= 0 (got ${length})`);
  if (!Number.isInteger(count) || count < 0) throw new RangeError(`count must be an integer >= 0 (got ${count})`);
  if (length === 0 || count === 0) return [];
  if (count === 1 || length === 1) return [Math.min(length - 1, Math.round(phase * (length - 1)))];
  const step = (length - 1) / (count - 1);
  const out = new Set<number>();
  for (let i = 0; i < count; i++) {
    const at = Math.round(i * step + phase * step);
    if (at <= length - 1) out.add(at);
  }
  return [...out];
}
