import { area, curveLinear, curveStepAfter, line } from "d3";

/** A data point; a null or non-finite coordinate leaves a gap in the line. */
export interface XY {
  x: number | null;
  y: number | null;
}

const finite = (p: XY): p is { x: number; y: number } => p.x !== null && p.y !== null && Number.isFinite(p.x) && Number.isFinite(p.y);

/**
 * SVG path string of a polyline through `points` mapped by `mapX`/`mapY` (d3-shape line, coordinates
 * to 2 decimals). Points with a null/NaN/infinite coordinate break the line (gaps); '' when nothing
 * is drawable. A lone point between gaps becomes a zero-length segment "M…Z"-free move+line so that a
 * round line cap still shows it.
 * @example linePath([{ x: 0, y: 0 }, { x: 1, y: 1 }], (x) => x * 10, (y) => 10 - y * 10) // "M0,10L10,0"
 */
export function linePath(points: readonly XY[], mapX: (x: number) => number, mapY: (y: number) => number, options: { step?: boolean } = {}): string {
  const gen = line<XY>()
    .defined((p) => finite(p) && Number.isFinite(mapX(p.x!)) && Number.isFinite(mapY(p.y!)))
    .x((p) => mapX(p.x!))
    .y((p) => mapY(p.y!))
    .curve(options.step ? curveStepAfter : curveLinear)
    .digits(2);
  const d = gen(points as XY[]) ?? "";
  // d3 draws an isolated defined point as "Mx,yZ"; make it a visible dot with a zero-length line.
  return d.replace(/M([-\d.e]+),([-\d.e]+)Z/g, "M$1,$2h0");
}

/**
 * SVG path string of the area between `y0` and each point's y (d3-shape area), with gaps like {@link linePath}.
 * @example areaPath([{ x: 0, y: 1 }, { x: 1, y: 1 }], (x) => x * 10, (y) => 10 - y * 10, 10) // "M0,0L10,0L10,10L0,10Z"
 */
export function areaPath(points: readonly XY[], mapX: (x: number) => number, mapY: (y: number) => number, baselinePx: number, options: { step?: boolean } = {}): string {
  if (!Number.isFinite(baselinePx)) throw new RangeError(`baselinePx must be finite (got ${baselinePx})`);
  const gen = area<XY>()
    .defined((p) => finite(p) && Number.isFinite(mapX(p.x!)) && Number.isFinite(mapY(p.y!)))
    .x((p) => mapX(p.x!))
    .y0(baselinePx)
    .y1((p) => mapY(p.y!))
    .curve(options.step ? curveStepAfter : curveLinear)
    .digits(2);
  return gen(points as XY[]) ?? "";
}

/**
 * Splits a polyline into runs of segments by a per-segment predicate: segment i joins points i and i+1.
 * Returns the points of each run, in order, tagged with the predicate's value; consecutive runs share
 * their joining point, so the drawn pieces meet without a gap.
 * @example splitRuns([1, 2, 3, 4], (a, b) => b <= 2) // [{ value: true, points: [1, 2] }, { value: false, points: [2, 3, 4] }]
 */
export function splitRuns<T>(points: readonly T[], segmentValue: (a: T, b: T) => boolean): { value: boolean; points: T[] }[] {
  const runs: { value: boolean; points: T[] }[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const v = segmentValue(points[i]!, points[i + 1]!);
    const last = runs[runs.length - 1];
    if (last && last.value === v) last.points.push(points[i + 1]!);
    else runs.push({ value: v, points: [points[i]!, points[i + 1]!] });
  }
  if (points.length === 1) runs.push({ value: segmentValue(points[0]!, points[0]!), points: [points[0]!] });
  return runs;
}
