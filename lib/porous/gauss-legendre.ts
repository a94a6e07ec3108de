/** Nodes on [−1, 1] and their weights. */
export interface QuadratureRule {
  nodes: Float64Array;
  weights: Float64Array;
}

const cache = new Map<number, QuadratureRule>();

/**
 * Gauss–Legendre rule of order n on [−1, 1], computed once per n and cached (do not mutate it).
 * Nodes by Newton iteration on P_n from the Chebyshev guess cos(π(i − 1/4)/(n + 1/2)); weights
 * 2/((1 − x²)P_n′(x)²) (Abramowitz & Stegun 25.4.29). Exact for polynomials of degree ≤ 2n − 1.
 * @param n number of nodes (integer 1…1000)
 * @example gaussLegendre(2).nodes // [0.57735…, −0.57735…]
 */
export function gaussLegendre(n: number): QuadratureRule {
  if (!Number.isInteger(n) || n < 1 || n > 1000) throw new RangeError(`n must be an integer within 1…1000, got ${n}`);
  const hit = cache.get(n);
  if (hit) return hit;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      // three-term recurrence (n+1)P_{n+1} = (2n+1)xP_n − nP_{n−1} — Abramowitz & Stegun 22.7.10
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      // P_n′(x) = n(xP_n − P_{n−1})/(x² − 1) — Abramowitz & Stegun 22.8.5
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * dp * dp);
  }
  const rule = { nodes, weights };
  cache.set(n, rule);
  return rule;
}
