/**
 * Index of the value nearest to `x` in `sorted` (ascending), by binary search; on a tie the lower
 * index. undefined for an empty array or a non-finite x. Non-finite entries are not allowed.
 * @example nearestIndex([10, 20, 40], 29) // 1
 */
export function nearestIndex(sorted: ArrayLike<number>, x: number): number | undefined {
  const n = sorted.length;
  if (n === 0 || !Number.isFinite(x)) return undefined;
  let lo = 0, hi = n - 1;
  if (x <= sorted[0]!) return 0;
  if (x >= sorted[hi]!) return hi;
  // Invariant: sorted[lo] < x < sorted[hi]
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid]! === x) return firstEqual(sorted, mid);
    if (sorted[mid]! < x) lo = mid;
    else hi = mid;
  }
  return x - sorted[lo]! <= sorted[hi]! - x ? lo : hi;
}

function firstEqual(sorted: ArrayLike<number>, i: number): number {
  while (i > 0 && sorted[i - 1] === sorted[i]) i--;
  return i;
}

/**
 * Like {@link nearestIndex} but compares on a transformed axis, e.g. Math.log for a log-frequency plot,
 * so "nearest" matches what the eye sees on the screen.
 * @example nearestIndexOn([100, 1000], 400, Math.log10) // 1 (400 Hz is closer to 1 kHz on a log axis)
 */
export function nearestIndexOn(sorted: ArrayLike<number>, x: number, transform: (v: number) => number): number | undefined {
  const t = Array.from(sorted, transform);
  return nearestIndex(t, transform(x));
}
