/**
 * Short dense products over rows of a matrix, the inner loops of the flatness maps (internal). Q = 4 or
 * 8 outputs at once share every load:
 *   out[oo + q * ostride + t] = sum_(k < count) coef[cBase + q * cstep + k] * src[rows[r0 + k] + s0 + t]
 * for q < Q and 0 <= t < W. Up to eight rows are combined in one pass by a function per row count with
 * the loops unrolled by hand (one load per row and element, one store per output, no read-modify-write
 * of an accumulator); more rows are added eight at a time through a scratch block.
 * Measured in V8 (Node 20) on this kind of machine, multiply-adds per ns: about 1 for a generic row
 * loop, 1.7 for one output at a time, 3.4 for four outputs and 4 for eight.
 */

/** Q short dense products, see the file comment. */
export type DotKernel = (
  out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number,
  coef: Float64Array, cBase: number, cstep: number, W: number,
) => void;

/**
 * The kernel for `count` rows and Q = `outputs` (4 or 8) outputs. Fetch it once outside a loop and call
 * it inside, so that the call site always sees the same function.
 */
export function dotKernel(count: number, outputs: 4 | 8): DotKernel {
  if (!Number.isInteger(count) || count < 0) throw new RangeError(`count must be a non-negative integer (got ${count})`);
  if (outputs !== 4 && outputs !== 8) throw new RangeError(`outputs must be 4 or 8 (got ${String(outputs)})`);
  const table = outputs === 4 ? DOT4 : DOT8;
  if (count <= 8) return table[count]!;
  let scratch = new Float64Array(0);
  return (out, oo, ostride, src, rows, r0, s0, coef, cBase, cstep, W) => {
    if (scratch.length < outputs * W) scratch = new Float64Array(outputs * W);
    table[8]!(out, oo, ostride, src, rows, r0, s0, coef, cBase, cstep, W);
    for (let k = 8; k < count; k += 8) {
      table[Math.min(8, count - k)]!(scratch, 0, W, src, rows, r0 + k, s0, coef, cBase + k, cstep, W);
      for (let q = 0; q < outputs; q++) {
        const o = oo + q * ostride;
        for (let t = 0; t < W; t++) out[o + t] = out[o + t]! + scratch[q * W + t]!;
      }
    }
  };
}

function zeros(Q: number): DotKernel {
  return (out, oo, ostride, _src, _rows, _r0, _s0, _coef, _cBase, _cstep, W) => {
    for (let q = 0; q < Q; q++) out.fill(0, oo + q * ostride, oo + q * ostride + W);
  };
}

function dot1x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!;
  const a1 = coef[cBase + 1 * cstep + 0]!;
  const a2 = coef[cBase + 2 * cstep + 0]!;
  const a3 = coef[cBase + 3 * cstep + 0]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!;
    out[o0 + t] = a0 * va;
    out[o1 + t] = a1 * va;
    out[o2 + t] = a2 * va;
    out[o3 + t] = a3 * va;
  }
}
function dot2x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!;
    out[o0 + t] = a0 * va + b0 * vb;
    out[o1 + t] = a1 * va + b1 * vb;
    out[o2 + t] = a2 * va + b2 * vb;
    out[o3 + t] = a3 * va + b3 * vb;
  }
}
function dot3x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc;
  }
}
function dot4x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd;
  }
}
function dot5x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve;
  }
}
function dot6x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0, f = rows[r0 + 5]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!, f0 = coef[cBase + 0 * cstep + 5]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!, f1 = coef[cBase + 1 * cstep + 5]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!, f2 = coef[cBase + 2 * cstep + 5]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!, f3 = coef[cBase + 3 * cstep + 5]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf;
  }
}
function dot7x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0, f = rows[r0 + 5]! + s0, g = rows[r0 + 6]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!, f0 = coef[cBase + 0 * cstep + 5]!, g0 = coef[cBase + 0 * cstep + 6]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!, f1 = coef[cBase + 1 * cstep + 5]!, g1 = coef[cBase + 1 * cstep + 6]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!, f2 = coef[cBase + 2 * cstep + 5]!, g2 = coef[cBase + 2 * cstep + 6]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!, f3 = coef[cBase + 3 * cstep + 5]!, g3 = coef[cBase + 3 * cstep + 6]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!, vg = src[g + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf + g0 * vg;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf + g1 * vg;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf + g2 * vg;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf + g3 * vg;
  }
}
function dot8x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0, f = rows[r0 + 5]! + s0, g = rows[r0 + 6]! + s0, h = rows[r0 + 7]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!, f0 = coef[cBase + 0 * cstep + 5]!, g0 = coef[cBase + 0 * cstep + 6]!, h0 = coef[cBase + 0 * cstep + 7]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!, f1 = coef[cBase + 1 * cstep + 5]!, g1 = coef[cBase + 1 * cstep + 6]!, h1 = coef[cBase + 1 * cstep + 7]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!, f2 = coef[cBase + 2 * cstep + 5]!, g2 = coef[cBase + 2 * cstep + 6]!, h2 = coef[cBase + 2 * cstep + 7]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!, f3 = coef[cBase + 3 * cstep + 5]!, g3 = coef[cBase + 3 * cstep + 6]!, h3 = coef[cBase + 3 * cstep + 7]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!, vg = src[g + t]!, vh = src[h + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf + g0 * vg + h0 * vh;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf + g1 * vg + h1 * vh;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf + g2 * vg + h2 * vh;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf + g3 * vg + h3 * vh;
  }
}

function dot1x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!;
  const a1 = coef[cBase + 1 * cstep + 0]!;
  const a2 = coef[cBase + 2 * cstep + 0]!;
  const a3 = coef[cBase + 3 * cstep + 0]!;
  const a4 = coef[cBase + 4 * cstep + 0]!;
  const a5 = coef[cBase + 5 * cstep + 0]!;
  const a6 = coef[cBase + 6 * cstep + 0]!;
  const a7 = coef[cBase + 7 * cstep + 0]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!;
    out[o0 + t] = a0 * va;
    out[o1 + t] = a1 * va;
    out[o2 + t] = a2 * va;
    out[o3 + t] = a3 * va;
    out[o4 + t] = a4 * va;
    out[o5 + t] = a5 * va;
    out[o6 + t] = a6 * va;
    out[o7 + t] = a7 * va;
  }
}
function dot2x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!;
    out[o0 + t] = a0 * va + b0 * vb;
    out[o1 + t] = a1 * va + b1 * vb;
    out[o2 + t] = a2 * va + b2 * vb;
    out[o3 + t] = a3 * va + b3 * vb;
    out[o4 + t] = a4 * va + b4 * vb;
    out[o5 + t] = a5 * va + b5 * vb;
    out[o6 + t] = a6 * va + b6 * vb;
    out[o7 + t] = a7 * va + b7 * vb;
  }
}
function dot3x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!, c4 = coef[cBase + 4 * cstep + 2]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!, c5 = coef[cBase + 5 * cstep + 2]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!, c6 = coef[cBase + 6 * cstep + 2]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!, c7 = coef[cBase + 7 * cstep + 2]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc;
    out[o4 + t] = a4 * va + b4 * vb + c4 * vc;
    out[o5 + t] = a5 * va + b5 * vb + c5 * vc;
    out[o6 + t] = a6 * va + b6 * vb + c6 * vc;
    out[o7 + t] = a7 * va + b7 * vb + c7 * vc;
  }
}
function dot4x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!, c4 = coef[cBase + 4 * cstep + 2]!, d4 = coef[cBase + 4 * cstep + 3]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!, c5 = coef[cBase + 5 * cstep + 2]!, d5 = coef[cBase + 5 * cstep + 3]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!, c6 = coef[cBase + 6 * cstep + 2]!, d6 = coef[cBase + 6 * cstep + 3]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!, c7 = coef[cBase + 7 * cstep + 2]!, d7 = coef[cBase + 7 * cstep + 3]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd;
    out[o4 + t] = a4 * va + b4 * vb + c4 * vc + d4 * vd;
    out[o5 + t] = a5 * va + b5 * vb + c5 * vc + d5 * vd;
    out[o6 + t] = a6 * va + b6 * vb + c6 * vc + d6 * vd;
    out[o7 + t] = a7 * va + b7 * vb + c7 * vc + d7 * vd;
  }
}
function dot5x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!, c4 = coef[cBase + 4 * cstep + 2]!, d4 = coef[cBase + 4 * cstep + 3]!, e4 = coef[cBase + 4 * cstep + 4]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!, c5 = coef[cBase + 5 * cstep + 2]!, d5 = coef[cBase + 5 * cstep + 3]!, e5 = coef[cBase + 5 * cstep + 4]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!, c6 = coef[cBase + 6 * cstep + 2]!, d6 = coef[cBase + 6 * cstep + 3]!, e6 = coef[cBase + 6 * cstep + 4]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!, c7 = coef[cBase + 7 * cstep + 2]!, d7 = coef[cBase + 7 * cstep + 3]!, e7 = coef[cBase + 7 * cstep + 4]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve;
    out[o4 + t] = a4 * va + b4 * vb + c4 * vc + d4 * vd + e4 * ve;
    out[o5 + t] = a5 * va + b5 * vb + c5 * vc + d5 * vd + e5 * ve;
    out[o6 + t] = a6 * va + b6 * vb + c6 * vc + d6 * vd + e6 * ve;
    out[o7 + t] = a7 * va + b7 * vb + c7 * vc + d7 * vd + e7 * ve;
  }
}
function dot6x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0, f = rows[r0 + 5]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!, f0 = coef[cBase + 0 * cstep + 5]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!, f1 = coef[cBase + 1 * cstep + 5]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!, f2 = coef[cBase + 2 * cstep + 5]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!, f3 = coef[cBase + 3 * cstep + 5]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!, c4 = coef[cBase + 4 * cstep + 2]!, d4 = coef[cBase + 4 * cstep + 3]!, e4 = coef[cBase + 4 * cstep + 4]!, f4 = coef[cBase + 4 * cstep + 5]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!, c5 = coef[cBase + 5 * cstep + 2]!, d5 = coef[cBase + 5 * cstep + 3]!, e5 = coef[cBase + 5 * cstep + 4]!, f5 = coef[cBase + 5 * cstep + 5]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!, c6 = coef[cBase + 6 * cstep + 2]!, d6 = coef[cBase + 6 * cstep + 3]!, e6 = coef[cBase + 6 * cstep + 4]!, f6 = coef[cBase + 6 * cstep + 5]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!, c7 = coef[cBase + 7 * cstep + 2]!, d7 = coef[cBase + 7 * cstep + 3]!, e7 = coef[cBase + 7 * cstep + 4]!, f7 = coef[cBase + 7 * cstep + 5]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf;
    out[o4 + t] = a4 * va + b4 * vb + c4 * vc + d4 * vd + e4 * ve + f4 * vf;
    out[o5 + t] = a5 * va + b5 * vb + c5 * vc + d5 * vd + e5 * ve + f5 * vf;
    out[o6 + t] = a6 * va + b6 * vb + c6 * vc + d6 * vd + e6 * ve + f6 * vf;
    out[o7 + t] = a7 * va + b7 * vb + c7 * vc + d7 * vd + e7 * ve + f7 * vf;
  }
}
function dot7x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0, f = rows[r0 + 5]! + s0, g = rows[r0 + 6]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!, f0 = coef[cBase + 0 * cstep + 5]!, g0 = coef[cBase + 0 * cstep + 6]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!, f1 = coef[cBase + 1 * cstep + 5]!, g1 = coef[cBase + 1 * cstep + 6]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!, f2 = coef[cBase + 2 * cstep + 5]!, g2 = coef[cBase + 2 * cstep + 6]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!, f3 = coef[cBase + 3 * cstep + 5]!, g3 = coef[cBase + 3 * cstep + 6]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!, c4 = coef[cBase + 4 * cstep + 2]!, d4 = coef[cBase + 4 * cstep + 3]!, e4 = coef[cBase + 4 * cstep + 4]!, f4 = coef[cBase + 4 * cstep + 5]!, g4 = coef[cBase + 4 * cstep + 6]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!, c5 = coef[cBase + 5 * cstep + 2]!, d5 = coef[cBase + 5 * cstep + 3]!, e5 = coef[cBase + 5 * cstep + 4]!, f5 = coef[cBase + 5 * cstep + 5]!, g5 = coef[cBase + 5 * cstep + 6]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!, c6 = coef[cBase + 6 * cstep + 2]!, d6 = coef[cBase + 6 * cstep + 3]!, e6 = coef[cBase + 6 * cstep + 4]!, f6 = coef[cBase + 6 * cstep + 5]!, g6 = coef[cBase + 6 * cstep + 6]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!, c7 = coef[cBase + 7 * cstep + 2]!, d7 = coef[cBase + 7 * cstep + 3]!, e7 = coef[cBase + 7 * cstep + 4]!, f7 = coef[cBase + 7 * cstep + 5]!, g7 = coef[cBase + 7 * cstep + 6]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!, vg = src[g + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf + g0 * vg;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf + g1 * vg;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf + g2 * vg;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf + g3 * vg;
    out[o4 + t] = a4 * va + b4 * vb + c4 * vc + d4 * vd + e4 * ve + f4 * vf + g4 * vg;
    out[o5 + t] = a5 * va + b5 * vb + c5 * vc + d5 * vd + e5 * ve + f5 * vf + g5 * vg;
    out[o6 + t] = a6 * va + b6 * vb + c6 * vc + d6 * vd + e6 * ve + f6 * vf + g6 * vg;
    out[o7 + t] = a7 * va + b7 * vb + c7 * vc + d7 * vd + e7 * ve + f7 * vf + g7 * vg;
  }
}
function dot8x8(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0, b = rows[r0 + 1]! + s0, c = rows[r0 + 2]! + s0, d = rows[r0 + 3]! + s0, e = rows[r0 + 4]! + s0, f = rows[r0 + 5]! + s0, g = rows[r0 + 6]! + s0, h = rows[r0 + 7]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!, b0 = coef[cBase + 0 * cstep + 1]!, c0 = coef[cBase + 0 * cstep + 2]!, d0 = coef[cBase + 0 * cstep + 3]!, e0 = coef[cBase + 0 * cstep + 4]!, f0 = coef[cBase + 0 * cstep + 5]!, g0 = coef[cBase + 0 * cstep + 6]!, h0 = coef[cBase + 0 * cstep + 7]!;
  const a1 = coef[cBase + 1 * cstep + 0]!, b1 = coef[cBase + 1 * cstep + 1]!, c1 = coef[cBase + 1 * cstep + 2]!, d1 = coef[cBase + 1 * cstep + 3]!, e1 = coef[cBase + 1 * cstep + 4]!, f1 = coef[cBase + 1 * cstep + 5]!, g1 = coef[cBase + 1 * cstep + 6]!, h1 = coef[cBase + 1 * cstep + 7]!;
  const a2 = coef[cBase + 2 * cstep + 0]!, b2 = coef[cBase + 2 * cstep + 1]!, c2 = coef[cBase + 2 * cstep + 2]!, d2 = coef[cBase + 2 * cstep + 3]!, e2 = coef[cBase + 2 * cstep + 4]!, f2 = coef[cBase + 2 * cstep + 5]!, g2 = coef[cBase + 2 * cstep + 6]!, h2 = coef[cBase + 2 * cstep + 7]!;
  const a3 = coef[cBase + 3 * cstep + 0]!, b3 = coef[cBase + 3 * cstep + 1]!, c3 = coef[cBase + 3 * cstep + 2]!, d3 = coef[cBase + 3 * cstep + 3]!, e3 = coef[cBase + 3 * cstep + 4]!, f3 = coef[cBase + 3 * cstep + 5]!, g3 = coef[cBase + 3 * cstep + 6]!, h3 = coef[cBase + 3 * cstep + 7]!;
  const a4 = coef[cBase + 4 * cstep + 0]!, b4 = coef[cBase + 4 * cstep + 1]!, c4 = coef[cBase + 4 * cstep + 2]!, d4 = coef[cBase + 4 * cstep + 3]!, e4 = coef[cBase + 4 * cstep + 4]!, f4 = coef[cBase + 4 * cstep + 5]!, g4 = coef[cBase + 4 * cstep + 6]!, h4 = coef[cBase + 4 * cstep + 7]!;
  const a5 = coef[cBase + 5 * cstep + 0]!, b5 = coef[cBase + 5 * cstep + 1]!, c5 = coef[cBase + 5 * cstep + 2]!, d5 = coef[cBase + 5 * cstep + 3]!, e5 = coef[cBase + 5 * cstep + 4]!, f5 = coef[cBase + 5 * cstep + 5]!, g5 = coef[cBase + 5 * cstep + 6]!, h5 = coef[cBase + 5 * cstep + 7]!;
  const a6 = coef[cBase + 6 * cstep + 0]!, b6 = coef[cBase + 6 * cstep + 1]!, c6 = coef[cBase + 6 * cstep + 2]!, d6 = coef[cBase + 6 * cstep + 3]!, e6 = coef[cBase + 6 * cstep + 4]!, f6 = coef[cBase + 6 * cstep + 5]!, g6 = coef[cBase + 6 * cstep + 6]!, h6 = coef[cBase + 6 * cstep + 7]!;
  const a7 = coef[cBase + 7 * cstep + 0]!, b7 = coef[cBase + 7 * cstep + 1]!, c7 = coef[cBase + 7 * cstep + 2]!, d7 = coef[cBase + 7 * cstep + 3]!, e7 = coef[cBase + 7 * cstep + 4]!, f7 = coef[cBase + 7 * cstep + 5]!, g7 = coef[cBase + 7 * cstep + 6]!, h7 = coef[cBase + 7 * cstep + 7]!;
  const o0 = oo + 0 * ostride, o1 = oo + 1 * ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride, o4 = oo + 4 * ostride, o5 = oo + 5 * ostride, o6 = oo + 6 * ostride, o7 = oo + 7 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!, vg = src[g + t]!, vh = src[h + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf + g0 * vg + h0 * vh;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf + g1 * vg + h1 * vh;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf + g2 * vg + h2 * vh;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf + g3 * vg + h3 * vh;
    out[o4 + t] = a4 * va + b4 * vb + c4 * vc + d4 * vd + e4 * ve + f4 * vf + g4 * vg + h4 * vh;
    out[o5 + t] = a5 * va + b5 * vb + c5 * vc + d5 * vd + e5 * ve + f5 * vf + g5 * vg + h5 * vh;
    out[o6 + t] = a6 * va + b6 * vb + c6 * vc + d6 * vd + e6 * ve + f6 * vf + g6 * vg + h6 * vh;
    out[o7 + t] = a7 * va + b7 * vb + c7 * vc + d7 * vd + e7 * ve + f7 * vf + g7 * vg + h7 * vh;
  }
}

const DOT4: DotKernel[] = [zeros(4), dot1x4, dot2x4, dot3x4, dot4x4, dot5x4, dot6x4, dot7x4, dot8x4];
const DOT8: DotKernel[] = [zeros(8), dot1x8, dot2x8, dot3x8, dot4x8, dot5x8, dot6x8, dot7x8, dot8x8];
