/**
 * The fast evaluation of the modal sum over a whole grid of receivers at one height (internal).
 *
 * Structure used (exact rewritings of the CONTRACTS.md modal sum, no approximation):
 * 1. The mode shape factors per axis, psi_n(x, y, z0) = cos(nx pi x/Lx) cos(ny pi y/Ly) cos(nz pi z0/Lz),
 *    and every receiver shares z0, so the sum over nz collapses first into one complex spectrum per
 *    (nx, ny) pair: B[nx,ny](omega) = omega sum_nz cos(nz pi z0/Lz) S_n(omega) / (Lambda_n D_n(omega))
 *    (built by the caller, flatness-map.ts).
 * 2. H(x, y) = sum_ny cos(ny pi y/Ly) G_ny(x) with G_ny(x) = sum_nx cos(nx pi x/Lx) B[nx,ny]: two short
 *    dense products (dense-rows.ts, four or eight outputs per pass) instead of a sum over all modes per receiver.
 * 3. Cell centres are mirror-symmetric about the room's centre and cos(n pi (L - x)/L) = (-1)^n cos(n pi x/L):
 *    splitting each sum into even and odd indices gives a cell and its mirror image from one pass
 *    (E + O and E - O), in x and in y; for an even gridY the half-rows are symmetric again about the
 *    quarter point, which halves the work on the even-ny terms (step3RowQuarter).
 * 4. The level statistics use a table-driven logarithm fused with |H|^2 (fast-log.ts).
 * Typed arrays throughout, scratch allocated once per call, no allocation in the loops.
 */
import { dotKernel, type DotKernel } from "./dense-rows";
import { mirroredLevelVariance, quadLevelVariance } from "./fast-log";
import type { ProgressOptions } from "./types";
import { throwIfAborted } from "./validate";

/** Per (nx, ny) pair the complex spectrum over the frequencies, B[pair * 2 nf + 2 f + (0 re | 1 im)]. */
export interface PairSpectra {
  pairs: number;
  nx: Int32Array;
  ny: Int32Array;
  nf: number;
  B: Float64Array;
}

/** cos(n pi (i + 1/2) / N) for n < count, i < half, layout [n * half + i]: cell-centre cosines. */
function cellCosines(count: number, N: number, half: number): Float64Array {
  const out = new Float64Array(count * half);
  // psi factor at the cell centre x_i = (i + 1/2) L / N: cos(n pi x_i / L) = cos(n pi (i + 1/2) / N)
  for (let n = 0; n < count; n++) for (let i = 0; i < half; i++) out[n * half + i] = Math.cos((n * Math.PI * (i + 0.5)) / N);
  return out;
}

/** Pair lists per ny for one parity of nx: CSR-style starts, offsets into B and the nx of each. */
function pairLists(spec: PairSpectra, NY: number, W: number, odd: 0 | 1) {
  const start = new Int32Array(NY + 1);
  for (let p = 0; p < spec.pairs; p++) if ((spec.nx[p]! & 1) === odd) start[spec.ny[p]! + 1] = start[spec.ny[p]! + 1]! + 1;
  for (let y = 0; y < NY; y++) start[y + 1] = start[y + 1]! + start[y]!;
  const rows = new Int32Array(Math.max(1, start[NY]!)), nx = new Int32Array(Math.max(1, start[NY]!));
  const fill = start.slice(0, NY);
  for (let p = 0; p < spec.pairs; p++) {
    if ((spec.nx[p]! & 1) !== odd) continue;
    const y = spec.ny[p]!, k = fill[y]!;
    fill[y] = k + 1;
    rows[k] = p * W;
    nx[k] = spec.nx[p]!;
  }
  return { start, rows, nx };
}

type PairList = ReturnType<typeof pairLists>;

/** Tables and scratch of step 2, shared by the groups of one call. */
interface Step2 {
  NY: number; W: number; hx: number; maxList: number; even: PairList; odd: PairList; Cx: Float64Array; coefX: Float64Array;
  stepE: DotKernel[]; stepO: DotKernel[]; B: Float64Array; G: Float64Array; rowE: Float64Array; rowO: Float64Array;
}

/**
 * Step 2 for the four x-halves i0 .. i0 + 3 (clamped to the last): G_ny(x_i) = sum_nx cos(nx pi x_i/Lx) B[nx,ny],
 * even and odd nx apart; slot 2q of G holds x_i (even + odd) and slot 2q + 1 its mirror (even - odd).
 */
function step2Group(c: Step2, i0: number): void {
  const { NY, W, hx, maxList, even, odd, Cx, coefX, stepE, stepO, B, G, rowE, rowO } = c;
  for (let y = 0; y < NY; y++) {
    const e0 = even.start[y]!, ne = even.start[y + 1]! - e0;
    const o0 = odd.start[y]!, no = odd.start[y + 1]! - o0;
    for (let q = 0; q < 4; q++) {
      const i = Math.min(i0 + q, hx - 1);
      for (let k = 0; k < ne; k++) coefX[q * maxList + k] = Cx[even.nx[e0 + k]! * hx + i]!;
    }
    stepE[y]!(rowE, 0, W, B, even.rows, e0, 0, coefX, 0, maxList, W);
    for (let q = 0; q < 4; q++) {
      const i = Math.min(i0 + q, hx - 1);
      for (let k = 0; k < no; k++) coefX[q * maxList + k] = Cx[odd.nx[o0 + k]! * hx + i]!;
    }
    stepO[y]!(rowO, 0, W, B, odd.rows, o0, 0, coefX, 0, maxList, W);
    for (let q = 0; q < 4; q++) {
      const g1 = (2 * q * NY + y) * W, g2 = ((2 * q + 1) * NY + y) * W, r = q * W;
      for (let t = 0; t < W; t++) {
        const e = rowE[r + t]!, o = rowO[r + t]!;
        G[g1 + t] = e + o;
        G[g2 + t] = e - o;
      }
    }
  }
}

/** Tables and scratch of step 3, shared by the rows of one call. */
interface Step3 {
  nf: number; W: number; hy: number; gridY: number;
  /** Plain path: rows of G and y-cosines for even and odd ny. */
  gEvenRows: Int32Array; gOddRows: Int32Array; cyE: Float64Array; cyO: Float64Array; nyEven: number; nyOdd: number;
  dotE: DotKernel; dotO: DotKernel;
  /** Quarter path (gridY even): ny = 0 mod 4 and ny = 2 mod 4 apart, and odd-ny cosines of the partner cells. */
  quarter: boolean; g0Rows: Int32Array; g2Rows: Int32Array; cy0: Float64Array; cy2: Float64Array; cyOPartner: Float64Array;
  n0: number; n2: number; dot0: DotKernel; dot2: DotKernel;
  accE: Float64Array; accE2: Float64Array; accO: Float64Array; accO2: Float64Array;
  pw: Float64Array; pwBits: Int32Array; variances: Float64Array; out: Float64Array;
}

const toDb = 10 / Math.LN10; // 20 log10|H| = (10/ln 10) ln |H|^2

/**
 * Step 3 for one x row whose G matrix starts at G[g0], eight y cells per pass: E and O are the sums
 * over even and odd ny; cell j gets E + O and its mirror gridY - 1 - j gets E - O.
 */
function step3Row(c: Step3, G: Float64Array, g0: number, ix: number): void {
  const { gEvenRows, gOddRows, cyE, cyO, nyEven, nyOdd, hy, gridY, nf, W, dotE, dotO, accE, accO, pw, pwBits, variances, out } = c;
  for (let j0 = 0; j0 < hy; j0 += 8) {
    dotE(accE, 0, W, G, gEvenRows, 0, g0, cyE, j0 * nyEven, nyEven, W);
    dotO(accO, 0, W, G, gOddRows, 0, g0, cyO, j0 * nyOdd, nyOdd, W);
    for (let q = 0; q < 8 && j0 + q < hy; q++) {
      const j = j0 + q, j2 = gridY - 1 - j;
      mirroredLevelVariance(accE, q * W, accE, q * W, 0, accO, q * W, pw, pwBits, nf, variances);
      out[ix * gridY + j] = toDb * Math.sqrt(variances[0]!);
      if (j2 !== j) out[ix * gridY + j2] = toDb * Math.sqrt(variances[1]!);
    }
  }
}

/**
 * Step 3 when gridY is even: besides y -> Ly - y, the cell centres of one half are symmetric about the
 * quarter point, theta_j'' = pi/2 - theta_j with theta = pi (j + 1/2)/gridY and j'' = gridY/2 - 1 - j,
 * and cos(2m (pi/2 - theta)) = (-1)^m cos(2m theta). So the even-ny sum of cell j'' is E0 - E2 when
 * cell j has E0 + E2 (E0: ny = 0 mod 4, E2: ny = 2 mod 4), and one pass over the even rows serves four
 * cells: j, j'' and their mirrors. The odd-ny sums are formed for j and j'' separately.
 */
function step3RowQuarter(c: Step3, G: Float64Array, g0: number, ix: number): void {
  const { g0Rows, g2Rows, gOddRows, cy0, cy2, cyO, cyOPartner, n0, n2, nyOdd, hy, gridY, nf, W, dot0, dot2, dotO } = c;
  const { accE, accE2, accO, accO2, pw, pwBits, variances, out } = c;
  const hq = (hy + 1) >> 1;
  for (let j0 = 0; j0 < hq; j0 += 8) {
    dot0(accE, 0, W, G, g0Rows, 0, g0, cy0, j0 * n0, n0, W);
    dot2(accE2, 0, W, G, g2Rows, 0, g0, cy2, j0 * n2, n2, W);
    dotO(accO, 0, W, G, gOddRows, 0, g0, cyO, j0 * nyOdd, nyOdd, W);
    dotO(accO2, 0, W, G, gOddRows, 0, g0, cyOPartner, j0 * nyOdd, nyOdd, W);
    for (let q = 0; q < 8 && j0 + q < hq; q++) {
      const j = j0 + q, jp = hy - 1 - j;
      if (jp === j) {
        mirroredLevelVariance(accE, q * W, accE2, q * W, 1, accO, q * W, pw, pwBits, nf, variances);
        out[ix * gridY + j] = toDb * Math.sqrt(variances[0]!);
        out[ix * gridY + gridY - 1 - j] = toDb * Math.sqrt(variances[1]!);
        continue;
      }
      quadLevelVariance(accE, accE2, q * W, accO, accO2, q * W, pw, pwBits, nf, variances);
      out[ix * gridY + j] = toDb * Math.sqrt(variances[0]!);
      out[ix * gridY + gridY - 1 - j] = toDb * Math.sqrt(variances[1]!);
      out[ix * gridY + jp] = toDb * Math.sqrt(variances[2]!);
      out[ix * gridY + gridY - 1 - jp] = toDb * Math.sqrt(variances[3]!);
    }
  }
}

/**
 * Population standard deviation over frequency of 20 log10 |H| at every cell centre of a gridX x gridY
 * grid, dB, index ix * gridY + iy (CONTRACTS.md flatnessMap), from the pair spectra of step 1.
 */
export function flatnessFromSpectra(
  spec: PairSpectra, gridX: number, gridY: number, progress: ProgressOptions,
  take: (name: string, length: number, zero: boolean) => Float64Array = (_n, len) => new Float64Array(len),
): Float64Array {
  const { pairs, nf, B } = spec;
  const W = 2 * nf;
  let NX = 1, NY = 1;
  for (let p = 0; p < pairs; p++) { NX = Math.max(NX, spec.nx[p]! + 1); NY = Math.max(NY, spec.ny[p]! + 1); }
  const hx = (gridX + 1) >> 1, hy = (gridY + 1) >> 1;
  const Cx = cellCosines(NX, gridX, hx), Cy = cellCosines(NY, gridY, hy);
  const even = pairLists(spec, NY, W, 0), odd = pairLists(spec, NY, W, 1);

  // Step 3: rows of G by parity of ny; y-cosines per cell, padded to a multiple of eight cells.
  const nyEven = (NY + 1) >> 1, nyOdd = NY >> 1;
  const gEvenRows = new Int32Array(Math.max(1, nyEven)), gOddRows = new Int32Array(Math.max(1, nyOdd));
  for (let y = 0; y < NY; y++) (y & 1 ? gOddRows : gEvenRows)[y >> 1] = y * W;
  const hy8 = Math.ceil(hy / 8) * 8;
  const cyE = new Float64Array(hy8 * Math.max(1, nyEven)), cyO = new Float64Array(hy8 * Math.max(1, nyOdd));
  for (let j = 0; j < hy; j++) {
    for (let k = 0; k < nyEven; k++) cyE[j * nyEven + k] = Cy[2 * k * hy + j]!;
    for (let k = 0; k < nyOdd; k++) cyO[j * nyOdd + k] = Cy[(2 * k + 1) * hy + j]!;
  }

  // Step 2 works on four x-halves at once; each gives two G matrices (the row and its mirror).
  let maxList = 1;
  for (let y = 0; y < NY; y++) maxList = Math.max(maxList, even.start[y + 1]! - even.start[y]!, odd.start[y + 1]! - odd.start[y]!);
  const coefX = new Float64Array(4 * maxList);
  const stepE = Array.from({ length: NY }, (_, y) => dotKernel(even.start[y + 1]! - even.start[y]!, 4));
  const stepO = Array.from({ length: NY }, (_, y) => dotKernel(odd.start[y + 1]! - odd.start[y]!, 4));
  // Scratch (every element is written before it is read).
  const G = take("G", 8 * NY * W, false);
  const rowE = take("rowE", 4 * W, false), rowO = take("rowO", 4 * W, false);
  // Quarter path tables (used when gridY is even).
  const quarter = gridY % 2 === 0 && hy >= 2;
  const n0 = Math.ceil(NY / 4), n2 = Math.floor((NY + 1) / 4);
  const g0Rows = new Int32Array(Math.max(1, n0)), g2Rows = new Int32Array(Math.max(1, n2));
  for (let k = 0; k < n0; k++) g0Rows[k] = 4 * k * W;
  for (let k = 0; k < n2; k++) g2Rows[k] = (4 * k + 2) * W;
  const cy0 = new Float64Array(hy8 * Math.max(1, n0)), cy2 = new Float64Array(hy8 * Math.max(1, n2));
  const cyOPartner = new Float64Array(hy8 * Math.max(1, nyOdd));
  for (let j = 0; j < hy; j++) {
    for (let k = 0; k < n0; k++) cy0[j * n0 + k] = Cy[4 * k * hy + j]!;
    for (let k = 0; k < n2; k++) cy2[j * n2 + k] = Cy[(4 * k + 2) * hy + j]!;
    for (let k = 0; k < nyOdd; k++) cyOPartner[j * nyOdd + k] = Cy[(2 * k + 1) * hy + (hy - 1 - j)]!;
  }
  const pw = new Float64Array(4);
  const ctx: Step3 = {
    nf, W, hy, gridY,
    gEvenRows, gOddRows, cyE, cyO, nyEven, nyOdd, dotE: dotKernel(nyEven, 8), dotO: dotKernel(nyOdd, 8),
    quarter, g0Rows, g2Rows, cy0, cy2, cyOPartner, n0, n2, dot0: dotKernel(n0, 8), dot2: dotKernel(n2, 8),
    accE: take("accE", 8 * W, false), accE2: take("accE2", 8 * W, false), accO: take("accO", 8 * W, false), accO2: take("accO2", 8 * W, false),
    pw, pwBits: new Int32Array(pw.buffer), variances: new Float64Array(4), out: new Float64Array(gridX * gridY),
  };
  const rowStep = quarter ? step3RowQuarter : step3Row;

  const s2: Step2 = { NY, W, hx, maxList, even, odd, Cx, coefX, stepE, stepO, B, G, rowE, rowO };
  const onProgress = progress.onProgress, signal = progress.signal;
  const groups = Math.ceil(hx / 4);
  for (let gI = 0; gI < groups; gI++) {
    throwIfAborted(signal);
    const i0 = 4 * gI;
    step2Group(s2, i0);
    for (let q = 0; q < 4 && i0 + q < hx; q++) {
      const i = i0 + q, i2 = gridX - 1 - i;
      rowStep(ctx, G, 2 * q * NY * W, i);
      if (i2 !== i) rowStep(ctx, G, (2 * q + 1) * NY * W, i2);
    }
    if (onProgress !== undefined) onProgress((gI + 1) / groups);
  }
  return ctx.out;
}
