// analyzeScenario checked against direct evaluations of the engines (lib/modes, lib/porous, lib/reverb):
// every stored figure must equal what the engine gives for the same inputs.
import { describe, expect, it } from "vitest";
import {
  analysisInputsHash,
  analyzeScenario,
  effectiveRt60S,
  ENGINE_VERSION,
  MODAL_SUM_MAX_HZ,
  reverbSurfaces,
  responseFrequenciesHz,
  roomGeometryIssues,
  type AnalysisItem,
  type AnalysisRoom,
} from "@/lib/analysis";
import { bonelloCheck, dimensionRatioCheck, modalBandwidthHz, multiSourceResponse, roomModes, speedOfSoundFromTemperature } from "@/lib/modes";
import { airDensity, bandSet, predictReverberation, speedOfSound } from "@/lib/reverb";
import { resonatorAbsorptionEstimate } from "@/lib/porous";

const SURFACES = ["front", "rear", "left", "right", "floor", "ceiling"] as const;
const ROOM: AnalysisRoom = {
  lengthM: 5.8,
  widthM: 4.1,
  heightM: 2.5,
  temperatureC: 20,
  humidityPct: 45,
  surfaces: SURFACES.map((surface) => ({ surface, finish: { kind: "finish", finishId: surface === "floor" ? "carpet-on-pad" : "painted-drywall-on-studs" }, openings: [] })),
  seats: [
    { id: "s1", name: "Main", xM: 3.2, yM: 2.05, zM: 1.1, isMain: true },
    { id: "s2", name: "Back", xM: 4.6, yM: 1.7, zM: 1.15, isMain: false },
  ],
  sources: [
    { id: "w1", name: "Front sub", kind: "subwoofer", xM: 0.3, yM: 0.35, zM: 0.3, delayMs: 0, polarity: 1, drivesBass: true },
    { id: "w2", name: "Rear sub", kind: "subwoofer", xM: 5.5, yM: 2.05, zM: 0.3, delayMs: 2, polarity: -1, drivesBass: true },
    { id: "m1", name: "Left main", kind: "main-speaker", xM: 0.35, yM: 1.0, zM: 1.1, delayMs: 0, polarity: 1, drivesBass: false },
  ],
};
const TARGET = { kind: "small-room" as const, lowerS: 0.2, upperS: 0.4 };
const LAYERS = [{ kind: "porous" as const, thicknessM: 0.1, flowResistivity: 10_000, model: "miki" as const }];
const PANELS: AnalysisItem = {
  id: "i1",
  name: "Panels",
  spec: { kind: "porous-panel", layers: LAYERS, materialId: "mineral-wool-35", widthM: 0.6, heightM: 1.2, exposedSides: false },
  count: 8,
  unitCost: 95,
  unitMassKg: 4.5,
  placements: [{ kind: "surface", surface: "left", uM: 1.28, vM: 1.2 }],
};
const TRAPS: AnalysisItem = {
  id: "i2",
  name: "Traps",
  spec: { kind: "corner-trap", depthM: 0.35, lengthM: 2.5, orientation: "floor-to-ceiling", flowResistivity: 10_000, model: "miki", materialId: "mineral-wool-35" },
  count: 4,
  unitCost: 320,
  unitMassKg: 19,
  placements: [{ kind: "corner", corner: "rear-left" }],
};
const MEMBRANE: AnalysisItem = {
  id: "i3",
  name: "Membrane",
  spec: { kind: "membrane", massKgM2: 9, cavityDepthM: 0.1, resistanceRatio: 0.2, widthM: 1.2, heightM: 0.6 },
  count: 2,
  unitCost: 250,
  unitMassKg: 22,
  placements: [{ kind: "surface", surface: "rear", uM: 2, vM: 1.5 }],
};

// The room as lib/reverb takes it, written out by hand (not through reverbSurfaces).
const handSurfaces = [
  { areaM2: 4.1 * 2.5, finish: "painted-drywall-on-studs" },
  { areaM2: 4.1 * 2.5, finish: "painted-drywall-on-studs" },
  { areaM2: 5.8 * 2.5, finish: "painted-drywall-on-studs" },
  { areaM2: 5.8 * 2.5, finish: "painted-drywall-on-studs" },
  { areaM2: 5.8 * 4.1, finish: "carpet-on-pad" },
  { areaM2: 5.8 * 4.1, finish: "painted-drywall-on-studs" },
];
const V = 5.8 * 4.1 * 2.5;
const rt = (formula: "sabine" | "eyring", treatment?: Parameters<typeof predictReverberation>[0]["treatment"]) =>
  predictReverberation({ volumeM3: V, surfaces: handSurfaces, bands: "octave", formula, temperatureC: 20, relativeHumidityPct: 45, ...(treatment && { treatment }) }).bands.map((b) => b.timeS);

describe("analyzeScenario: decay (lib/reverb, direct evaluation)", () => {
  const base = analyzeScenario(ROOM, { target: TARGET, items: [] });
  const treated = analyzeScenario(ROOM, { target: TARGET, items: [PANELS, TRAPS] });

  it("untreated Sabine and Eyring times equal predictReverberation of the hand-built room (exact)", () => {
    expect(base.reverb!.untreated.sabineS).toEqual(rt("sabine"));
    expect(base.reverb!.untreated.eyringS).toEqual(rt("eyring"));
    expect(base.reverb!.treated).toEqual(base.reverb!.untreated);
    expect(base.reverb!.bandsHz).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000]);
  });

  it("treated times equal predictReverberation with the same lib/porous objects (exact)", () => {
    const objects = [
      { kind: "panel" as const, widthM: 0.6, heightM: 1.2, layers: LAYERS, count: 8, exposedSides: false },
      { kind: "corner-trap" as const, depthM: 0.35, lengthM: 2.5, orientation: "floor-to-ceiling" as const, flowResistivity: 10_000, model: "miki" as const, count: 4 },
    ];
    expect(treated.reverb!.treated.eyringS).toEqual(rt("eyring", { objects, extraAbsorptionM2: new Array(8).fill(0) }));
    expect(treated.reverb!.treated.sabineS).toEqual(rt("sabine", { objects, extraAbsorptionM2: new Array(8).fill(0) }));
  });

  it("treatment lowers the time in every band where it absorbs, for both formulas", () => {
    const r = treated.reverb!;
    r.addedM2.forEach((a, b) => {
      expect(a).toBeGreaterThan(0.01);
      expect(r.treated.sabineS[b]).toBeLessThan(r.untreated.sabineS[b]!);
      expect(r.treated.eyringS[b]).toBeLessThan(r.untreated.eyringS[b]!);
    });
  });

  it("added area per band is the sum of the items' areas (tolerance 1e-9 m²)", () => {
    const r = treated.reverb!;
    r.addedM2.forEach((a, b) => expect(a).toBeCloseTo(treated.items.byItem.reduce((s, i) => s + i.absorptionM2[b]!, 0), 9));
  });

  it("a membrane item adds count · S · α of lib/porous resonatorAbsorptionEstimate (tolerance 1e-12)", () => {
    const r = analyzeScenario(ROOM, { target: TARGET, items: [MEMBRANE] });
    const air = { densityKgM3: airDensity(20), speedOfSound: speedOfSound(20) };
    const e = resonatorAbsorptionEstimate({ massPerAreaKgM2: 9, cavityDepthM: 0.1, resistanceRatio: 0.2, frequenciesHz: bandSet("octave").exactHz }, air);
    e.points.forEach((p, b) => expect(r.reverb!.addedM2[b]).toBeCloseTo(2 * 0.72 * p.alpha, 12));
    expect(r.items.byItem[0]!.estimate).toBe(true);
    expect(r.items.byItem[0]!.resonanceHz).toBeCloseTo(e.resonanceHz, 12);
  });

  it("verdicts compare the treated Eyring time with the target band", () => {
    treated.reverb!.comparison.forEach((c, b) => {
      expect(c.predictedS).toBe(treated.reverb!.treated.eyringS[b]);
      expect(c.lowerS).toBe(0.2);
      expect(c.upperS).toBe(0.4);
      const inside = c.predictedS >= 0.2 && c.predictedS <= 0.4;
      expect(c.verdict === "within").toBe(inside);
    });
  });

  it("cost and count of items", () => {
    expect(treated.items.count).toBe(12);
    expect(treated.items.cost).toBe(8 * 95 + 4 * 320);
  });
});

describe("analyzeScenario: modes and seats (lib/modes, direct evaluation)", () => {
  const base = analyzeScenario(ROOM, { target: TARGET, items: [] });
  const treated = analyzeScenario(ROOM, { target: TARGET, items: [PANELS, TRAPS] });
  const c = speedOfSoundFromTemperature(20);

  it("mode counts and table match roomModes up to 200 Hz", () => {
    const modes = roomModes(ROOM, { maxFrequencyHz: 200, speedOfSound: c });
    expect(base.modes.counts.total).toBe(modes.length);
    expect(base.modes.counts.axial).toBe(modes.filter((m) => m.kind === "axial").length);
    expect(base.modes.table.map((m) => m.frequencyHz)).toEqual(modes.map((m) => m.frequencyHz));
  });

  it("Bonello and EBU ratio verdicts are the engine's", () => {
    expect(base.modes.bonello.passes).toBe(bonelloCheck(ROOM, { speedOfSound: c }).passes);
    expect(base.modes.ratio.verdict).toBe(dimensionRatioCheck(ROOM).verdict);
  });

  it("Schroeder frequency is 2000 √(T/V) with T the mean Eyring time at 500 and 1000 Hz (Schroeder 1996)", () => {
    const t = (base.reverb!.treated.eyringS[3]! + base.reverb!.treated.eyringS[4]!) / 2;
    expect(base.modes.schroederHz).toBeCloseTo(2000 * Math.sqrt(t / V), 9);
  });

  it("seat levels equal multiSourceResponse with the effective RT60, bass sources only (tolerance 0.0005 dB, rounding)", () => {
    const lf = treated.lowFrequency!;
    expect(lf.effectiveRt60S).toBe(effectiveRt60S(treated.reverb!.treated.eyringS));
    expect(lf.sourceIds).toEqual(["w1", "w2"]);
    const direct = multiSourceResponse(ROOM, {
      sources: [
        { position: [0.3, 0.35, 0.3], delayMs: 0, polarity: 1 },
        { position: [5.5, 2.05, 0.3], delayMs: 2, polarity: -1 },
      ],
      receivers: [
        [3.2, 2.05, 1.1],
        [4.6, 1.7, 1.15],
      ],
      frequenciesHz: responseFrequenciesHz(),
      rt60Seconds: lf.effectiveRt60S,
      speedOfSound: c,
      maxModeFrequencyHz: MODAL_SUM_MAX_HZ,
    });
    lf.seats.forEach((s, i) => s.levelsDb.forEach((l, k) => expect(Math.abs(l - direct[i]![k]!)).toBeLessThanOrEqual(0.0005 + 1e-12)));
    expect(lf.frequenciesHz).toHaveLength(200);
    expect(lf.frequenciesHz[0]).toBe(15);
    expect(lf.frequenciesHz[199]).toBe(250);
  });

  it("low-frequency treatment shortens the effective RT60 and widens the modal bandwidth 2.2/T", () => {
    expect(treated.lowFrequency!.effectiveRt60S).toBeLessThan(base.lowFrequency!.effectiveRt60S);
    expect(treated.modes.bandwidthHz).toBeCloseTo(modalBandwidthHz(treated.lowFrequency!.effectiveRt60S), 12);
    expect(treated.modes.bandwidthHz).toBeGreaterThan(base.modes.bandwidthHz);
    expect(treated.lowFrequency!.seats[0]!.levelsDb).not.toEqual(base.lowFrequency!.seats[0]!.levelsDb);
  });

  it("no seat or no bass source → no seat responses, with a note", () => {
    const noSeat = analyzeScenario({ ...ROOM, seats: [] }, { target: TARGET, items: [] });
    expect(noSeat.lowFrequency).toBeNull();
    expect(noSeat.notes.join(" ")).toMatch(/No seats/);
    const noBass = analyzeScenario({ ...ROOM, sources: ROOM.sources.map((s) => ({ ...s, drivesBass: false })) }, { target: TARGET, items: [] });
    expect(noBass.lowFrequency).toBeNull();
    expect(noBass.notes.join(" ")).toMatch(/low end/);
  });
});

describe("effectiveRt60S", () => {
  it("is the mean of the 63 and 125 Hz bands, clamped to 0.05–10 s", () => {
    expect(effectiveRt60S([0.6, 0.5, 0.4, 0.35, 0.3, 0.3, 0.3, 0.25])).toBeCloseTo(0.55, 15);
    expect(effectiveRt60S([0.01, 0.02, 0, 0, 0, 0, 0, 0])).toBe(0.05);
    expect(effectiveRt60S([20, 30, 0, 0, 0, 0, 0, 0])).toBe(10);
    expect(() => effectiveRt60S([0.5])).toThrow(RangeError);
  });
});

describe("analyzeScenario: determinism and the inputs hash", () => {
  it("the same inputs give the same result and hash; ENGINE_VERSION is stored", () => {
    const a = analyzeScenario(ROOM, { target: TARGET, items: [PANELS] });
    const b = analyzeScenario(structuredClone(ROOM), { target: { upperS: 0.4, lowerS: 0.2, kind: "small-room" }, items: [structuredClone(PANELS)] });
    expect(b).toEqual(a);
    expect(a.engineVersion).toBe(ENGINE_VERSION);
    expect(a.inputsHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it("moving a seat, changing the target or an item count changes the hash", () => {
    const h = analysisInputsHash(ROOM, { target: TARGET, items: [PANELS] });
    const moved = { ...ROOM, seats: [{ ...ROOM.seats[0]!, xM: 3.3 }, ROOM.seats[1]!] };
    expect(analysisInputsHash(moved, { target: TARGET, items: [PANELS] })).not.toBe(h);
    expect(analysisInputsHash(ROOM, { target: { kind: "listening-room" }, items: [PANELS] })).not.toBe(h);
    expect(analysisInputsHash(ROOM, { target: TARGET, items: [{ ...PANELS, count: 9 }] })).not.toBe(h);
  });
});

describe("reverbSurfaces", () => {
  it("keeps the total area 2(LW + LH + WH) and lists a door with its own finish (tolerance 1e-12 m²)", () => {
    const room = { ...ROOM, surfaces: ROOM.surfaces.map((s) => (s.surface === "rear" ? { ...s, openings: [{ kind: "door" as const, label: "", uM: 0.2, vM: 0, widthM: 0.9, heightM: 2.03, finishId: "wood-door" }] } : s)) };
    const list = reverbSurfaces(room);
    expect(list).toHaveLength(7);
    expect(list.reduce((s, x) => s + x.areaM2, 0)).toBeCloseTo(2 * (5.8 * 4.1 + 5.8 * 2.5 + 4.1 * 2.5), 12);
    expect(list.find((x) => "finish" in x && x.finish === "wood-door")?.areaM2).toBeCloseTo(0.9 * 2.03, 12);
  });

  it("refuses a room without all six surfaces", () => {
    expect(() => reverbSurfaces({ ...ROOM, surfaces: ROOM.surfaces.slice(1) })).toThrow(RangeError);
  });
});

describe("cautions and geometry", () => {
  it("flags fibres and fire for wool fills, topple for full-height traps, heavy and overhead units", () => {
    const ceiling: AnalysisItem = { ...PANELS, id: "c", placements: [{ kind: "surface", surface: "ceiling", uM: 1.8, vM: 1.5 }] };
    const r = analyzeScenario(ROOM, { target: TARGET, items: [ceiling, TRAPS, MEMBRANE] });
    const codes = (id: string) => r.cautions.filter((c) => c.itemId === id).map((c) => c.code).sort();
    expect(codes("c")).toEqual(["fibres", "fire", "overhead"]);
    expect(codes("i2")).toEqual(["fibres", "fire", "topple"]);
    expect(codes("i3")).toEqual(["heavy"]);
  });

  it("roomGeometryIssues names a seat left outside a shorter room and a panel off its wall", () => {
    const issues = roomGeometryIssues({ ...ROOM, lengthM: 4 }, [{ ...PANELS, placements: [{ kind: "surface", surface: "left", uM: 3.8, vM: 1.2 }] }]);
    expect(issues.map((i) => i.id).sort()).toEqual(["i1", "s2", "w2"]);
    expect(roomGeometryIssues(ROOM, [PANELS, TRAPS])).toEqual([]);
  });
});
