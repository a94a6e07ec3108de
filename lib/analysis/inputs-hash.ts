import { canonicalJson } from "./canonical-json";
import { sha256Hex } from "./sha256";
import type { AnalysisRoom, AnalysisScenario } from "./types";

/**
 * SHA-256 (hex) of the canonical JSON of everything analyzeScenario reads. Two inputs with the same
 * hash give the same result under one ENGINE_VERSION, so a stored result whose hash matches the
 * current inputs is still valid.
 * @example analysisInputsHash(room, scenario).length // 64
 */
export function analysisInputsHash(room: AnalysisRoom, scenario: AnalysisScenario): string {
  return sha256Hex(canonicalJson({ room, scenario }));
}
