/**
 * lib/analysis — the stored analysis of a room's scenario, built from the engines lib/modes,
 * lib/porous and lib/reverb: `analyzeScenario(room, scenario)` gives the results stored on the
 * scenario row with `ENGINE_VERSION` and the inputs hash. Pure TypeScript: no db, React, Next or
 * Node-only imports, so a route handler, a server action, a Web Worker and a test get the same answer.
 */
export { ENGINE_VERSION } from "./engine-version";
export {
  analyzeScenario,
  effectiveRt60S,
  responseFrequenciesHz,
  MODAL_SUM_MAX_HZ,
  MODAL_SUM_MAX_MODES,
  MODE_TABLE_MAX_HZ,
  MODE_TABLE_MAX_ROWS,
  RESPONSE_HIGH_HZ,
  RESPONSE_LOW_HZ,
  RESPONSE_POINTS,
  SPREAD_BAND_HZ,
} from "./analyze-scenario";
export { analysisInputsHash } from "./inputs-hash";
export { canonicalJson } from "./canonical-json";
export { sha256Hex } from "./sha256";
export { reverbSurfaces } from "./reverb-surfaces";
export { absorberObject, itemAbsorption, type ItemAbsorption } from "./item-absorption";
export { itemCautions, HEAVY_UNIT_KG } from "./cautions";
export { roomGeometryIssues, type GeometryIssue } from "./geometry-issues";
export type { AnalysisItem, AnalysisRoom, AnalysisScenario, AnalysisSeat, AnalysisSource, Caution, CautionCode, ItemResult, RtPair, ScenarioResults } from "./types";
