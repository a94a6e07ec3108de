/**
 * lib/reverb — reverberation of a room: bands (IEC 61260-1), air (c and ρ₀ from temperature, ISO 9613-1
 * absorption), the built-in finishes table, Sabine and Eyring, targets with verdicts, the absorption
 * needed to reach a target, room prediction with treatment, and the zod schemas of the API bodies.
 * Functions throw TypeError/RangeError naming the field; the schemas give ZodError issues with paths.
 */
export { OCTAVE_BANDS_HZ, THIRD_OCTAVE_BANDS_HZ, bandSet, exactMidBandHz, type BandSet } from "./bands";
export { airDensity, speedOfSound } from "./air-properties";
export { airAttenuationDbPerM, intensityAttenuationPerM, type Atmosphere } from "./air-absorption";
export { FINISHES, FINISH_IDS, finishAlpha, type Finish } from "./finishes";
export { bandTotals, reverberationTime, type BandTotals, type ReverberationInput, type Surface } from "./reverberation-time";
export {
  LISTENING_ROOM_REFERENCE_VOLUME_M3,
  SMALL_ROOM_BAND_S,
  compareToTarget,
  listeningRoomTargetS,
  listeningRoomToleranceS,
  targetBands,
  type BandComparison,
  type BandVerdict,
  type ReverbTarget,
  type TargetBand,
} from "./targets";
export { requiredAbsorption, type RequiredAbsorptionBand } from "./required-absorption";
export {
  evaluateTarget,
  predictReverberation,
  type PredictedBand,
  type Prediction,
  type RoomDescription,
  type RoomSurface,
} from "./predict";
export { REVERB_LIMITS } from "./validate";
export {
  alphaSchema,
  bandSetSchema,
  formulaSchema,
  pressureKPaSchema,
  relativeHumidityPctSchema,
  reverberationInputSchema,
  reverbPredictRequestSchema,
  reverbTargetRequestSchema,
  reverbTargetSchema,
  roomSurfaceSchema,
  surfaceSchema,
  temperatureCSchema,
  treatmentSchema,
  volumeM3Schema,
  type ReverbPredictRequest,
  type ReverbTargetRequest,
} from "./schemas";
