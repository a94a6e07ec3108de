/**
 * Reusable scratch arrays for the flatness maps (internal). A map of the benchmark size allocates
 * about 2 MB of typed arrays per call; allocating them afresh each time made the engine collect
 * garbage for about as long as the arithmetic took. Arrays up to MAX_CACHED doubles are kept between
 * calls under a name; a nested call (e.g. from inside an onProgress callback) gets fresh arrays.
 */
const MAX_CACHED = 4_000_000; // doubles (32 MB) per array
const pool = new Map<string, Float64Array>();
let depth = 0;

/** Runs `fn` with the pool available to it (only the outermost call uses the pool). */
export function withScratch<T>(fn: (take: (name: string, length: number, zero: boolean) => Float64Array) => T): T {
  const pooled = depth === 0;
  depth++;
  try {
    return fn((name, length, zero) => {
      if (!pooled || length > MAX_CACHED) return new Float64Array(length);
      let a = pool.get(name);
      if (!a || a.length < length) {
        a = new Float64Array(length);
        pool.set(name, a);
        return a.subarray(0, length);
      }
      const v = a.subarray(0, length);
      if (zero) v.fill(0);
      return v;
    });
  } finally {
    depth--;
  }
}
