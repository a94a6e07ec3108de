// The invented demo world. No real people, firms, addresses or products.
import type { Role } from "./schema";

export interface DemoAccount {
  role: Role;
  email: string;
  password: string;
  name: string;
}

export const DEMO_FIRM = { name: "Larchmere Room Acoustics", contactEmail: "studio@larchmere.example" } as const;

export const DEMO_ACCOUNTS: DemoAccount[] = [
  { role: "owner", email: "owner@larchmere.example", password: "demo-owner-pass", name: "Ines Marlowe" },
  { role: "engineer", email: "engineer@larchmere.example", password: "demo-engineer-pass", name: "Tomas Okafor" },
  { role: "builder", email: "builder@larchmere.example", password: "demo-builder-pass", name: "Rafe Lindqvist" },
  { role: "client", email: "client@larchmere.example", password: "demo-client-pass", name: "Priya Hollis" },
  { role: "client", email: "client2@larchmere.example", password: "demo-client2-pass", name: "Jonah Vale" },
];

export interface DemoRoom {
  name: string;
  lengthM: number;
  widthM: number;
  heightM: number;
  temperatureC: number;
  humidityPct: number;
  notes: string;
}

export interface DemoProject {
  name: string;
  clientEmail: string;
  clientName: string;
  siteAddress: string;
  status: "survey" | "design" | "build" | "delivered" | "closed";
  notes: string;
  builderAssigned: boolean;
  rooms: DemoRoom[];
}

export const DEMO_PROJECTS: DemoProject[] = [
  {
    name: "Hollis media room",
    clientEmail: "client@larchmere.example",
    clientName: "Priya Hollis",
    siteAddress: "14 Alder Row, Westbrook Vale",
    status: "design",
    notes: "Basement media room, two rows of seats. The client accepts up to 30 cm of depth on the rear wall.",
    builderAssigned: true,
    rooms: [
      { name: "Media room", lengthM: 5.8, widthM: 4.1, heightM: 2.5, temperatureC: 20, humidityPct: 45, notes: "Drywall on studs, carpet on pad, one door at the rear left." },
    ],
  },
  {
    name: "Vale home studio",
    clientEmail: "client2@larchmere.example",
    clientName: "Jonah Vale",
    siteAddress: "3 Quarry Lane, Upper Fenwick",
    status: "survey",
    notes: "Converted garage: mixing room and a small vocal booth.",
    builderAssigned: false,
    rooms: [
      { name: "Mix room", lengthM: 4.6, widthM: 3.6, heightM: 2.6, temperatureC: 21, humidityPct: 50, notes: "Concrete floor, plasterboard walls." },
      { name: "Vocal booth", lengthM: 2.1, widthM: 1.8, heightM: 2.4, temperatureC: 21, humidityPct: 50, notes: "" },
    ],
  },
];

// ---------------------------------------------------------------------------------------------
// The rooms' workspaces (issue 5): surfaces, seats, sources, scenarios with treatment, and the firm's
// build library. Invented designs; unit costs in the firm's currency, typical of the small-room trade
// (common practice, from memory), masses estimated from the fill's nominal density plus a timber frame.
// Every value here is parsed with the shared schemas of lib/schemas/workspace.ts when seeded.

const FINISH = (finishId: string) => ({ kind: "finish" as const, finishId });

/** Light mineral wool, σ ≈ 10 kPa·s/m² (lib/porous POROUS_MATERIALS mineral-wool-35, typical value). */
const WOOL_35 = { flowResistivity: 10_000, materialId: "mineral-wool-35" } as const;
/** Medium mineral wool, σ ≈ 15 kPa·s/m² (mineral-wool-45). */
const WOOL_45 = { flowResistivity: 15_000, materialId: "mineral-wool-45" } as const;

export const DEMO_BUILDS = [
  {
    name: "Wall panel, 100 mm light wool",
    spec: { kind: "porous-panel", layers: [{ kind: "porous", thicknessM: 0.1, flowResistivity: WOOL_35.flowResistivity, model: "miki" }], materialId: WOOL_35.materialId },
    notes: "Timber frame, breathable fabric face, hung flat on the wall. Broadband from about 200 Hz up.",
  },
  {
    name: "Ceiling cloud, 50 mm on 100 mm gap",
    spec: {
      kind: "porous-panel",
      layers: [
        { kind: "porous", thicknessM: 0.05, flowResistivity: WOOL_45.flowResistivity, model: "miki" },
        { kind: "air", thicknessM: 0.1 },
      ],
      materialId: WOOL_45.materialId,
    },
    notes: "Hung 100 mm below the ceiling on four wires into the joists.",
  },
  {
    name: "Corner trap, 350 mm deep",
    spec: { kind: "corner-trap", depthM: 0.35, orientation: "floor-to-ceiling", flowResistivity: WOOL_35.flowResistivity, model: "miki", materialId: WOOL_35.materialId },
    notes: "Triangular stack of light wool slabs behind a fabric face, floor to ceiling.",
  },
  {
    name: "Membrane trap, 12 mm board on 100 mm",
    spec: { kind: "membrane", massKgM2: 9, cavityDepthM: 0.1, resistanceRatio: 0.2 },
    notes: "Sealed box, 12 mm board face (about 9 kg/m²), light wool loosely in the cavity; tuned near 63 Hz.",
  },
] as const;

export interface DemoWorkspace {
  /** room name within its project */
  room: string;
  surfaces: { surface: "front" | "rear" | "left" | "right" | "floor" | "ceiling"; finish: { kind: "finish"; finishId: string }; openings?: unknown[] }[];
  positions: Record<string, unknown>[];
  scenarios: { name: string; notes: string; target?: unknown; items: Record<string, unknown>[] }[];
}

const walls = (finishId: string) => (["front", "rear", "left", "right"] as const).map((surface) => ({ surface, finish: FINISH(finishId) }));

const wallPanel = (name: string, surface: "left" | "right" | "rear", centres: [number, number][]) => ({
  name,
  spec: { kind: "porous-panel", layers: DEMO_BUILDS[0].spec.layers, materialId: WOOL_35.materialId, widthM: 0.6, heightM: 1.2, exposedSides: false },
  count: centres.length,
  placements: centres.map(([uM, vM]) => ({ kind: "surface", surface, uM, vM })),
  unitCost: 95,
  unitMassKg: 4.5,
  notes: "",
  buildName: DEMO_BUILDS[0].name,
});

// Hollis media room: seats at x = 3.2 m (front row, main seat on the centre line) and 4.6 m; mains at
// the front; first reflection points of the main seat from the mains by mirror images (left and right
// walls near x = 1.28 m and 2.07 m; ceiling at x ≈ 1.78 m).
const HOLLIS_PANELS = [
  wallPanel("Side-wall panels, left", "left", [[1.28, 1.2], [2.07, 1.2]]),
  wallPanel("Side-wall panels, right", "right", [[1.28, 1.2], [2.07, 1.2]]),
  wallPanel("Rear-wall panels", "rear", [[1.6, 1.2], [2.65, 1.2]]),
  {
    name: "Ceiling clouds",
    spec: { kind: "porous-panel", layers: DEMO_BUILDS[1].spec.layers, materialId: WOOL_45.materialId, widthM: 1.2, heightM: 0.6, exposedSides: true },
    count: 2,
    placements: [
      { kind: "surface", surface: "ceiling", uM: 1.78, vM: 1.52 },
      { kind: "surface", surface: "ceiling", uM: 1.78, vM: 2.58 },
    ],
    unitCost: 120,
    unitMassKg: 3.5,
    buildName: DEMO_BUILDS[1].name,
    notes: "First reflection points of the main seat on the ceiling.",
  },
];

const HOLLIS_TRAPS = {
  name: "Corner traps",
  spec: { kind: "corner-trap", depthM: 0.35, lengthM: 2.5, orientation: "floor-to-ceiling", flowResistivity: WOOL_35.flowResistivity, model: "miki", materialId: WOOL_35.materialId },
  count: 4,
  placements: (["front-left", "front-right", "rear-left", "rear-right"] as const).map((corner) => ({ kind: "corner", corner })),
  unitCost: 320,
  unitMassKg: 19,
  buildName: DEMO_BUILDS[2].name,
  notes: "The front-left trap stands behind the subwoofer.",
};

export const DEMO_WORKSPACES: DemoWorkspace[] = [
  {
    room: "Media room",
    surfaces: [
      ...walls("painted-drywall-on-studs").map((s) =>
        s.surface === "rear" ? { ...s, openings: [{ kind: "door", label: "Door", uM: 0.2, vM: 0, widthM: 0.9, heightM: 2.03, finishId: "wood-door" }] } : s,
      ),
      { surface: "floor", finish: FINISH("carpet-on-pad") },
      { surface: "ceiling", finish: FINISH("painted-drywall-on-studs") },
    ],
    positions: [
      { kind: "seat", name: "Front centre", xM: 3.2, yM: 2.05, zM: 1.1, isMain: true },
      { kind: "seat", name: "Front left", xM: 3.2, yM: 1.45, zM: 1.1 },
      { kind: "seat", name: "Front right", xM: 3.2, yM: 2.65, zM: 1.1 },
      { kind: "seat", name: "Back left", xM: 4.6, yM: 1.7, zM: 1.15 },
      { kind: "seat", name: "Back right", xM: 4.6, yM: 2.4, zM: 1.15 },
      { kind: "main-speaker", name: "Front left speaker", xM: 0.35, yM: 1.0, zM: 1.1, drivesBass: false },
      { kind: "main-speaker", name: "Front right speaker", xM: 0.35, yM: 3.1, zM: 1.1, drivesBass: false },
      { kind: "subwoofer", name: "Front subwoofer", xM: 0.3, yM: 0.35, zM: 0.3, delayMs: 0, polarity: 1 },
      { kind: "subwoofer", name: "Rear subwoofer", xM: 5.5, yM: 2.05, zM: 0.3, delayMs: 0, polarity: 1 },
    ],
    scenarios: [
      {
        name: "Panels at reflection points",
        notes: "Eight panels: the side-wall and ceiling first reflection points of the main seat, and two on the rear wall behind the back row.",
        items: HOLLIS_PANELS,
      },
      {
        name: "Panels and corner traps",
        notes: "The same eight panels, plus four floor-to-ceiling corner traps for the low end.",
        items: [...HOLLIS_PANELS, HOLLIS_TRAPS],
      },
    ],
  },
  {
    room: "Mix room",
    surfaces: [...walls("painted-drywall-on-studs"), { surface: "floor", finish: FINISH("concrete-poured") }, { surface: "ceiling", finish: FINISH("painted-drywall-on-studs") }],
    positions: [
      { kind: "seat", name: "Mix position", xM: 1.75, yM: 1.8, zM: 1.2, isMain: true },
      { kind: "main-speaker", name: "Left monitor", xM: 0.6, yM: 1.1, zM: 1.2 },
      { kind: "main-speaker", name: "Right monitor", xM: 0.6, yM: 2.5, zM: 1.2 },
    ],
    scenarios: [],
  },
  {
    room: "Vocal booth",
    surfaces: [...walls("painted-drywall-on-studs"), { surface: "floor", finish: FINISH("vinyl-on-concrete") }, { surface: "ceiling", finish: FINISH("painted-drywall-on-studs") }],
    positions: [
      { kind: "seat", name: "Singer", xM: 1.2, yM: 0.9, zM: 1.6, isMain: true },
      { kind: "main-speaker", name: "Talkback speaker", xM: 0.25, yM: 0.9, zM: 1.4 },
    ],
    scenarios: [],
  },
];

// ---------------------------------------------------------------------------------------------
// The firm's price list for build sheets (issue 6): invented prices in the firm's currency, stock
// sizes as a timber merchant and an insulation supplier typically sell them (common practice).
export const DEMO_PRICE_LIST = {
  currency: "EUR",
  lumber: {
    thicknessM: 0.019,
    widthM: 0.15,
    densityKgM3: 500,
    basis: "per-board" as const,
    pricePerM: 3.1,
    boards: [
      { lengthM: 2.4, price: 7.4 },
      { lengthM: 3.0, price: 9.2 },
    ],
  },
  kerfM: 0.003,
  slab: {
    standard: "metric" as const,
    lengthM: 1.2,
    widthM: 0.6,
    prices: [
      { thicknessM: 0.05, price: 3.9 },
      { thicknessM: 0.1, price: 7.6 },
    ],
  },
  fabric: { pricePerM2: 11.5, wrapM: 0.05 },
  sheet: { lengthM: 2.44, widthM: 1.22, price: 24 },
  fixings: { screwPrice: 0.06, cleatPrice: 4.5, bracketPrice: 2.8 },
};
