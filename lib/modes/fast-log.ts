/**
 * Mean and population variance of ln(p) over a run of positive powers p (internal, used by the
 * flatness maps where millions of logarithms dominate the time).
 *
 * Each p = 2^e * m with 1 <= m < 2 is read from its IEEE-754 bits; m is split by its top 8 mantissa
 * bits into m = c_k (1 + r) with c_k = 1 + (k + 1/2)/256, |r| < 1/512, and
 *   ln p = e ln 2 + ln c_k + ln(1 + r),  ln(1 + r) = r - r^2/2 + r^3/3 - r^4/4 + O(r^5)
 * (Mercator series, Abramowitz & Stegun 4.1.24). The truncation error is below r^5/5 < 6e-15, so the
 * result agrees with Math.log to about 1e-14 absolute. Typed arrays only: runs in a Web Worker as is.
 */

const TABLE_BITS = 8;
const TABLE_SIZE = 1 << TABLE_BITS;
/** [1/c_k, ln c_k] interleaved. */
const TABLE = new Float64Array(2 * TABLE_SIZE);
for (let k = 0; k < TABLE_SIZE; k++) {
  const c = 1 + (k + 0.5) / TABLE_SIZE;
  TABLE[2 * k] = 1 / c;
  TABLE[2 * k + 1] = Math.log(c);
}
/** Indexed by the biased exponent E: [2^-(E-1023), (E-1023) ln 2] interleaved. */
const EXPONENT = new Float64Array(2 * 2048);
for (let E = 1; E < 2047; E++) {
  EXPONENT[2 * E] = Math.pow(2, -(E - 1023));
  EXPONENT[2 * E + 1] = (E - 1023) * Math.LN2;
}

/** Powers below this are raised to it (|H| = 1e-15, the module's level floor of -300 dB). */
export const LN_FLOOR = 1e-30;

/**
 * Writes [mean, variance] of ln(max(p, LN_FLOOR)) over p[start .. start + count) into out[at], out[at + 1].
 * `bits` must be an Int32Array view of p's buffer (little-endian: the high word of p[i] is bits[2i + 1]).
 * Values must be finite and non-negative.
 */
export function lnMoments(p: Float64Array, bits: Int32Array, start: number, count: number, out: Float64Array, at: number): void {
  const end = start + count;
  for (let i = start; i < end; i++) if (!(p[i]! > LN_FLOOR)) p[i] = LN_FLOOR;
  if (!LITTLE_ENDIAN) return lnMomentsPlain(p, start, count, out, at);
  // Shift by the first value: variance of (l - K) equals that of l and loses less to cancellation.
  let K = 0, s = 0, s2 = 0;
  for (let i = start; i < end; i++) {
    const hi = bits[2 * i + 1]!;
    const E = hi >> 20; // sign bit is 0 for p > 0
    const k = (hi >> 12) & 0xff;
    const m = p[i]! * EXPONENT[2 * E]!;
    const r = m * TABLE[2 * k]! - 1;
    // ln p = e ln2 + ln c_k + (r - r^2/2 + r^3/3 - r^4/4)  (A&S 4.1.24)
    const l = EXPONENT[2 * E + 1]! + TABLE[2 * k + 1]! + r * (1 - r * (0.5 - r * (1 / 3 - r * 0.25)));
    if (i === start) K = l;
    const d = l - K;
    s += d;
    s2 += d * d;
  }
  const mean = s / count;
  out[at] = K + mean;
  out[at + 1] = Math.max(0, s2 / count - mean * mean);
}

function lnMomentsPlain(p: Float64Array, start: number, count: number, out: Float64Array, at: number): void {
  const K = Math.log(p[start]!);
  let s = 0, s2 = 0;
  for (let i = start; i < start + count; i++) { const d = Math.log(p[i]!) - K; s += d; s2 += d * d; }
  const mean = s / count;
  out[at] = K + mean;
  out[at + 1] = Math.max(0, s2 / count - mean * mean);
}

/** Little-endian check: the high word of a double is the odd Int32 (true on every platform V8/SpiderMonkey/JSC run on). */
export const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
