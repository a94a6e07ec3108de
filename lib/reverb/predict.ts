import { objectAbsorptionAreaM2, type AbsorberObject } from "@/lib/porous";
import { airAttenuationDbPerM, intensityAttenuationPerM } from "./air-absorption";
import { airDensity, speedOfSound } from "./air-properties";
import { bandSet, type BandSet } from "./bands";
import { finishAlpha } from "./finishes";
import { requiredAbsorption, type RequiredAbsorptionBand } from "./required-absorption";
import { reverberationTime } from "./reverberation-time";
import { compareToTarget, targetBands, type BandComparison, type ReverbTarget } from "./targets";
import { checkNumbers } from "./validate";

/** A room surface given by a built-in finish or by its own α per band. */
export type RoomSurface = { areaM2: number; finish: string; label?: string } | { areaM2: number; alpha: number[]; label?: string };

/** A room to predict: geometry, finishes, air and treatment. */
export interface RoomDescription {
  volumeM3: number;
  surfaces: readonly RoomSurface[];
  bands?: BandSet;
  formula?: "sabine" | "eyring";
  temperatureC?: number;
  relativeHumidityPct?: number;
  pressureKPa?: number;
  treatment?: { objects?: readonly AbsorberObject[]; extraAbsorptionM2?: readonly number[] };
}

/** One band of a prediction. */
export interface PredictedBand {
  nominalHz: number;
  frequencyHz: number;
  timeS: number;
  /** absorption of the room's surfaces, m² */
  surfacesM2: number;
  /** absorption added by the treatment (objects + extra), m² */
  treatmentM2: number;
  airAttenuationDbPerM: number;
}

/** Result of {@link predictReverberation}. */
export interface Prediction {
  formula: "sabine" | "eyring";
  speedOfSound: number;
  airDensityKgM3: number;
  bands: PredictedBand[];
  notes: string[];
}

interface Resolved {
  bandsHz: number[];
  nominalHz: readonly number[];
  surfaces: { areaM2: number; alpha: number[] }[];
  c: number;
  rho: number;
  airDb: number[];
  treatment: number[];
  formula: "sabine" | "eyring";
  notes: string[];
}

function resolve(room: RoomDescription): Resolved {
  if (typeof room !== "object" || room === null) throw new TypeError("room must be an object");
  const { nominalHz, exactHz } = bandSet(room.bands ?? "octave");
  const temperatureC = room.temperatureC ?? 20;
  const relativeHumidityPct = room.relativeHumidityPct ?? 50;
  const pressureKPa = room.pressureKPa ?? 101.325;
  const c = speedOfSound(temperatureC);
  const rho = airDensity(temperatureC, pressureKPa);
  const notes = new Set<string>();
  if (!Array.isArray(room.surfaces)) throw new TypeError("surfaces must be an array");
  const surfaces = room.surfaces.map((s, i) => {
    if (typeof s !== "object" || s === null) throw new TypeError(`surfaces[${i}] must be an object`);
    if ("finish" in s) {
      return {
        areaM2: s.areaM2,
        alpha: nominalHz.map((f) => {
          const a = finishAlpha(s.finish, f);
          if (a.extended) notes.add("finish α at 63 Hz and 8 kHz hold the 125 Hz / 4 kHz table values (tables stop there; common practice)");
          return a.alpha;
        }),
      };
    }
    return { areaM2: s.areaM2, alpha: s.alpha };
  });
  const airDb = exactHz.map((f) => airAttenuationDbPerM(f, { temperatureC, relativeHumidityPct, pressureKPa }));
  const treatment = new Array<number>(exactHz.length).fill(0);
  const objects = room.treatment?.objects ?? [];
  if (!Array.isArray(objects)) throw new TypeError("treatment.objects must be an array");
  for (const o of objects) {
    objectAbsorptionAreaM2(o, exactHz, { densityKgM3: rho, speedOfSound: c }).forEach((a, b) => (treatment[b]! += a));
    notes.add("treatment objects: infinite-layer α at random incidence, diffraction edge effect not included");
  }
  if (room.treatment?.extraAbsorptionM2 !== undefined) {
    checkNumbers(room.treatment.extraAbsorptionM2, "treatment.extraAbsorptionM2", exactHz.length, 0, 100_000).forEach(
      (a, b) => (treatment[b]! += a),
    );
  }
  return { bandsHz: exactHz, nominalHz, surfaces, c, rho, airDb, treatment, formula: room.formula ?? "eyring", notes: [...notes] };
}

/**
 * Predicts the reverberation time per band of a described room: finishes from the built-in table,
 * speed of sound and density from the temperature, air absorption by ISO 9613-1 at the room's
 * temperature and humidity, plus the treatment's absorption area. Bands are evaluated at exact
 * mid-band frequencies (IEC 61260-1). Default formula Eyring; default air 20 °C, 50 % RH.
 * @example predictReverberation({ volumeM3: 32, surfaces: [{ areaM2: 62, finish: 'painted-drywall-on-studs' }] }).bands[3].timeS // ≈ 1.58
 */
export function predictReverberation(room: RoomDescription): Prediction {
  const r = resolve(room);
  const times = reverberationTime({
    volumeM3: room.volumeM3,
    surfaces: r.surfaces,
    bandsHz: r.bandsHz,
    formula: r.formula,
    speedOfSound: r.c,
    airAttenuation: r.airDb.map(intensityAttenuationPerM),
    extraAbsorptionM2: r.treatment,
  });
  return {
    formula: r.formula,
    speedOfSound: r.c,
    airDensityKgM3: r.rho,
    bands: times.map((timeS, b) => ({
      nominalHz: r.nominalHz[b]!,
      frequencyHz: r.bandsHz[b]!,
      timeS,
      surfacesM2: r.surfaces.reduce((sum, s) => sum + s.areaM2 * s.alpha[b]!, 0),
      treatmentM2: r.treatment[b]!,
      airAttenuationDbPerM: r.airDb[b]!,
    })),
    notes: r.notes,
  };
}

/**
 * Predicts a room and compares it with a target: per-band deviation and verdict, and the absorption
 * area to add per band to reach the target time (the start of trap sizing).
 * @example evaluateTarget({ volumeM3: 32, surfaces: [{ areaM2: 62, finish: 'carpet-on-pad' }] }, { kind: 'small-room' }).comparison[3].verdict
 */
export function evaluateTarget(
  room: RoomDescription,
  target: ReverbTarget,
  nearMarginS = 0.05,
): { prediction: Prediction; comparison: BandComparison[]; required: RequiredAbsorptionBand[] } {
  const prediction = predictReverberation(room);
  const r = resolve(room);
  const bands = targetBands(target, r.bandsHz, room.volumeM3);
  const comparison = compareToTarget(
    prediction.bands.map((b) => b.timeS),
    bands,
    nearMarginS,
  );
  const required = requiredAbsorption(
    {
      volumeM3: room.volumeM3,
      surfaces: r.surfaces,
      bandsHz: r.bandsHz,
      formula: r.formula,
      speedOfSound: r.c,
      airAttenuation: r.airDb.map(intensityAttenuationPerM),
      extraAbsorptionM2: r.treatment,
    },
    bands.map((b) => b.targetS),
  );
  return { prediction, comparison, required };
}
