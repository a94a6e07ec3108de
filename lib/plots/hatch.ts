import type { Rect } from "./types";

/** A hatch fill: line angle in degrees (0 = horizontal, 45 = rising) and spacing in px; null = no hatch. */
export interface Hatch {
  angleDeg: 0 | 45 | 90 | 135;
  spacingPx: number;
}

/** Hatches per series index, so bars differ in a grey print even where fills look alike. */
export const SERIES_HATCHES: readonly (Hatch | null)[] = Object.freeze([
  null,
  { angleDeg: 45, spacingPx: 4 },
  { angleDeg: 135, spacingPx: 4 },
  { angleDeg: 0, spacingPx: 3.5 },
  { angleDeg: 90, spacingPx: 4 },
  { angleDeg: 45, spacingPx: 2.5 },
  { angleDeg: 135, spacingPx: 2.5 },
  { angleDeg: 0, spacingPx: 2.5 },
]);

const r2 = (v: number) => Math.round(v * 100) / 100;

/**
 * SVG path of hatch lines clipped to a rectangle, as plain segments (no <pattern>, so PDF renderers
 * without pattern support draw it the same way). '' for an empty rectangle.
 * @example hatchPath({ x: 0, y: 0, width: 10, height: 4 }, { angleDeg: 90, spacingPx: 5 }) // "M2.5,0V4M7.5,0V4"
 */
export function hatchPath(rect: Rect, hatch: Hatch): string {
  const { x, y, width: w, height: h } = rect;
  if (![x, y, w, h].every(Number.isFinite)) throw new RangeError("rect must have finite x, y, width and height");
  if (!(hatch.spacingPx > 0) || !Number.isFinite(hatch.spacingPx)) throw new RangeError(`hatch.spacingPx must be a finite number > 0 (got ${hatch.spacingPx})`);
  if (w <= 0 || h <= 0) return "";
  const s = hatch.spacingPx;
  const parts: string[] = [];
  // Centred runs of parallel lines: `count` lines spaced s apart, the same margin at both ends.
  const centred = (extent: number) => {
    const count = Math.max(1, Math.floor(extent / s));
    const start = (extent - (count - 1) * s) / 2;
    return Array.from({ length: count }, (_, i) => start + i * s);
  };
  if (hatch.angleDeg === 90) return centred(w).map((u) => `M${r2(x + u)},${r2(y)}V${r2(y + h)}`).join("");
  if (hatch.angleDeg === 0) return centred(h).map((v) => `M${r2(x)},${r2(y + v)}H${r2(x + w)}`).join("");
  // 45°: lines x - (y from bottom) = c, i.e. rising to the right; 135°: falling to the right.
  const step = s * Math.SQRT2;
  for (let c = -h + step / 2; c < w; c += step) {
    // Along a rising line in local coords (u right, v up from the bottom): u = c + v.
    const v0 = Math.max(0, -c), v1 = Math.min(h, w - c);
    if (v1 <= v0) continue;
    const u0 = c + v0, u1 = c + v1;
    if (hatch.angleDeg === 45) parts.push(`M${r2(x + u0)},${r2(y + h - v0)}L${r2(x + u1)},${r2(y + h - v1)}`);
    else parts.push(`M${r2(x + w - u0)},${r2(y + h - v0)}L${r2(x + w - u1)},${r2(y + h - v1)}`);
  }
  return parts.join("");
}
