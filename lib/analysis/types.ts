import type { BandVerdict } from "@/lib/reverb";
import type { ItemSpec, Opening, Placement, PositionKind, ScenarioTarget, SurfaceFinish, SurfaceId } from "@/lib/schemas/workspace";

/** A seat (listening position), m, in the room's coordinates (lib/schemas/workspace.ts). */
export interface AnalysisSeat {
  id: string;
  name: string;
  xM: number;
  yM: number;
  zM: number;
  isMain: boolean;
}

/** A source (main speaker or subwoofer), m; delay in ms, polarity ±1. */
export interface AnalysisSource {
  id: string;
  name: string;
  kind: Exclude<PositionKind, "seat">;
  xM: number;
  yM: number;
  zM: number;
  delayMs: number;
  polarity: 1 | -1;
  drivesBass: boolean;
}

/** Everything about the room that the analysis reads (the first argument of analyzeScenario). */
export interface AnalysisRoom {
  lengthM: number;
  widthM: number;
  heightM: number;
  temperatureC: number;
  humidityPct: number;
  /** The six surfaces, each once. */
  surfaces: { surface: SurfaceId; finish: SurfaceFinish; openings: readonly Opening[] }[];
  seats: AnalysisSeat[];
  sources: AnalysisSource[];
}

/** One treatment item of a scenario. */
export interface AnalysisItem {
  id: string;
  name: string;
  spec: ItemSpec;
  count: number;
  unitCost: number;
  unitMassKg: number | null;
  placements: readonly Placement[];
}

/** The scenario's own inputs (the second argument of analyzeScenario). */
export interface AnalysisScenario {
  target: ScenarioTarget;
  items: AnalysisItem[];
}

export type CautionCode = "fibres" | "fire" | "heavy" | "overhead" | "topple";

/** A caution the screens show beside the item it concerns. */
export interface Caution {
  itemId: string | null;
  code: CautionCode;
  message: string;
}

/** Reverberation times per octave band, s (aligned with ScenarioResults.reverb.bandsHz). */
export interface RtPair {
  sabineS: number[];
  eyringS: number[];
}

/** One item's share of the treatment. */
export interface ItemResult {
  id: string;
  name: string;
  kind: ItemSpec["kind"];
  count: number;
  cost: number;
  /** Sabine absorption area of all units per octave band, m² */
  absorptionM2: number[];
  /** false where a porous layer is outside its model's fitted range */
  withinModelRange: boolean[];
  /** true for the membrane / perforated estimates (lumped model with an assumed resistance) */
  estimate: boolean;
  resonanceHz: number | null;
  usefulDownToHz: number | null;
  limits: string[];
}

/** What analyzeScenario returns and what is stored on the scenario row (JSON). */
export interface ScenarioResults {
  engineVersion: string;
  inputsHash: string;
  room: { volumeM3: number; surfaceAreaM2: number; speedOfSound: number };
  modes: {
    maxFrequencyHz: number;
    counts: { axial: number; tangential: number; oblique: number; total: number };
    /** 2000 √(T/V) with T = mean Eyring time of the 500 and 1000 Hz bands with this treatment; null without a reverb result */
    schroederHz: number | null;
    bonello: { passes: boolean; verdict: string; decreasingBandsHz: number[]; coincidenceFailuresHz: number[] };
    ratio: { passes: boolean; verdict: string; lengthToHeight: number; widthToHeight: number };
    /** Modes up to maxFrequencyHz, ascending; coincidence judged with the effective low-frequency RT */
    table: { nx: number; ny: number; nz: number; frequencyHz: number; kind: "axial" | "tangential" | "oblique"; coincident: boolean; wideGapBelow: boolean }[];
    tableTruncated: boolean;
    bandwidthHz: number;
    verdict: string;
  };
  reverb: null | {
    bandsHz: number[];
    /** The room as finished, without this scenario's items */
    untreated: RtPair;
    /** With this scenario's items */
    treated: RtPair;
    /** Absorption area of the surfaces per band, m² */
    surfacesM2: number[];
    /** Absorption area added by the items per band, m² */
    addedM2: number[];
    target: ScenarioTarget;
    /** Per band, judged on the treated Eyring time */
    comparison: { targetS: number; lowerS: number; upperS: number; predictedS: number; deviationS: number; excessS: number; verdict: BandVerdict }[];
    /** Absorption area to add per band to reach the target time, m² (0 when at or below it; Eyring) */
    toAddM2: number[];
    /** Absorption area by which the room already exceeds what the target time needs, m² */
    surplusM2: number[];
    notes: string[];
  };
  lowFrequency: null | {
    /** RT60 used in the modal sum, s, and how it was found */
    effectiveRt60S: number;
    effectiveRt60Basis: string;
    frequenciesHz: number[];
    maxModeFrequencyHz: number;
    sourceIds: string[];
    /** Level per frequency at each seat, dB (common offset, arbitrary but the same for every scenario of a room) */
    seats: { id: string; name: string; isMain: boolean; levelsDb: number[]; spreadDb: number }[];
    spreadBandHz: { lowHz: number; highHz: number };
    note: string;
  };
  items: { count: number; cost: number; byItem: ItemResult[] };
  cautions: Caution[];
  notes: string[];
}
