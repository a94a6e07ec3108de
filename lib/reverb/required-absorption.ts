import { bandTotals, type ReverberationInput } from "./reverberation-time";
import { checkNumbers, REVERB_LIMITS } from "./validate";

/** One band of {@link requiredAbsorption}. */
export interface RequiredAbsorptionBand {
  frequencyHz: number;
  /** absorption area the room has now (surfaces + any extra given), m² */
  currentM2: number;
  /** total absorption area that gives the target time, m² */
  neededM2: number;
  /** area to add, m² (0 when the room is already at or below the target) */
  addM2: number;
  /** area by which the room already exceeds the need, m² (0 when short) */
  surplusM2: number;
}

/**
 * Inverse of {@link reverberationTime}: the absorption area per band that brings the room to
 * `targetS`, and how much to add. Solves the same formula for A:
 *   Sabine  A = 24 ln10 V/(cT) − 4mV
 *   Eyring  A = S (1 − exp(−(24 ln10 V/(cT) − 4mV)/S))
 * (Sabine; Eyring, IEC 60050 IEV 801-31-09; the added area is taken as part of A with S unchanged,
 * as in CONTRACTS.md.) Where air alone already decays faster than the target, the need is 0.
 * @param room as for reverberationTime; @param targetS target T per band, s (0.01…30)
 * @example requiredAbsorption({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.1] }], bandsHz: [500], formula: 'sabine', speedOfSound: 343.2 }, [0.5])[0].addM2 // ≈ 22.2
 */
export function requiredAbsorption(room: ReverberationInput, targetS: readonly number[]): RequiredAbsorptionBand[] {
  const t = bandTotals(room);
  checkNumbers(targetS, "targetS", room.bandsHz.length, REVERB_LIMITS.reverberationS.min, REVERB_LIMITS.reverberationS.max);
  const V = room.volumeM3;
  const K = 24 * Math.LN10;
  return t.absorptionM2.map((currentM2, b) => {
    const equivalent = (K * V) / (t.speedOfSound * targetS[b]!) - 4 * t.airAttenuation[b]! * V; // room part of the denominator
    let neededM2: number;
    if (equivalent <= 0) neededM2 = 0;
    else if (room.formula === "sabine") neededM2 = equivalent;
    else neededM2 = -t.surfaceM2 * Math.expm1(-equivalent / t.surfaceM2); // S(1 − e^{−x/S})
    return {
      frequencyHz: room.bandsHz[b]!,
      currentM2,
      neededM2,
      addM2: Math.max(0, neededM2 - currentM2),
      surplusM2: Math.max(0, currentM2 - neededM2),
    };
  });
}
