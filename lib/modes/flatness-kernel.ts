/**
 * The fast evaluation of the modal sum over a whole grid of receivers at one height (internal).
 *
 * Structure used (all exact rewritings of the CONTRACTS.md modal sum, no approximation):
 * 1. The mode shape factors per axis, psi_n(x, y, z0) = cos(nx pi x/Lx) cos(ny pi y/Ly) cos(nz pi z0/Lz),
 *    and every receiver shares z0, so the sum over nz collapses first into one complex spectrum per
 *    (nx, ny) pair: B[nx,ny](omega) = omega sum_nz cos(nz pi z0/Lz) S_n(omega) / (Lambda_n D_n(omega)).
 * 2. H(x, y) = sum_ny cos(ny pi y/Ly) G_ny(x), G_ny(x) = sum_nx cos(nx pi x/Lx) B[nx,ny]: two small dense
 *    products instead of one sum over all modes per receiver.
 * 3. Cell centres are mirror-symmetric about the room's centre and cos(n pi (L - x)/L) = (-1)^n cos(n pi x/L):
 *    splitting each sum into even and odd indices gives a cell and its mirror image from one pass
 *    (E + O and E - O), in x and in y.
 * Typed arrays throughout, scratch allocated once, no allocation in the inner loops.
 */
import { lnMoments } from "./fast-log";
import type { ProgressOptions } from "./types";
import { throwIfAborted } from "./validate";

/** Per (nx, ny) pair the complex spectrum B over the frequencies, layout [pair][2 f + (0 re | 1 im)]. */
export interface PairSpectra {
  pairs: number;
  nx: Int32Array;
  ny: Int32Array;
  B: Float64Array;
  nf: number;
}

/** out[t] = sum_k coef[k] * src[rows[k] + t] for t < W (a short dense product, unrolled by four). */
function combineRows(out: Float64Array, src: Float64Array, rows: Int32Array, coef: Float64Array, count: number, W: number): void {
  let k = 0;
  if (count === 0) { out.fill(0, 0, W); return; }
  // First group writes, later groups add.
  if (count >= 4) {
    const a = rows[0]!, b = rows[1]!, c = rows[2]!, d = rows[3]!;
    const ca = coef[0]!, cb = coef[1]!, cc = coef[2]!, cd = coef[3]!;
    for (let t = 0; t < W; t++) out[t] = ca * src[a + t]! + cb * src[b + t]! + cc * src[c + t]! + cd * src[d + t]!;
    k = 4;
  } else if (count >= 2) {
    const a = rows[0]!, b = rows[1]!, ca = coef[0]!, cb = coef[1]!;
    for (let t = 0; t < W; t++) out[t] = ca * src[a + t]! + cb * src[b + t]!;
    k = 2;
  } else {
    const a = rows[0]!, ca = coef[0]!;
    for (let t = 0; t < W; t++) out[t] = ca * src[a + t]!;
    k = 1;
  }
  for (; k + 4 <= count; k += 4) {
    const a = rows[k]!, b = rows[k + 1]!, c = rows[k + 2]!, d = rows[k + 3]!;
    const ca = coef[k]!, cb = coef[k + 1]!, cc = coef[k + 2]!, cd = coef[k + 3]!;
    for (let t = 0; t < W; t++) out[t] = out[t]! + ca * src[a + t]! + cb * src[b + t]! + cc * src[c + t]! + cd * src[d + t]!;
  }
  for (; k + 2 <= count; k += 2) {
    const a = rows[k]!, b = rows[k + 1]!, ca = coef[k]!, cb = coef[k + 1]!;
    for (let t = 0; t < W; t++) out[t] = out[t]! + ca * src[a + t]! + cb * src[b + t]!;
  }
  for (; k < count; k++) {
    const a = rows[k]!, ca = coef[k]!;
    for (let t = 0; t < W; t++) out[t] = out[t]! + ca * src[a + t]!;
  }
}

/** cos(n pi (i + 1/2) / N) for n < count, i < half, layout [n * half + i]: cell-centre cosines. */
function cellCosines(count: number, N: number, half: number): Float64Array {
  const out = new Float64Array(count * half);
  for (let n = 0; n < count; n++) for (let i = 0; i < half; i++) out[n * half + i] = Math.cos((n * Math.PI * (i + 0.5)) / N);
  return out;
}

/**
 * Population standard deviation over frequency of 20 log10 |H| at every cell centre of a gridX x gridY
 * grid, dB, index ix * gridY + iy (CONTRACTS.md flatnessMap).
 */
export function flatnessFromSpectra(spec: PairSpectra, gridX: number, gridY: number, progress: ProgressOptions): Float64Array {
  const { pairs, nf, B } = spec;
  const W = 2 * nf;
  let NX = 0, NY = 0;
  for (let p = 0; p < pairs; p++) { NX = Math.max(NX, spec.nx[p]! + 1); NY = Math.max(NY, spec.ny[p]! + 1); }
  const hx = (gridX + 1) >> 1, hy = (gridY + 1) >> 1;
  const Cx = cellCosines(NX, gridX, hx), Cy = cellCosines(NY, gridY, hy);

  // Pair lists per ny, split by the parity of nx: offsets into B and the nx of each.
  const evenStart = new Int32Array(NY + 1), oddStart = new Int32Array(NY + 1);
  for (let p = 0; p < pairs; p++) {
    const starts = spec.nx[p]! & 1 ? oddStart : evenStart;
    starts[spec.ny[p]! + 1] = starts[spec.ny[p]! + 1]! + 1;
  }
  for (let y = 0; y < NY; y++) { evenStart[y + 1] = evenStart[y + 1]! + evenStart[y]!; oddStart[y + 1] = oddStart[y + 1]! + oddStart[y]!; }
  const evenRows = new Int32Array(evenStart[NY]!), evenNx = new Int32Array(evenStart[NY]!);
  const oddRows = new Int32Array(oddStart[NY]!), oddNx = new Int32Array(oddStart[NY]!);
  const fillE = evenStart.slice(0, NY), fillO = oddStart.slice(0, NY);
  for (let p = 0; p < pairs; p++) {
    const y = spec.ny[p]!;
    const fill = spec.nx[p]! & 1 ? fillO : fillE;
    const k = fill[y]!;
    fill[y] = k + 1;
    (spec.nx[p]! & 1 ? oddRows : evenRows)[k] = p * W;
    (spec.nx[p]! & 1 ? oddNx : evenNx)[k] = spec.nx[p]!;
  }
  // Row offsets of G for even and odd ny.
  const nyEven = (NY + 1) >> 1, nyOdd = NY >> 1;
  const gEvenRows = new Int32Array(nyEven), gOddRows = new Int32Array(nyOdd);
  for (let y = 0; y < NY; y++) (y & 1 ? gOddRows : gEvenRows)[y >> 1] = y * W;

  const G1 = new Float64Array(Math.max(1, NY) * W), G2 = new Float64Array(Math.max(1, NY) * W);
  const rowE = new Float64Array(W), rowO = new Float64Array(W);
  const accE = new Float64Array(W), accO = new Float64Array(W);
  const coef = new Float64Array(Math.max(NX, NY, 1));
  const pw = new Float64Array(2 * nf), pwBits = new Int32Array(pw.buffer);
  const moments = new Float64Array(2);
  const out = new Float64Array(gridX * gridY);
  const toDb = 10 / Math.LN10; // 20 log10|H| = (10/ln 10) ln |H|^2

  for (let i = 0; i < hx; i++) {
    throwIfAborted(progress.signal);
    const i2 = gridX - 1 - i;
    // G_ny(x_i) = sum_nx cos(nx pi x_i/Lx) B[nx,ny], even and odd nx apart (mirror: even - odd).
    for (let y = 0; y < NY; y++) {
      const e0 = evenStart[y]!, ne = evenStart[y + 1]! - e0;
      for (let k = 0; k < ne; k++) coef[k] = Cx[evenNx[e0 + k]! * hx + i]!;
      combineRows(rowE, B, evenRows.subarray(e0), coef, ne, W);
      const o0 = oddStart[y]!, no = oddStart[y + 1]! - o0;
      for (let k = 0; k < no; k++) coef[k] = Cx[oddNx[o0 + k]! * hx + i]!;
      combineRows(rowO, B, oddRows.subarray(o0), coef, no, W);
      const g = y * W;
      for (let t = 0; t < W; t++) { const e = rowE[t]!, o = rowO[t]!; G1[g + t] = e + o; G2[g + t] = e - o; }
    }
    for (let side = 0; side < (i2 === i ? 1 : 2); side++) {
      const G = side === 0 ? G1 : G2;
      const ix = side === 0 ? i : i2;
      for (let j = 0; j < hy; j++) {
        const j2 = gridY - 1 - j;
        for (let k = 0; k < nyEven; k++) coef[k] = Cy[2 * k * hy + j]!;
        combineRows(accE, G, gEvenRows, coef, nyEven, W);
        for (let k = 0; k < nyOdd; k++) coef[k] = Cy[(2 * k + 1) * hy + j]!;
        combineRows(accO, G, gOddRows, coef, nyOdd, W);
        // Cell j gets E + O, its mirror j2 gets E - O.
        for (let f = 0; f < nf; f++) {
          const er = accE[2 * f]!, ei = accE[2 * f + 1]!, or = accO[2 * f]!, oi = accO[2 * f + 1]!;
          const ar = er + or, ai = ei + oi, br = er - or, bi = ei - oi;
          pw[f] = ar * ar + ai * ai;
          pw[nf + f] = br * br + bi * bi;
        }
        lnMoments(pw, pwBits, 0, nf, moments, 0);
        out[ix * gridY + j] = toDb * Math.sqrt(moments[1]!);
        if (j2 !== j) {
          lnMoments(pw, pwBits, nf, nf, moments, 0);
          out[ix * gridY + j2] = toDb * Math.sqrt(moments[1]!);
        }
      }
    }
    progress.onProgress?.((i + 1) / hx);
  }
  return out;
}
