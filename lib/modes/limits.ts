/**
 * Input bounds of the module, shared by the argument checks (validate.ts) and the zod schemas
 * (schemas.ts) so that a route handler and a direct call accept exactly the same inputs.
 */
export const LIMITS = {
  /** Room dimensions, m: finite, > 0 and at most this. */
  maxDimensionM: 100,
  /** Frequencies anywhere in the module, Hz. */
  minFrequencyHz: 1,
  maxFrequencyHz: 1000,
  /** Most frequencies in one list. */
  maxFrequencies: 2000,
  /** Reverberation time, s. */
  minRt60Seconds: 0.05,
  maxRt60Seconds: 10,
  /** Speed of sound, m/s (air from about -120 C to +300 C; helium excluded). */
  minSpeedOfSound: 200,
  maxSpeedOfSound: 500,
  /** Grid cells along one axis of a flatness map. */
  maxGrid: 400,
  /** Most modes one call may enumerate (memory and time bound). */
  maxModes: 200_000,
  /** Most sources and receivers in one multi-source call. */
  maxSources: 16,
  maxReceivers: 400,
  /** Longest source delay, ms. */
  maxDelayMs: 1000,
  /** Flatness map working memory: (nx, ny) pairs x frequencies at most this (16 bytes each, 64 MB). */
  maxPairFrequencyProducts: 4_000_000,
  /** Flatness map working memory: values of ny x frequencies at most this (8 rows of 16 bytes each, 128 MB). */
  maxRowFrequencyProducts: 1_000_000,
  /** Flatness map time: cells x frequencies x (ny values + 1) / 2 at most this (a few seconds). */
  maxFlatnessWork: 2e10,
  /** Multi-source response time: modes x frequencies x (sources + receivers) at most this (about a second). */
  maxResponseWork: 1e9,
} as const;

/** Level reported for an exact cancellation (|H| below 1e-15), dB: keeps -Infinity out of results. */
export const LEVEL_FLOOR_DB = -300;
