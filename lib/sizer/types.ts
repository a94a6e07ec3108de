import type { Build } from "@/lib/build-sheet";
import type { BandVerdict, ReverbTarget, RoomSurface } from "@/lib/reverb";

/** A porous fill: airflow resistivity σ (Pa·s/m²), bulk density, impedance model. */
export interface FillMaterial {
  flowResistivity: number;
  densityKgM3: number;
  model: "delany-bazley" | "miki";
}

/**
 * A candidate build the sizer may propose. Floor-to-ceiling corner traps take the room height as their
 * length; wall–ceiling traps come in segments of `segmentLengthM` along the free edges.
 */
export type Candidate =
  | { id: string; name: string; kind: "corner-trap"; orientation: "floor-to-ceiling"; depthM: number; fill: FillMaterial }
  | { id: string; name: string; kind: "corner-trap"; orientation: "wall-ceiling"; depthM: number; segmentLengthM: number; fill: FillMaterial }
  | { id: string; name: string; kind: "panel"; faceWidthM: number; faceHeightM: number; insulationThicknessM: number; airGapM: number; fill: FillMaterial }
  | {
      id: string;
      name: string;
      kind: "membrane-trap";
      faceWidthM: number;
      faceHeightM: number;
      cavityDepthM: number;
      fillThicknessM: number;
      sheet: { thicknessM: number; densityKgM3: number };
      /** series resistance over ρ₀c assumed for the estimate (see lib/porous resonatorAbsorptionEstimate) */
      resistanceRatio: number;
      fill: FillMaterial;
      /** present for a perforated-panel (Helmholtz) trap */
      perforation?: { holeDiameterM: number; openAreaRatio: number };
    };

/** Where a candidate goes. */
export type Placement = "vertical-corner" | "ceiling-edge" | "wall";

/** Prices per material (the firm's currency); a unit's cost is its quantities at these prices, pro rata. */
export interface MaterialPrices {
  lumberPerM3: number;
  insulationPerM3: number;
  fabricPerM2: number;
  sheetPerM2: number;
  screwEach: number;
  cleatEach: number;
  bracketEach: number;
}

export type VerticalCorner = "front-left" | "front-right" | "rear-left" | "rear-right";
export type CeilingEdge = "front" | "rear" | "left" | "right";

/** What the user allows. */
export interface SizerLimits {
  /** how far any item may stand out from the wall it is fixed to, m (a corner trap: its leg D·√2) */
  maxDepthM: number;
  /** floor-to-ceiling corners free for traps (at most the four) */
  verticalCorners: readonly VerticalCorner[];
  /** wall–ceiling edges free for traps, with their free lengths, m */
  ceilingEdges: readonly { edge: CeilingEdge; lengthM: number }[];
  /** wall area free for panels and membrane traps, m² */
  wallAreaM2: number;
  budget?: number;
  maxItems?: number;
}

export type SizerObjective = "depth" | "count" | "cost";

/** Input of {@link sizeTreatment}. */
export interface SizerInput {
  room: { lengthM: number; widthM: number; heightM: number };
  surfaces: readonly RoomSurface[];
  temperatureC?: number;
  relativeHumidityPct?: number;
  formula?: "sabine" | "eyring";
  /** absorption area the scenario's treatment already adds, m², one per octave band 63…8000 Hz */
  currentTreatmentM2?: readonly number[];
  target: ReverbTarget;
  /** size to the nominal target time (default) or to the upper edge of its allowed band */
  aim?: "target" | "upper-edge";
  objective: SizerObjective;
  limits: SizerLimits;
  catalogue?: readonly Candidate[];
  prices?: MaterialPrices;
  /** optional: the main speaker (or subwoofer) and seat, for the modal response before and after */
  seat?: { source: readonly [number, number, number]; receiver: readonly [number, number, number] };
}

/** A candidate as evaluated for this room. */
export interface EvaluatedCandidate {
  id: string;
  name: string;
  kind: Candidate["kind"];
  placement: Placement;
  build: Build;
  depthM: number;
  projectionM: number;
  /** wall area one unit takes (wall placement), m² */
  wallAreaM2: number;
  /** how many fit the free corners / edges / wall area */
  capacity: number;
  unitCost: number;
  unitWeightKg: number;
  /** absorption area of one unit per octave band 63…8000 Hz, m² */
  unitAbsorptionM2: number[];
  method: string;
  allowed: boolean;
  excludedBecause?: string;
}

/** One proposed item group. */
export interface ProposedItem {
  candidateId: string;
  name: string;
  kind: Candidate["kind"];
  placement: Placement;
  count: number;
  where: string[];
  depthM: number;
  projectionM: number;
  unitCost: number;
  cost: number;
  unitWeightKg: number;
  weightKg: number;
  addedM2: number[];
  build: Build;
}

/** One octave band of the result. */
export interface SizerBand {
  nominalHz: number;
  frequencyHz: number;
  sized: boolean;
  beforeS: number;
  afterS: number;
  targetS: number;
  lowerS: number;
  upperS: number;
  verdictBefore: BandVerdict;
  verdictAfter: BandVerdict;
  /** area to add to reach the aim, m² */
  neededM2: number;
  addedM2: number;
  /** area still missing after the proposal, m² */
  missingM2: number;
}

export type BindingLimit = "depth" | "vertical-corners" | "ceiling-edges" | "wall-area" | "budget" | "max-items" | "over-damping" | "catalogue";

/** Result of {@link sizeTreatment}. */
export interface SizerResult {
  objective: SizerObjective;
  aim: "target" | "upper-edge";
  items: ProposedItem[];
  bands: SizerBand[];
  addedM2: number[];
  reached: boolean;
  binding: { limit: BindingLimit; message: string }[];
  totals: { count: number; cost: number; weightKg: number; maxProjectionM: number; wallAreaM2: number; verticalCorners: number; ceilingSegments: number };
  reasons: string[];
  schroederFrequencyHz: number;
  caveat: string;
  modal?: { frequenciesHz: number[]; beforeDb: number[]; afterDb: number[]; beforeSpreadDb: number; afterSpreadDb: number; note: string };
  candidates: EvaluatedCandidate[];
  search: { method: string; nodes: number; combinations: number };
  notes: string[];
}
