/**
 * lib/modes — the low-frequency engine: room modes, Schroeder frequency, distribution checks, modal
 * response at seats and flatness maps. Pure TypeScript: no Node-only, DOM, React or Next imports, so it
 * runs unchanged on the server and in a browser Web Worker. SI units inside (m, s, Hz).
 *
 * Errors: bad arguments throw a TypeError (wrong type) or RangeError (bad value) whose message starts
 * with the field's path, e.g. "room.lengthM must be a finite number in (0, 100] m (got -5)". The zod
 * schemas in schemas.ts describe the same inputs as JSON request bodies. No NaN or Infinity is returned.
 */
export type { RectRoom, ModeKind, RoomMode, Point3, SoundSource, AbortFlag, ProgressOptions } from "./types";
export { LIMITS, LEVEL_FLOOR_DB } from "./limits";
export { roomModes, modeKind } from "./room-modes";
export { schroederFrequency } from "./schroeder";
export { modalBandwidthHz } from "./bandwidth";
export { modalResponse, type ModalResponseOptions } from "./modal-response";
export { multiSourceResponse, type MultiSourceResponseOptions } from "./multi-source-response";
export { flatnessMap, multiSourceFlatnessMap, type FlatnessMapResult, type FlatnessGridOptions } from "./flatness-map";
export { rankSeatPositions, type SeatRanking, type SeatRankingOptions, type SeatScore } from "./seat-ranking";
export { populationStdDev } from "./deviation";
export { logSpacedFrequencies } from "./frequencies";
export { speedOfSoundFromTemperature } from "./speed-of-sound";
export { feetInchesToMetres, metresToFeetInches, formatFeetInches, formatLength } from "./units";
export { modeTable, type ModeTable, type ModeTableRow } from "./mode-table";
export { thirdOctaveBands, type ThirdOctaveBand } from "./third-octave";
export { bonelloCheck, type BonelloBand, type BonelloResult } from "./bonello";
export { dimensionRatioCheck, type DimensionRatioResult } from "./dimension-ratios";
export { asymptoticModeCount, modalDensity } from "./mode-count";
export { modeCountCheck, type ModeCountRow } from "./mode-count-check";
export * from "./schemas";
