/**
 * lib/sizer — low-frequency treatment sizing: from a room, its scenario's treatment, a target and the
 * user's limits, the set of builds (porous corner traps, wall–ceiling traps, thick porous panels with an
 * air gap, membrane and perforated traps) that brings 63–250 Hz to the target with the least depth,
 * count or cost, found by an exact branch-and-bound over one build per placement × count. Reuses
 * lib/porous (absorption), lib/reverb (decay, targets, required area), lib/modes (Schroeder frequency,
 * modal response) and lib/build-sheet (quantities, weight). Pure TypeScript; bad input throws a
 * TypeError/RangeError naming the field.
 */
export type {
  BindingLimit,
  Candidate,
  CeilingEdge,
  EvaluatedCandidate,
  FillMaterial,
  MaterialPrices,
  Placement,
  ProposedItem,
  SizerBand,
  SizerInput,
  SizerLimits,
  SizerObjective,
  SizerResult,
  VerticalCorner,
} from "./types";
export { DEFAULT_PRICES } from "./prices";
export { MEMBRANE_SHEET, PERFORATED_SHEET, defaultCatalogue, membraneCavityForHz, perforationRatioForHz } from "./catalogue";
export { evaluateCandidates, projectionOf } from "./evaluate";
export { SEARCH_METHOD, searchTreatment, type SearchProblem, type SearchResult } from "./search";
export { SIZED_BANDS_HZ, sizeTreatment } from "./size-treatment";
export { describeCount } from "./reasons";
export { candidateSchema, materialPricesSchema, sizerInputSchema, sizerLimitsSchema, sizerRequestSchema, type SizerInputRequest, type SizerRequest } from "./schemas";
