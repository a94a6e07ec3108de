/**
 * Population standard deviation sqrt(sum((v - mean)^2) / n), the flatness measure of a response in dB
 * (CONTRACTS.md: "population standard deviation of modalResponse level").
 *
 * Welford's one-pass update (Welford 1962, Technometrics 4:419; Knuth TAOCP vol. 2, 4.2.2).
 *
 * @param values levels, dB (any finite numbers), at least one
 * @returns the population standard deviation, same unit as the values
 * @throws RangeError for an empty list or a non-finite value
 * @example populationStdDev([2, 4, 4, 4, 5, 5, 7, 9]) // 2
 */
export function populationStdDev(values: ArrayLike<number>): number {
  if (values.length === 0) throw new RangeError("values must hold at least one number");
  let mean = 0;
  let m2 = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isFinite(v)) throw new RangeError(`values[${i}] must be a finite number (got ${v})`);
    // Welford: mean_k = mean_{k-1} + (v - mean_{k-1})/k; M2 += (v - mean_{k-1})(v - mean_k)
    const d = v - mean;
    mean += d / (i + 1);
    m2 += d * (v - mean);
  }
  return Math.sqrt(Math.max(0, m2 / values.length));
}
