import { LEVEL_FLOOR_FOR_PLOTS_DB } from "./frequency-response-geometry";

const usable = (v: number) => Number.isFinite(v) && v > LEVEL_FLOOR_FOR_PLOTS_DB;

/**
 * Level curves relative to one common mean, dB: the modal sum's absolute offset is free (CONTRACTS.md), so
 * curves are compared after removing the mean of all usable levels (above −200 dB) of all curves together;
 * differences between curves are kept. Unusable levels become null.
 * @example centreLevels([[1, 3, -300], [5]]) // [[-2, 0, null], [2]]
 */
export function centreLevels(curvesDb: readonly (readonly number[])[]): (number | null)[][] {
  let sum = 0, count = 0;
  for (const c of curvesDb) for (const v of c) if (usable(v)) { sum += v; count++; }
  const mean = count ? sum / count : 0;
  return curvesDb.map((c) => c.map((v) => (usable(v) ? v - mean : null)));
}
