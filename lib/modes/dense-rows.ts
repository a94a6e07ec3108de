/**
 * Short dense products over rows of a matrix, the inner loop of the flatness maps (internal). Four
 * outputs at once share every load:
 *   out[oo + q * ostride + t] = sum_(k < count) coef[c0 + q * cstep + k] * src[rows[r0 + k] + s0 + t]
 * for q = 0..3 and 0 <= t < W. Up to eight rows are combined in one pass by a function per row count
 * with the loops unrolled by hand (one load per row and element, one store per output, no
 * read-modify-write of an accumulator); more rows are added eight at a time through a scratch block.
 * Measured in V8 (Node 20) on this kind of machine: about 3.5 multiply-adds per ns, against 1.7 for one
 * output at a time and about 1 for a generic row loop.
 */

/** Four short dense products, see the file comment. */
export type DotKernel4 = (
  out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number,
  coef: Float64Array, c0: number, cstep: number, W: number,
) => void;

/**
 * The kernel for `count` rows. Fetch it once outside a loop and call it inside, so that the call site
 * always sees the same function.
 */
export function dotKernel4(count: number): DotKernel4 {
  if (!Number.isInteger(count) || count < 0) throw new RangeError(`count must be a non-negative integer (got ${count})`);
  if (count <= 8) return DOT4[count]!;
  let scratch = new Float64Array(0);
  return (out, oo, ostride, src, rows, r0, s0, coef, c0, cstep, W) => {
    if (scratch.length < 4 * W) scratch = new Float64Array(4 * W);
    dot8x4(out, oo, ostride, src, rows, r0, s0, coef, c0, cstep, W);
    for (let k = 8; k < count; k += 8) {
      DOT4[Math.min(8, count - k)]!(scratch, 0, W, src, rows, r0 + k, s0, coef, c0 + k, cstep, W);
      for (let q = 0; q < 4; q++) {
        const o = oo + q * ostride;
        for (let t = 0; t < W; t++) out[o + t] = out[o + t]! + scratch[q * W + t]!;
      }
    }
  };
}

function dot0x4(out: Float64Array, oo: number, ostride: number, _src: Float64Array, _rows: Int32Array, _r0: number, _s0: number, _coef: Float64Array, _cBase: number, _cstep: number, W: number): void {
  for (let q = 0; q < 4; q++) out.fill(0, oo + q * ostride, oo + q * ostride + W);
}

function dot1x4(out: Float64Array, oo: number, ostride: number, src: Float64Array, rows: Int32Array, r0: number, s0: number, coef: Float64Array, cBase: number, cstep: number, W: number): void {
  const a = rows[r0 + 0]! + s0;
  const a0 = coef[cBase + 0 * cstep + 0]!;
  const a1 = coef[cBase + 1 * cstep + 0]!;
  const a2 = coef[cBase + 2 * cstep + 0]!;
  const a3 = coef[cBase + 3 * cstep + 0]!;
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
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
  const o0 = oo, o1 = oo + ostride, o2 = oo + 2 * ostride, o3 = oo + 3 * ostride;
  for (let t = 0; t < W; t++) {
    const va = src[a + t]!, vb = src[b + t]!, vc = src[c + t]!, vd = src[d + t]!, ve = src[e + t]!, vf = src[f + t]!, vg = src[g + t]!, vh = src[h + t]!;
    out[o0 + t] = a0 * va + b0 * vb + c0 * vc + d0 * vd + e0 * ve + f0 * vf + g0 * vg + h0 * vh;
    out[o1 + t] = a1 * va + b1 * vb + c1 * vc + d1 * vd + e1 * ve + f1 * vf + g1 * vg + h1 * vh;
    out[o2 + t] = a2 * va + b2 * vb + c2 * vc + d2 * vd + e2 * ve + f2 * vf + g2 * vg + h2 * vh;
    out[o3 + t] = a3 * va + b3 * vb + c3 * vc + d3 * vd + e3 * ve + f3 * vf + g3 * vg + h3 * vh;
  }
}

const DOT4: DotKernel4[] = [dot0x4, dot1x4, dot2x4, dot3x4, dot4x4, dot5x4, dot6x4, dot7x4, dot8x4];
