/**
 * lib/porous — porous and resonant absorbers: layer models (Delany–Bazley, Miki), surface impedance of
 * stacks on a rigid wall, incidence averaging, single-number ratings (ISO 11654, ASTM C423), fibre
 * resistivity estimate, generic materials, resonators, absorption area of panels and corner traps, and
 * the zod schemas of the API bodies. Pure TypeScript: runs in a Web Worker, a route handler or a PDF
 * renderer. Functions check their arguments and throw TypeError (wrong type or unknown kind) or
 * RangeError (out of range), naming the field; the schemas give ZodError issues with the field's path.
 */
export type { AirProperties, Incidence, Layer, PorousProperties, SpectrumPoint } from "./types";
export { DEFAULT_AIR } from "./types";
export { LIMITS } from "./limits";
export { DELANY_BAZLEY_COEFFICIENTS, DELANY_BAZLEY_RANGE, delanyBazley, delanyBazleyParameter } from "./delany-bazley";
export { MIKI_COEFFICIENTS, MIKI_RANGE, miki } from "./miki";
export { gaussLegendre, type QuadratureRule } from "./gauss-legendre";
export { ANGLE_NODES, FIELD_INCIDENCE_MAX_DEG, fieldIncidenceAverage, parisRandomIncidence } from "./incidence";
export { absorptionSpectrum, type SpectrumOptions } from "./absorption-spectrum";
export {
  ISO11654_OCTAVES_HZ,
  ISO11654_REFERENCE_CURVE,
  practicalAbsorption,
  weightedAbsorption,
  type AbsorptionClass,
  type WeightedAbsorption,
} from "./iso11654";
export { astmC423Ratings, noiseReductionCoefficient, soundAbsorptionAverage } from "./astm-c423";
export {
  RATING_EXACT_HZ,
  RATING_NOMINAL_HZ,
  rateAbsorber,
  rateLayers,
  rateThirdOctaves,
  ratingThirdOctaves,
  type AbsorberRating,
  type RatingBand,
} from "./rating-bands";
export { resistivityFromFibres, sheetFlowResistance } from "./resistivity";
export { POROUS_MATERIALS, porousMaterial, type PorousMaterial } from "./materials";
export {
  helmholtzResonanceHz,
  membraneAbsorberEstimate,
  membraneResonanceHz,
  perforatedPanelAbsorberEstimate,
  perforatedPanelResonanceHz,
  perforationEffectiveLengthM,
  resonatorAbsorptionEstimate,
  type PerforatedPanel,
  type ResonatorEstimate,
} from "./resonators";
export {
  EDGE_EFFECT_NOT_INCLUDED,
  cornerTrapAbsorption,
  objectAbsorptionAreaM2,
  panelAbsorption,
  type CornerTrap,
  type ObjectAbsorptionBand,
} from "./object-absorption";
export {
  absorberObjectSchema,
  absorberRatingRequestSchema,
  absorberSpectrumRequestSchema,
  airLayerSchema,
  airSchema,
  cornerTrapObjectSchema,
  frequenciesHzSchema,
  frequencyHzSchema,
  incidenceSchema,
  layerSchema,
  layersSchema,
  panelObjectSchema,
  porousLayerSchema,
  resistiveSheetSchema,
  thirdOctaveAlphaSchema,
  type AbsorberObject,
  type AbsorberRatingRequest,
  type AbsorberSpectrumRequest,
} from "./schemas";
