import { logSpacedFrequencies, modalResponse, populationStdDev, schroederFrequency } from "@/lib/modes";
import {
  airAttenuationDbPerM,
  airDensity,
  bandSet,
  compareToTarget,
  finishAlpha,
  intensityAttenuationPerM,
  predictReverberation,
  requiredAbsorption,
  speedOfSound,
  targetBands,
  type ReverberationInput,
} from "@/lib/reverb";
import { defaultCatalogue } from "./catalogue";
import { evaluateCandidates } from "./evaluate";
import { DEFAULT_PRICES } from "./prices";
import { describeCount, explain } from "./reasons";
import { SEARCH_METHOD, searchTreatment } from "./search";
import type { EvaluatedCandidate, ProposedItem, SizerBand, SizerInput, SizerResult } from "./types";
import { checkInput } from "./validate";

/** The bands the sizer sizes: 63, 125 and 250 Hz (indices into the octave set 63…8000 Hz). */
export const SIZED_BANDS_HZ = Object.freeze([63, 125, 250]);

const SLOT_ORDER = ["vertical-corner", "ceiling-edge", "wall-resonator", "wall-panel"] as const;

/**
 * Proposes low-frequency treatment for a room and scenario: the set of builds (× count, with where they
 * go) that brings the 63–250 Hz octave bands to the target, or as close as the limits allow, with the
 * least depth, count or cost. Candidates come from the catalogue (default {@link defaultCatalogue});
 * their absorption from lib/porous at the room's air; the room's decay from lib/reverb (Eyring by
 * default, ISO 9613-1 air). The search is exact within its space (see `search.method`).
 * @example sizeTreatment({ room: { lengthM: 5.8, widthM: 4.1, heightM: 2.5 }, surfaces, target: { kind: 'listening-room' }, objective: 'cost', limits }).reached
 */
export function sizeTreatment(input: SizerInput): SizerResult {
  checkInput(input);
  const { room, limits } = input;
  const volumeM3 = room.lengthM * room.widthM * room.heightM;
  const temperatureC = input.temperatureC ?? 20;
  const relativeHumidityPct = input.relativeHumidityPct ?? 50;
  const formula = input.formula ?? "eyring";
  const aim = input.aim ?? "target";
  const { nominalHz, exactHz } = bandSet("octave");
  const c = speedOfSound(temperatureC);
  const air = { densityKgM3: airDensity(temperatureC), speedOfSound: c };
  const current = input.currentTreatmentM2 ? [...input.currentTreatmentM2] : new Array<number>(exactHz.length).fill(0);

  // the room as lib/reverb resolves it (finish α at nominal bands, exact mid-band air absorption)
  const reverbInput = (extra: number[]): ReverberationInput => ({
    volumeM3,
    surfaces: input.surfaces.map((s) => ("finish" in s ? { areaM2: s.areaM2, alpha: nominalHz.map((f) => finishAlpha(s.finish, f).alpha) } : { areaM2: s.areaM2, alpha: s.alpha })),
    bandsHz: exactHz,
    formula,
    speedOfSound: c,
    airAttenuation: exactHz.map((f) => intensityAttenuationPerM(airAttenuationDbPerM(f, { temperatureC, relativeHumidityPct }))),
    extraAbsorptionM2: extra,
  });
  const predict = (extra: number[]) =>
    predictReverberation({ volumeM3, surfaces: input.surfaces, formula, temperatureC, relativeHumidityPct, treatment: { extraAbsorptionM2: extra } });
  const before = predict(current);
  const targets = targetBands(input.target, exactHz, volumeM3);
  const aimS = targets.map((t) => (aim === "target" ? t.targetS : t.upperS));
  const need = requiredAbsorption(reverbInput(current), aimS);
  const lower = requiredAbsorption(reverbInput(current), targets.map((t) => Math.max(0.01, t.lowerS)));
  const sizedIdx = SIZED_BANDS_HZ.map((f) => nominalHz.indexOf(f));
  const needM2 = sizedIdx.map((b) => need[b]!.addM2);
  // over-damping cap: the area that takes the band down to its lower edge (none where it is already below)
  const maxAddM2 = sizedIdx.map((b) => {
    const cap = lower[b]!.neededM2 - lower[b]!.currentM2;
    return cap > 0 ? cap : Infinity;
  });

  const prices = input.prices ?? DEFAULT_PRICES;
  const evaluated = evaluateCandidates(input.catalogue ?? defaultCatalogue(), { roomHeightM: room.heightM, exactHz, air, prices, limits });
  const slotOf = (e: EvaluatedCandidate) =>
    e.placement === "vertical-corner" ? 0 : e.placement === "ceiling-edge" ? 1 : e.kind === "membrane-trap" ? 2 : 3;
  const slots = SLOT_ORDER.map((_, s) => ({
    kind: (s === 0 ? "vertical-corner" : s === 1 ? "ceiling-edge" : "wall") as "vertical-corner" | "ceiling-edge" | "wall",
    candidates: evaluated
      .map((e, index) => ({ e, index }))
      .filter(({ e }) => e.allowed && e.capacity > 0 && slotOf(e) === s && sizedIdx.some((b) => e.unitAbsorptionM2[b]! > 0))
      .map(({ e, index }) => ({ index, unit: sizedIdx.map((b) => e.unitAbsorptionM2[b]!) })),
  }));
  const budget = limits.budget ?? Infinity;
  const maxItems = limits.maxItems ?? 10_000;
  const found = searchTreatment({ needM2, maxAddM2, slots, candidates: evaluated, wallAreaM2: limits.wallAreaM2, budget, maxItems, objective: input.objective });

  // proposal, with where each item goes
  const corners = [...limits.verticalCorners];
  const edges = [...limits.ceilingEdges].map((e, i) => ({ ...e, i })).sort((a, b) => b.lengthM - a.lengthM || a.i - b.i);
  const items: ProposedItem[] = found.chosen
    .map(({ index, count }) => {
      const e = evaluated[index]!;
      let where: string[];
      if (e.placement === "vertical-corner") where = corners.splice(0, count).map((k) => `${k} corner, floor to ceiling`);
      else if (e.placement === "ceiling-edge") {
        const seg = e.build.kind === "corner-trap" ? e.build.lengthM : 1.2;
        where = [];
        let left = count;
        for (const edge of edges) {
          const fit = Math.min(left, Math.floor(edge.lengthM / seg + 1e-9));
          if (fit > 0) where.push(`${edge.edge} wall–ceiling edge: ${fit} × ${seg} m`);
          left -= fit;
          if (left === 0) break;
        }
      } else where = [`walls: ${(count * e.wallAreaM2).toFixed(2)} m² of the free wall area`];
      return {
        candidateId: e.id,
        name: e.name,
        kind: e.kind,
        placement: e.placement,
        count,
        where,
        depthM: e.depthM,
        projectionM: e.projectionM,
        unitCost: e.unitCost,
        cost: count * e.unitCost,
        unitWeightKg: e.unitWeightKg,
        weightKg: count * e.unitWeightKg,
        addedM2: e.unitAbsorptionM2.map((a) => a * count),
        build: e.build,
      };
    })
    .filter((it) => it.count > 0);
  const addedM2 = exactHz.map((_, b) => items.reduce((s, it) => s + it.addedM2[b]!, 0));
  const after = predict(current.map((a, b) => a + addedM2[b]!));
  const cmpBefore = compareToTarget(before.bands.map((x) => x.timeS), targets);
  const cmpAfter = compareToTarget(after.bands.map((x) => x.timeS), targets);
  const bands: SizerBand[] = exactHz.map((frequencyHz, b) => ({
    nominalHz: nominalHz[b]!,
    frequencyHz,
    sized: sizedIdx.includes(b),
    beforeS: before.bands[b]!.timeS,
    afterS: after.bands[b]!.timeS,
    targetS: aimS[b]!,
    lowerS: targets[b]!.lowerS,
    upperS: targets[b]!.upperS,
    verdictBefore: cmpBefore[b]!.verdict,
    verdictAfter: cmpAfter[b]!.verdict,
    neededM2: need[b]!.addM2,
    addedM2: addedM2[b]!,
    missingM2: Math.max(0, need[b]!.addM2 - addedM2[b]!),
  }));
  const reached = sizedIdx.every((b) => addedM2[b]! >= need[b]!.addM2 - 1e-9);

  const totals = {
    count: items.reduce((s, it) => s + it.count, 0),
    cost: items.reduce((s, it) => s + it.cost, 0),
    weightKg: items.reduce((s, it) => s + it.weightKg, 0),
    maxProjectionM: items.reduce((s, it) => Math.max(s, it.projectionM), 0),
    wallAreaM2: items.reduce((s, it) => s + (it.placement === "wall" ? it.count * evaluated.find((e) => e.id === it.candidateId)!.wallAreaM2 : 0), 0),
    verticalCorners: items.reduce((s, it) => s + (it.placement === "vertical-corner" ? it.count : 0), 0),
    ceilingSegments: items.reduce((s, it) => s + (it.placement === "ceiling-edge" ? it.count : 0), 0),
  };
  const midS = (after.bands[nominalHz.indexOf(500)]!.timeS + after.bands[nominalHz.indexOf(1000)]!.timeS) / 2;
  const fs = schroederFrequency(midS, volumeM3);
  const caveat = `Below about ${Math.round(fs)} Hz — this room's Schroeder frequency, 2000·√(T/V) with T = ${midS.toFixed(2)} s (mean of 500 Hz and 1 kHz after treatment) and V = ${volumeM3.toFixed(1)} m³ — the sound field is a set of separate room modes, not a diffuse field: the reverberation formulas and the porous and resonator models behind these figures are rough there, so read the 63–250 Hz times and areas as estimates (errors of tens of per cent are usual) and check with a measurement after building.`;

  const { reasons, binding } = explain({ input, evaluated, items, bands, sizedIdx, need, reached, totals, maxAddM2, budget, maxItems });

  let modal: SizerResult["modal"];
  if (input.seat) {
    const frequenciesHz = logSpacedFrequencies(20, Math.min(300, Math.max(40, Math.round(fs))), 80);
    const rt = (p: typeof before) => Math.min(10, Math.max(0.05, p.bands[0]!.timeS));
    const opts = { source: [...input.seat.source] as [number, number, number], receiver: [...input.seat.receiver] as [number, number, number], frequenciesHz, speedOfSound: c, maxModeFrequencyHz: 2 * frequenciesHz[frequenciesHz.length - 1]! };
    const beforeDb = modalResponse(room, { ...opts, rt60Seconds: rt(before) });
    const afterDb = modalResponse(room, { ...opts, rt60Seconds: rt(after) });
    modal = {
      frequenciesHz,
      beforeDb,
      afterDb,
      beforeSpreadDb: populationStdDev(beforeDb),
      afterSpreadDb: populationStdDev(afterDb),
      note: `modal sum (lib/modes) at the seat with the damping of the 63 Hz band's T before (${rt(before).toFixed(2)} s) and after (${rt(after).toFixed(2)} s); a uniform damping, so where the traps sit is not modelled`,
    };
  }

  const notes = [
    "absorption areas: porous builds from lib/porous at random incidence (diffraction edge effect not included); membrane and perforated traps are lumped estimates with an assumed resistance",
    "unit costs are the materials at the given prices, pro rata; the build sheet buys whole boards and slabs",
    ...(maxAddM2.some((m) => !Number.isFinite(m)) ? ["a sized band is already below the target's lower edge: no over-damping cap applied there"] : []),
    ...(() => {
      const low = bands.filter((x) => !x.sized && x.afterS < x.lowerS && x.beforeS >= x.lowerS).map((x) => `${x.nominalHz} Hz`);
      return low.length > 0
        ? [`the proposal takes ${low.join(", ")} below the target's lower edge: porous traps absorb the mid and high bands too; a facing that reflects those bands (e.g. a thin film or spaced slats over some panels) keeps the bass effect (common practice)`]
        : [];
    })(),
    ...(found.chosen.length > 0 ? [`proposal: ${items.map((it) => `${describeCount(it.count)} of "${it.name}"`).join("; ")}`] : []),
  ];
  return {
    objective: input.objective,
    aim,
    items,
    bands,
    addedM2,
    reached,
    binding,
    totals,
    reasons,
    schroederFrequencyHz: fs,
    caveat,
    ...(modal ? { modal } : {}),
    candidates: evaluated,
    search: { method: SEARCH_METHOD, nodes: found.nodes, combinations: found.combinations },
    notes,
  };
}
