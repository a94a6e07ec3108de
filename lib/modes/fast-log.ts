/**
 * Population variance of ln |H|^2 over frequency for a cell and its mirror image (internal, used by the
 * flatness maps, where millions of logarithms dominate the time).
 *
 * Each p = 2^e * m with 1 <= m < 2 is read from its IEEE-754 bits; m is split by its top 8 mantissa
 * bits into m = c_k (1 + r) with c_k = 1 + (k + 1/2)/256, |r| < 1/512, and
 *   ln p = e ln 2 + ln c_k + ln(1 + r),  ln(1 + r) = r - r^2/2 + r^3/3 - r^4/4 + O(r^5)
 * (Mercator series, Abramowitz & Stegun 4.1.24). The truncation error is below r^5/5 < 6e-15, so the
 * result agrees with Math.log to about 1e-14 absolute. Typed arrays only: runs in a Web Worker as is.
 * On a big-endian engine (none known) the code falls back to Math.log.
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
 * ln p from p > 0 and the high 32 bits of its IEEE-754 form (see the file comment). Small enough for
 * the engine to inline into the loops below.
 */
function lnFromBits(p: number, hi: number): number {
  const x = (hi >> 19) & 0xffe, k = (hi >> 11) & 0x1fe; // 2 * biased exponent, 2 * top 8 mantissa bits
  const r = p * EXPONENT[x]! * TABLE[k]! - 1;
  // ln p = e ln2 + ln c_k + (r - r^2/2 + r^3/3 - r^4/4)  (A&S 4.1.24)
  return EXPONENT[x + 1]! + TABLE[k + 1]! + r * (1 - r * (0.5 - r * (1 / 3 - r * 0.25)));
}

/**
 * For complex spectra E = A + sign * B (A from A[ao], B from B[bo]) and O (from O[oo]), interleaved
 * re, im with nf values each, the population variances over frequency of ln|E + O|^2 and ln|E - O|^2
 * (the levels of a cell and of its mirror image), written to out[0] and out[1]. Pass sign = 0 when E
 * is A alone. Powers below LN_FLOOR count as LN_FLOOR. `pw` (2 doubles) and `bits` share one buffer.
 */
export function mirroredLevelVariance(
  A: Float64Array, ao: number, B: Float64Array, bo: number, sign: number, O: Float64Array, oo: number,
  pw: Float64Array, bits: Int32Array, nf: number, out: Float64Array,
): void {
  if (!LITTLE_ENDIAN) return mirroredPlain(A, ao, B, bo, sign, O, oo, nf, out);
  let K1 = 0, K2 = 0, s1 = 0, q1 = 0, s2 = 0, q2 = 0;
  for (let f = 0; f < nf; f++) {
    const er = A[ao + 2 * f]! + sign * B[bo + 2 * f]!, ei = A[ao + 2 * f + 1]! + sign * B[bo + 2 * f + 1]!;
    const or = O[oo + 2 * f]!, oi = O[oo + 2 * f + 1]!;
    const ar = er + or, ai = ei + oi, br = er - or, bi = ei - oi;
    let p1 = ar * ar + ai * ai, p2 = br * br + bi * bi;
    if (!(p1 > LN_FLOOR)) p1 = LN_FLOOR;
    if (!(p2 > LN_FLOOR)) p2 = LN_FLOOR;
    pw[0] = p1;
    pw[1] = p2;
    const l1 = lnFromBits(p1, bits[1]!), l2 = lnFromBits(p2, bits[3]!);
    // Shift by the first value: the variance of (l - K) is that of l and loses less to cancellation.
    if (f === 0) { K1 = l1; K2 = l2; }
    const d1 = l1 - K1, d2 = l2 - K2;
    s1 += d1; q1 += d1 * d1; s2 += d2; q2 += d2 * d2;
  }
  const m1 = s1 / nf, m2 = s2 / nf;
  out[0] = Math.max(0, q1 / nf - m1 * m1);
  out[1] = Math.max(0, q2 / nf - m2 * m2);
}

/**
 * The four-cell form of mirroredLevelVariance for the quarter-point path of the flatness kernel: with
 * E+ = A + B, E- = A - B (A from A[ao], B from B[bo]), O (from O[oo]) and P (from P[po]), writes the
 * variances of ln|E+ + O|^2, ln|E+ - O|^2, ln|E- + P|^2 and ln|E- - P|^2 to out[0..3]. One pass loads
 * A and B once for four cells.
 */
export function quadLevelVariance(
  A: Float64Array, B: Float64Array, ab: number, O: Float64Array, P: Float64Array, op: number,
  pw: Float64Array, bits: Int32Array, nf: number, out: Float64Array,
): void {
  if (!LITTLE_ENDIAN) {
    mirroredPlain(A, ab, B, ab, 1, O, op, nf, out);
    const o01 = [out[0]!, out[1]!];
    mirroredPlain(A, ab, B, ab, -1, P, op, nf, out);
    out[2] = out[0]!; out[3] = out[1]!; out[0] = o01[0]!; out[1] = o01[1]!;
    return;
  }
  let K1 = 0, K2 = 0, K3 = 0, K4 = 0, s1 = 0, q1 = 0, s2 = 0, q2 = 0, s3 = 0, q3 = 0, s4 = 0, q4 = 0;
  for (let f = 0; f < nf; f++) {
    const t = ab + 2 * f, u = op + 2 * f;
    const a0 = A[t]!, a1 = A[t + 1]!, b0 = B[t]!, b1 = B[t + 1]!;
    const pr = a0 + b0, pi = a1 + b1, mr = a0 - b0, mi = a1 - b1;
    const or = O[u]!, oi = O[u + 1]!, qr = P[u]!, qi = P[u + 1]!;
    let p1 = (pr + or) * (pr + or) + (pi + oi) * (pi + oi), p2 = (pr - or) * (pr - or) + (pi - oi) * (pi - oi);
    let p3 = (mr + qr) * (mr + qr) + (mi + qi) * (mi + qi), p4 = (mr - qr) * (mr - qr) + (mi - qi) * (mi - qi);
    if (!(p1 > LN_FLOOR)) p1 = LN_FLOOR;
    if (!(p2 > LN_FLOOR)) p2 = LN_FLOOR;
    if (!(p3 > LN_FLOOR)) p3 = LN_FLOOR;
    if (!(p4 > LN_FLOOR)) p4 = LN_FLOOR;
    pw[0] = p1; pw[1] = p2; pw[2] = p3; pw[3] = p4;
    const l1 = lnFromBits(p1, bits[1]!), l2 = lnFromBits(p2, bits[3]!), l3 = lnFromBits(p3, bits[5]!), l4 = lnFromBits(p4, bits[7]!);
    // Shift by the first value: the variance of (l - K) is that of l and loses less to cancellation.
    if (f === 0) { K1 = l1; K2 = l2; K3 = l3; K4 = l4; }
    const d1 = l1 - K1, d2 = l2 - K2, d3 = l3 - K3, d4 = l4 - K4;
    s1 += d1; q1 += d1 * d1; s2 += d2; q2 += d2 * d2; s3 += d3; q3 += d3 * d3; s4 += d4; q4 += d4 * d4;
  }
  const m1 = s1 / nf, m2 = s2 / nf, m3 = s3 / nf, m4 = s4 / nf;
  out[0] = Math.max(0, q1 / nf - m1 * m1);
  out[1] = Math.max(0, q2 / nf - m2 * m2);
  out[2] = Math.max(0, q3 / nf - m3 * m3);
  out[3] = Math.max(0, q4 / nf - m4 * m4);
}

function mirroredPlain(A: Float64Array, ao: number, B: Float64Array, bo: number, sign: number, O: Float64Array, oo: number, nf: number, out: Float64Array): void {
  const l1 = new Float64Array(nf), l2 = new Float64Array(nf);
  for (let f = 0; f < nf; f++) {
    const er = A[ao + 2 * f]! + sign * B[bo + 2 * f]!, ei = A[ao + 2 * f + 1]! + sign * B[bo + 2 * f + 1]!;
    const or = O[oo + 2 * f]!, oi = O[oo + 2 * f + 1]!;
    const ar = er + or, ai = ei + oi, br = er - or, bi = ei - oi;
    l1[f] = Math.max(ar * ar + ai * ai, LN_FLOOR);
    l2[f] = Math.max(br * br + bi * bi, LN_FLOOR);
  }
  const m = new Float64Array(2);
  lnMomentsPlain(l1, 0, nf, m, 0);
  out[0] = m[1]!;
  lnMomentsPlain(l2, 0, nf, m, 0);
  out[1] = m[1]!;
}

function lnMomentsPlain(p: Float64Array, start: number, count: number, out: Float64Array, at: number): void {
  const K = Math.log(Math.max(p[start]!, LN_FLOOR));
  let s = 0, s2 = 0;
  for (let i = start; i < start + count; i++) { const d = Math.log(Math.max(p[i]!, LN_FLOOR)) - K; s += d; s2 += d * d; }
  const mean = s / count;
  out[at] = K + mean;
  out[at + 1] = Math.max(0, s2 / count - mean * mean);
}

/** Little-endian check: the high word of a double is the odd Int32 (true on every platform V8/SpiderMonkey/JSC run on). */
export const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
