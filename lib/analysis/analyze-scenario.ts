import {
  bonelloCheck,
  dimensionRatioCheck,
  logSpacedFrequencies,
  modeTable,
  multiSourceResponse,
  populationStdDev,
  schroederFrequency,
  speedOfSoundFromTemperature,
  asymptoticModeCount,
  LIMITS as MODE_LIMITS,
} from "@/lib/modes";
import { airDensity, bandSet, evaluateTarget, predictReverberation, speedOfSound, REVERB_LIMITS, type RoomDescription } from "@/lib/reverb";
import { itemCautions } from "./cautions";
import { ENGINE_VERSION } from "./engine-version";
import { analysisInputsHash } from "./inputs-hash";
import { absorberObject, itemAbsorption } from "./item-absorption";
import { reverbSurfaces } from "./reverb-surfaces";
import type { AnalysisRoom, AnalysisScenario, ItemResult, ScenarioResults } from "./types";

/** Modes listed in the stored mode table, Hz. */
export const MODE_TABLE_MAX_HZ = 200;
/** At most this many rows are stored in the mode table. */
export const MODE_TABLE_MAX_ROWS = 400;
/** Seat responses: RESPONSE_POINTS log-spaced frequencies from RESPONSE_LOW_HZ to RESPONSE_HIGH_HZ. */
export const RESPONSE_LOW_HZ = 15;
export const RESPONSE_HIGH_HZ = 250;
export const RESPONSE_POINTS = 200;
/**
 * Modes up to this frequency enter the modal sum, Hz: well above the top of the response so that the
 * sum is not cut off near 250 Hz (common practice).
 */
export const MODAL_SUM_MAX_HZ = 400;
/** The modal sum is skipped when the room would have more modes than this below MODAL_SUM_MAX_HZ. */
export const MODAL_SUM_MAX_MODES = 20_000;
/** Band over which a seat's spread (population std-dev of its level) is taken, Hz (the lib/modes seat-ranking default). */
export const SPREAD_BAND_HZ = Object.freeze({ lowHz: 20, highHz: 120 });
/** Stored levels are rounded to this many decimals (0.001 dB); frequencies to 0.001 Hz. */
const DECIMALS = 3;

const round = (v: number, d = DECIMALS) => Math.round(v * 10 ** d) / 10 ** d;
const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** The seat-response frequencies, Hz (rounded to 0.001 Hz, and computed at those rounded values). */
export function responseFrequenciesHz(): number[] {
  return logSpacedFrequencies(RESPONSE_LOW_HZ, RESPONSE_HIGH_HZ, RESPONSE_POINTS).map((f) => round(f));
}

/**
 * The RT60 used in the modal sum: the arithmetic mean of this scenario's predicted Eyring times in
 * the 63 Hz and 125 Hz octave bands (the bands that cover most of 15–250 Hz), clamped to the modal
 * engine's 0.05–10 s. The damping constant of every mode is then δ = 3 ln 10 / T (CONTRACTS.md), so
 * added low-frequency absorption shortens T, raises δ and widens each mode's half-power bandwidth
 * 2.2/T (Schroeder 1996). One T for all modes is our simplification (common practice): below the
 * Schroeder frequency the diffuse-field Eyring time is only a stand-in for the modal damping.
 * @param eyringS Eyring times per octave band 63…8000 Hz, s
 * @example effectiveRt60S([0.6, 0.5, 0.4, 0.35, 0.3, 0.3, 0.3, 0.25]) // 0.55
 */
export function effectiveRt60S(eyringS: readonly number[]): number {
  if (eyringS.length !== 8) throw new RangeError(`eyringS must hold 8 octave-band times 63…8000 Hz (got ${eyringS.length})`);
  return clamp((eyringS[0]! + eyringS[1]!) / 2, MODE_LIMITS.minRt60Seconds, MODE_LIMITS.maxRt60Seconds);
}

/**
 * Analyses one scenario of a room: room modes and their distribution checks, predicted reverberation
 * per octave band 63–8000 Hz (Sabine and Eyring, untreated and with the scenario's items) against the
 * scenario's target, the absorption the items add, the modal response at each seat for the sources
 * that play the bass (with an effective RT60 from the predicted low-frequency time, see
 * {@link effectiveRt60S}), cost and count of items, and cautions. Pure and deterministic: the same
 * inputs give the same result (and the same `inputsHash`).
 *
 * Speed of sound: c = 331.3 √(1 + ϑ/273.15) at the room's air temperature (both engines use it).
 * The reverb result is null (with a note) for rooms below lib/reverb's 1 m³; the seat responses are
 * null when no seat or no bass source exists, or when the room is too large for a modal sum.
 *
 * @example
 * const r = analyzeScenario(room, { target: { kind: 'small-room', lowerS: 0.2, upperS: 0.4 }, items: [] })
 * r.reverb?.treated.eyringS // equals predictReverberation({ ..., formula: 'eyring' }).bands.map((b) => b.timeS)
 * @throws RangeError / TypeError from the engines for inputs outside their domain (naming the field)
 */
export function analyzeScenario(room: AnalysisRoom, scenario: AnalysisScenario): ScenarioResults {
  const rect = { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM };
  const volumeM3 = room.lengthM * room.widthM * room.heightM;
  const surfaceAreaM2 = 2 * (room.lengthM * room.widthM + room.lengthM * room.heightM + room.widthM * room.heightM);
  const c = speedOfSoundFromTemperature(room.temperatureC);
  const notes: string[] = [];

  // ---- treatment: per item, at the exact octave mid-band frequencies, with the room's air
  const { nominalHz, exactHz } = bandSet("octave");
  const air = { densityKgM3: airDensity(room.temperatureC), speedOfSound: speedOfSound(room.temperatureC) };
  const byItem: ItemResult[] = scenario.items.map((item) => {
    const a = itemAbsorption(item.spec, item.count, exactHz, air);
    return {
      id: item.id,
      name: item.name,
      kind: item.spec.kind,
      count: item.count,
      cost: item.count * item.unitCost,
      absorptionM2: a.absorptionM2,
      withinModelRange: a.withinModelRange,
      estimate: a.estimate,
      resonanceHz: a.resonanceHz,
      usefulDownToHz: a.usefulDownToHz,
      limits: a.limits,
    };
  });
  const objects = scenario.items.flatMap((i) => {
    const o = absorberObject(i.spec, i.count);
    return o ? [o] : [];
  });
  const resonatorM2 = exactHz.map((_, b) => byItem.reduce((s, r) => s + (r.estimate ? r.absorptionM2[b]! : 0), 0));

  // ---- reverberation (lib/reverb), octave bands
  let reverb: ScenarioResults["reverb"] = null;
  if (volumeM3 >= REVERB_LIMITS.volumeM3.min) {
    const base: RoomDescription = {
      volumeM3,
      surfaces: reverbSurfaces(room),
      bands: "octave",
      temperatureC: room.temperatureC,
      relativeHumidityPct: room.humidityPct,
    };
    const treatment = { objects, extraAbsorptionM2: resonatorM2 };
    const times = (formula: "sabine" | "eyring", treated: boolean) =>
      predictReverberation({ ...base, formula, ...(treated && { treatment }) }).bands.map((b) => b.timeS);
    const evaluated = evaluateTarget({ ...base, formula: "eyring", treatment }, scenario.target);
    const p = evaluated.prediction;
    reverb = {
      bandsHz: [...nominalHz],
      untreated: { sabineS: times("sabine", false), eyringS: times("eyring", false) },
      treated: { sabineS: times("sabine", true), eyringS: p.bands.map((b) => b.timeS) },
      surfacesM2: p.bands.map((b) => b.surfacesM2),
      addedM2: p.bands.map((b) => b.treatmentM2),
      target: scenario.target,
      comparison: evaluated.comparison.map((b) => ({ targetS: b.targetS, lowerS: b.lowerS, upperS: b.upperS, predictedS: b.predictedS, deviationS: b.deviationS, excessS: b.excessS, verdict: b.verdict })),
      toAddM2: evaluated.required.map((b) => b.addM2),
      surplusM2: evaluated.required.map((b) => b.surplusM2),
      notes: p.notes,
    };
  } else {
    notes.push(`The room's volume (${volumeM3.toFixed(2)} m³) is below the ${REVERB_LIMITS.volumeM3.min} m³ the reverberation model accepts: no decay prediction.`);
  }

  // ---- modes (lib/modes)
  const lfRt = reverb ? effectiveRt60S(reverb.treated.eyringS) : null;
  const tableRt = lfRt ?? 0.4;
  if (!lfRt) notes.push("Mode bandwidths use RT60 = 0.4 s (no decay prediction for this room).");
  const table = modeTable(rect, { maxFrequencyHz: MODE_TABLE_MAX_HZ, rt60Seconds: tableRt, speedOfSound: c });
  const counts = { axial: 0, tangential: 0, oblique: 0, total: table.rows.length };
  for (const r of table.rows) counts[r.kind]++;
  const bonello = bonelloCheck(rect, { speedOfSound: c });
  const ratio = dimensionRatioCheck(rect);
  const midS = reverb ? (reverb.treated.eyringS[3]! + reverb.treated.eyringS[4]!) / 2 : null;
  const modes: ScenarioResults["modes"] = {
    maxFrequencyHz: MODE_TABLE_MAX_HZ,
    counts,
    schroederHz: midS === null ? null : schroederFrequency(midS, volumeM3),
    bonello: { passes: bonello.passes, verdict: bonello.verdict, decreasingBandsHz: bonello.decreasingBandsHz, coincidenceFailuresHz: bonello.coincidenceFailuresHz },
    ratio: { passes: ratio.passes, verdict: ratio.verdict, lengthToHeight: ratio.lengthToHeight, widthToHeight: ratio.widthToHeight },
    table: table.rows.slice(0, MODE_TABLE_MAX_ROWS).map((r) => ({ nx: r.nx, ny: r.ny, nz: r.nz, frequencyHz: r.frequencyHz, kind: r.kind, coincident: r.coincident, wideGapBelow: r.wideGapBelow })),
    tableTruncated: table.rows.length > MODE_TABLE_MAX_ROWS,
    bandwidthHz: table.bandwidthHz,
    verdict: table.verdict,
  };
  if (modes.schroederHz !== null)
    notes.push(`Below the Schroeder frequency (about ${Math.round(modes.schroederHz)} Hz) the reverberation time is not a good description of the room: look at the modal response at the seats.`);

  // ---- modal response at the seats (lib/modes multiSourceResponse)
  let lowFrequency: ScenarioResults["lowFrequency"] = null;
  const bassSources = room.sources.filter((s) => s.drivesBass);
  if (lfRt === null) {
    // noted above
  } else if (room.seats.length === 0) notes.push("No seats yet: add a listening position to see the response at the seats.");
  else if (bassSources.length === 0) notes.push("No source plays the low end: add a subwoofer, or mark a speaker as playing the bass.");
  else if (asymptoticModeCount(rect, MODAL_SUM_MAX_HZ, c) > MODAL_SUM_MAX_MODES) notes.push("The room is too large for a modal sum at the seats (more than 20 000 modes below 400 Hz).");
  else {
    const frequenciesHz = responseFrequenciesHz();
    const levels = multiSourceResponse(rect, {
      sources: bassSources.map((s) => ({ position: [s.xM, s.yM, s.zM], delayMs: s.delayMs, polarity: s.polarity })),
      receivers: room.seats.map((s) => [s.xM, s.yM, s.zM]),
      frequenciesHz,
      rt60Seconds: lfRt,
      speedOfSound: c,
      maxModeFrequencyHz: MODAL_SUM_MAX_HZ,
    });
    const inBand = frequenciesHz.map((f) => f >= SPREAD_BAND_HZ.lowHz && f <= SPREAD_BAND_HZ.highHz);
    lowFrequency = {
      effectiveRt60S: lfRt,
      effectiveRt60Basis: "mean of the predicted Eyring times in the 63 Hz and 125 Hz octave bands with this scenario's treatment, clamped to 0.05–10 s",
      frequenciesHz,
      maxModeFrequencyHz: MODAL_SUM_MAX_HZ,
      sourceIds: bassSources.map((s) => s.id),
      seats: room.seats.map((seat, i) => {
        const l = levels[i]!;
        return { id: seat.id, name: seat.name, isMain: seat.isMain, levelsDb: l.map((v) => round(v)), spreadDb: round(populationStdDev(l.filter((_, k) => inBand[k]))) };
      }),
      spreadBandHz: { ...SPREAD_BAND_HZ },
      note: "Modal sum of a rigid-walled box with one damping for all modes; absolute level is arbitrary but common to every scenario of this room: compare shapes and differences.",
    };
  }

  return {
    engineVersion: ENGINE_VERSION,
    inputsHash: analysisInputsHash(room, scenario),
    room: { volumeM3, surfaceAreaM2, speedOfSound: c },
    modes,
    reverb,
    lowFrequency,
    items: { count: byItem.reduce((s, r) => s + r.count, 0), cost: byItem.reduce((s, r) => s + r.cost, 0), byItem },
    cautions: itemCautions(scenario.items),
    notes,
  };
}
