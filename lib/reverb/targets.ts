import { checkNumber, checkNumbers, REVERB_LIMITS } from "./validate";

/** Reference volume of the listening-room target, m³ (ITU-R BS.1116 / EBU Tech 3276 [from memory, high]). */
export const LISTENING_ROOM_REFERENCE_VOLUME_M3 = 100;

/**
 * Mean reverberation time target of a reference listening room, Tm = 0.25·(V/V₀)^(1/3) s, V₀ = 100 m³
 * (ITU-R BS.1116 / EBU Tech 3276 [from memory, high]).
 * @param volumeM3 room volume, m³
 * @example listeningRoomTargetS(100) // 0.25
 */
export function listeningRoomTargetS(volumeM3: number): number {
  checkNumber(volumeM3, "volumeM3", REVERB_LIMITS.volumeM3.min, REVERB_LIMITS.volumeM3.max);
  return 0.25 * Math.cbrt(volumeM3 / LISTENING_ROOM_REFERENCE_VOLUME_M3); // Tm = 0.25 (V/V0)^(1/3)
}

/**
 * Tolerance mask of the listening-room target, offsets in s from Tm at a frequency (ITU-R BS.1116 /
 * EBU Tech 3276 as given in REFERENCES.md — from memory, moderate: confirm against the documents).
 * ±0.05 s from 200 Hz to 4 kHz; the upper limit widens to +0.3 s at 63 Hz, the lower to −0.1 s at
 * 8 kHz, both linearly in log-frequency; held constant beyond 63 Hz / 8 kHz.
 * @param frequencyHz band centre, Hz
 * @example listeningRoomToleranceS(1000) // { lowerS: -0.05, upperS: 0.05 }
 */
export function listeningRoomToleranceS(frequencyHz: number): { lowerS: number; upperS: number } {
  checkNumber(frequencyHz, "frequencyHz", REVERB_LIMITS.bandHz.min, REVERB_LIMITS.bandHz.max);
  const lerpLog = (f: number, f0: number, v0: number, f1: number, v1: number) => {
    const t = Math.min(1, Math.max(0, Math.log(f / f0) / Math.log(f1 / f0)));
    return v0 + t * (v1 - v0);
  };
  const upperS = frequencyHz < 200 ? lerpLog(frequencyHz, 63, 0.3, 200, 0.05) : 0.05;
  const lowerS = frequencyHz > 4000 ? lerpLog(frequencyHz, 4000, -0.05, 8000, -0.1) : -0.05;
  return { lowerS, upperS };
}

/**
 * A reverberation-time target: the listening-room target with its mask, or a flat small-room band
 * (common practice for home theatres and control rooms: roughly 0.2–0.4 s and flat; configurable).
 */
export type ReverbTarget = { kind: "listening-room" } | { kind: "small-room"; lowerS?: number; upperS?: number };

/** Default small-room band, s (common practice). */
export const SMALL_ROOM_BAND_S = Object.freeze({ lowerS: 0.2, upperS: 0.4 });

/** Target per band: nominal target and its allowed band, s. */
export interface TargetBand {
  frequencyHz: number;
  targetS: number;
  lowerS: number;
  upperS: number;
}

/**
 * The target per band for a room of `volumeM3`.
 * listening-room: target Tm, band Tm + mask; small-room: band [lowerS, upperS], target its middle.
 * @example targetBands({ kind: 'small-room' }, [500], 32)[0] // { frequencyHz: 500, targetS: 0.3, lowerS: 0.2, upperS: 0.4 }
 */
export function targetBands(target: ReverbTarget, bandsHz: readonly number[], volumeM3: number): TargetBand[] {
  if (!Array.isArray(bandsHz) || bandsHz.length === 0) throw new RangeError("bandsHz must hold at least one band");
  bandsHz.forEach((f, i) => checkNumber(f, `bandsHz[${i}]`, REVERB_LIMITS.bandHz.min, REVERB_LIMITS.bandHz.max));
  if (target?.kind === "listening-room") {
    const tm = listeningRoomTargetS(volumeM3);
    return bandsHz.map((frequencyHz) => {
      const m = listeningRoomToleranceS(frequencyHz);
      return { frequencyHz, targetS: tm, lowerS: Math.max(0, tm + m.lowerS), upperS: tm + m.upperS };
    });
  }
  if (target?.kind === "small-room") {
    const lowerS = checkNumber(target.lowerS ?? SMALL_ROOM_BAND_S.lowerS, "target.lowerS", 0.05, 5);
    const upperS = checkNumber(target.upperS ?? SMALL_ROOM_BAND_S.upperS, "target.upperS", 0.05, 5);
    if (!(upperS > lowerS)) throw new RangeError(`target.upperS (${upperS}) must exceed target.lowerS (${lowerS})`);
    return bandsHz.map((frequencyHz) => ({ frequencyHz, targetS: (lowerS + upperS) / 2, lowerS, upperS }));
  }
  throw new TypeError(`target.kind must be 'listening-room' or 'small-room', got ${String((target as { kind?: unknown })?.kind)}`);
}

/** Verdict of one band. */
export type BandVerdict = "within" | "near" | "outside";

/** One band of {@link compareToTarget}. */
export interface BandComparison extends TargetBand {
  predictedS: number;
  /** predicted − target, s */
  deviationS: number;
  /** how far outside the allowed band, s (0 when within; positive above, negative below) */
  excessS: number;
  verdict: BandVerdict;
}

/**
 * Per-band deviation of a predicted reverberation time from a target, with a verdict:
 * 'within' the allowed band; 'near' when outside it by at most `nearMarginS` (our convention,
 * default 0.05 s); 'outside' beyond that.
 * @param predictedS T per band, s; @param bands from {@link targetBands}; @param nearMarginS s
 * @example compareToTarget([0.45], targetBands({ kind: 'small-room' }, [500], 32))[0].verdict // 'near'
 */
export function compareToTarget(predictedS: readonly number[], bands: readonly TargetBand[], nearMarginS = 0.05): BandComparison[] {
  checkNumbers(predictedS, "predictedS", bands.length, 0, REVERB_LIMITS.reverberationS.max);
  checkNumber(nearMarginS, "nearMarginS", 0, 1);
  return bands.map((b, i) => {
    const t = predictedS[i]!;
    const excessS = t > b.upperS ? t - b.upperS : t < b.lowerS ? t - b.lowerS : 0;
    const verdict: BandVerdict = excessS === 0 ? "within" : Math.abs(excessS) <= nearMarginS + 1e-12 ? "near" : "outside";
    return { ...b, predictedS: t, deviationS: t - b.targetS, excessS, verdict };
  });
}
