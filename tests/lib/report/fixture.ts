// An invented media room like the demo's (5.8 × 4.1 × 2.5 m, two rows of seats, two subwoofers), its
// untreated baseline and a treated scenario, analysed by lib/analysis exactly as the workspace does.
import { analyzeScenario, type AnalysisItem, type AnalysisRoom, type AnalysisScenario } from "@/lib/analysis";
import type { ReportInput, ReportScenarioInput } from "@/lib/report";

export const ROOM: AnalysisRoom & { name: string } = {
  name: "Media room",
  lengthM: 5.8,
  widthM: 4.1,
  heightM: 2.5,
  temperatureC: 20,
  humidityPct: 45,
  surfaces: [
    { surface: "front", finish: { kind: "finish", finishId: "painted-drywall-on-studs" }, openings: [] },
    { surface: "rear", finish: { kind: "finish", finishId: "painted-drywall-on-studs" }, openings: [{ kind: "door", label: "Door", uM: 0.3, vM: 0, widthM: 0.82, heightM: 2.04, finishId: "wood-door" }] },
    { surface: "left", finish: { kind: "finish", finishId: "painted-drywall-on-studs" }, openings: [] },
    { surface: "right", finish: { kind: "finish", finishId: "painted-drywall-on-studs" }, openings: [] },
    { surface: "floor", finish: { kind: "finish", finishId: "carpet-on-pad" }, openings: [] },
    { surface: "ceiling", finish: { kind: "finish", finishId: "painted-drywall-on-studs" }, openings: [] },
  ],
  seats: [
    { id: "seat-a", name: "Row 1 centre", xM: 3.2, yM: 2.05, zM: 1.1, isMain: true },
    { id: "seat-b", name: "Row 1 left", xM: 3.2, yM: 1.45, zM: 1.1, isMain: false },
    { id: "seat-c", name: "Row 2 centre", xM: 4.6, yM: 2.05, zM: 1.25, isMain: false },
  ],
  sources: [
    { id: "sub-1", name: "Sub front left", kind: "subwoofer", xM: 0.3, yM: 0.5, zM: 0.25, delayMs: 0, polarity: 1, drivesBass: true },
    { id: "sub-2", name: "Sub front right", kind: "subwoofer", xM: 0.3, yM: 3.6, zM: 0.25, delayMs: 0, polarity: 1, drivesBass: true },
    { id: "spk-l", name: "Left speaker", kind: "main-speaker", xM: 0.4, yM: 1.0, zM: 1.1, delayMs: 0, polarity: 1, drivesBass: false },
    { id: "spk-r", name: "Right speaker", kind: "main-speaker", xM: 0.4, yM: 3.1, zM: 1.1, delayMs: 0, polarity: 1, drivesBass: false },
  ],
};

const TRAPS: AnalysisItem = {
  id: "item-traps",
  name: "Corner trap",
  spec: { kind: "corner-trap", depthM: 0.4, lengthM: 2.5, orientation: "floor-to-ceiling", flowResistivity: 9000, model: "miki", materialId: "mineral-wool-35" },
  count: 4,
  unitCost: 140,
  unitMassKg: 22,
  placements: [
    { kind: "corner", corner: "front-left" },
    { kind: "corner", corner: "front-right" },
    { kind: "corner", corner: "rear-left" },
    { kind: "corner", corner: "rear-right" },
  ],
};

const PANELS: AnalysisItem = {
  id: "item-panels",
  name: "Wall panel",
  spec: {
    kind: "porous-panel",
    layers: [
      { kind: "porous", thicknessM: 0.1, flowResistivity: 12000, model: "miki" },
      { kind: "air", thicknessM: 0.05 },
    ],
    materialId: "mineral-wool-45",
    widthM: 0.6,
    heightM: 1.2,
    exposedSides: false,
  },
  count: 6,
  unitCost: 85,
  unitMassKg: 6,
  placements: [
    { kind: "surface", surface: "left", uM: 1.6, vM: 1.2 },
    { kind: "surface", surface: "right", uM: 1.6, vM: 1.2 },
    { kind: "surface", surface: "left", uM: 3.4, vM: 1.2 },
    { kind: "surface", surface: "right", uM: 3.4, vM: 1.2 },
    { kind: "surface", surface: "ceiling", uM: 2.0, vM: 2.05 },
    { kind: "surface", surface: "rear", uM: 2.05, vM: 1.2 },
  ],
};

const target = { kind: "small-room", lowerS: 0.2, upperS: 0.4 } as const;

function scenario(id: string, name: string, isBaseline: boolean, items: AnalysisItem[]): ReportScenarioInput {
  const analysis: AnalysisScenario = { target, items };
  return { id, name, isBaseline, notes: "", analysis, results: analyzeScenario(ROOM, analysis) };
}

export const BASELINE = scenario("sc-base", "As built", true, []);
export const PANELS_ONLY = scenario("sc-panels", "Panels only", false, [PANELS]);
export const PANELS_AND_TRAPS = scenario("sc-full", "Panels and corner traps", false, [TRAPS, PANELS]);

export function reportInput(over: Partial<ReportInput> = {}): ReportInput {
  return {
    firm: { name: "Larchmere Room Acoustics", contactEmail: "studio@larchmere.example" },
    project: { name: "Hollis media room", clientName: "Priya Hollis", siteAddress: "14 Alder Row, Westbrook Vale" },
    room: ROOM,
    engineerName: "Tomas Okafor",
    number: "ER-2026-0001",
    revision: 1,
    issuedAt: new Date("2026-12-01T19:30:00Z"),
    paperSize: "A4",
    status: "issued",
    note: "",
    before: BASELINE,
    scenarios: [BASELINE, PANELS_ONLY, PANELS_AND_TRAPS],
    signature: {
      signerName: "Tomas Okafor",
      certificateSubject: "Larchmere Room Acoustics (test signer)",
      certificateFingerprint: "AB:CD:EF:01:23:45:67:89:AB:CD:EF:01:23:45:67:89:AB:CD:EF:01:23:45:67:89:AB:CD:EF:01:23:45:67:89",
      verifyUrl: "http://localhost:3000/verify",
    },
    photos: null,
    ...over,
  };
}
