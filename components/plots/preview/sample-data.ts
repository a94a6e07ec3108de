import { flatnessMap, logSpacedFrequencies, modalBandwidthHz, modalResponse, roomModes, schroederFrequency, type Point3 } from "@/lib/modes";
import { absorptionSpectrum, type AbsorberObject, type Layer } from "@/lib/porous";
import { compareToTarget, OCTAVE_BANDS_HZ, predictReverberation, targetBands, type RoomDescription } from "@/lib/reverb";
import { centreLevels, type AlphaSeries, type BandScenario, type BandTarget, type FrequencySeries, type PlotMode } from "@/lib/plots";

/**
 * Sample data for the plot gallery and the preview script, computed by the engines in the tree for an
 * invented media room of 5.8 × 4.1 × 2.5 m: two seat rows, one subwoofer near the front-left corner.
 */
export const SAMPLE_ROOM = Object.freeze({ lengthM: 5.8, widthM: 4.1, heightM: 2.5 });

const volumeM3 = SAMPLE_ROOM.lengthM * SAMPLE_ROOM.widthM * SAMPLE_ROOM.heightM;
const floorM2 = SAMPLE_ROOM.lengthM * SAMPLE_ROOM.widthM;
const wallsM2 = 2 * (SAMPLE_ROOM.lengthM + SAMPLE_ROOM.widthM) * SAMPLE_ROOM.heightM;

/** Seats (ear height 1.1 m) and the subwoofer, m. */
export const SAMPLE_SEATS: readonly { label: string; position: Point3 }[] = [
  { label: "Front left", position: [3.1, 1.45, 1.1] },
  { label: "Front centre", position: [3.1, 2.05, 1.1] },
  { label: "Rear centre", position: [4.4, 2.05, 1.1] },
];
export const SAMPLE_SUBWOOFER: Point3 = [0.35, 0.4, 0.3];

const porous = (thicknessM: number, flowResistivity: number): Layer => ({ kind: "porous", thicknessM, flowResistivity, model: "miki" });

/** Builds: a 50 mm wall panel, the same with a 100 mm air gap, and a 100 mm dense slab. */
export const SAMPLE_BUILDS: readonly { label: string; layers: Layer[] }[] = [
  { label: "50 mm slab on wall", layers: [porous(0.05, 15_000)] },
  { label: "50 mm slab, 100 mm gap", layers: [porous(0.05, 15_000), { kind: "air", thicknessM: 0.1 }] },
  { label: "100 mm dense slab", layers: [porous(0.1, 40_000)] },
];

const surfaces: RoomDescription["surfaces"] = [
  { areaM2: floorM2, finish: "carpet-on-pad", label: "floor" },
  { areaM2: floorM2, finish: "painted-drywall-on-studs", label: "ceiling" },
  { areaM2: wallsM2 - 3.6, finish: "painted-drywall-on-studs", label: "walls" },
  { areaM2: 1.8, finish: "wood-door", label: "door" },
  { areaM2: 1.8, finish: "glass-window", label: "window" },
];

const panels: AbsorberObject = { kind: "panel", widthM: 0.6, heightM: 1.2, layers: [porous(0.1, 15_000)], count: 6, exposedSides: false };
const traps: AbsorberObject = { kind: "corner-trap", depthM: 0.4, lengthM: 2.5, orientation: "floor-to-ceiling", flowResistivity: 8_000, model: "miki", count: 4 };

/** Everything the gallery shows, computed on call. */
export function sampleData() {
  const scenarios: { label: string; room: RoomDescription }[] = [
    { label: "Untreated", room: { volumeM3, surfaces } },
    { label: "Panels", room: { volumeM3, surfaces, treatment: { objects: [panels] } } },
    { label: "Panels + corner traps", room: { volumeM3, surfaces, treatment: { objects: [panels, traps] } } },
  ];
  const predictions = scenarios.map((s) => predictReverberation(s.room));
  const bandsHz = [...OCTAVE_BANDS_HZ];
  const exact = predictions[0]!.bands.map((b) => b.frequencyHz);
  const target = targetBands({ kind: "small-room" }, exact, volumeM3);
  const bandScenarios: BandScenario[] = predictions.map((p, i) => {
    const times = p.bands.map((b) => b.timeS);
    return { label: scenarios[i]!.label, values: times, verdicts: compareToTarget(times, target).map((c) => c.verdict) };
  });
  const bandTarget: BandTarget[] = target.map((t) => ({ lowerS: t.lowerS, upperS: t.upperS, targetS: t.targetS }));

  // Modal damping from the untreated room's 125 Hz band (the band nearest the modal region).
  const i125 = predictions[0]!.bands.findIndex((b) => b.nominalHz === 125);
  const rt60Seconds = Math.round(predictions[0]!.bands[i125]!.timeS * 100) / 100;
  const schroederHz = schroederFrequency(rt60Seconds, volumeM3);
  const frequenciesHz = logSpacedFrequencies(15, 300, 320);
  const raw = SAMPLE_SEATS.map((s) => modalResponse(SAMPLE_ROOM, { source: SAMPLE_SUBWOOFER, receiver: s.position, frequenciesHz, rt60Seconds, maxModeFrequencyHz: 400 }));
  const centred = centreLevels(raw);
  const responses: FrequencySeries[] = SAMPLE_SEATS.map((s, i) => ({ label: s.label, frequenciesHz, levelsDb: centred[i]! }));

  const modes: PlotMode[] = roomModes(SAMPLE_ROOM, { maxFrequencyHz: 200 });
  const bandwidthHz = modalBandwidthHz(rt60Seconds);

  const thirdOctaves = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];
  const absorption: AlphaSeries[] = SAMPLE_BUILDS.map((b) => ({
    label: b.label,
    points: absorptionSpectrum(b.layers, { frequenciesHz: thirdOctaves, incidence: "random" }).map((p) => ({ frequencyHz: p.frequencyHz, alpha: p.alpha, withinModelRange: p.withinModelRange })),
  }));

  const map = flatnessMap(SAMPLE_ROOM, {
    source: SAMPLE_SUBWOOFER,
    heightM: 1.1,
    gridX: 58,
    gridY: 41,
    frequenciesHz: logSpacedFrequencies(20, 120, 60),
    rt60Seconds,
    maxModeFrequencyHz: 200,
  });

  return {
    room: SAMPLE_ROOM,
    volumeM3,
    rt60Seconds,
    schroederHz,
    responses,
    modes,
    bandwidthHz,
    bandsHz,
    bandScenarios,
    bandTarget,
    absorption,
    map: { xM: map.xM, yM: map.yM, values: Array.from(map.stdDevDb) },
  };
}
