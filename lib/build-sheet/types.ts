/**
 * Types of lib/build-sheet. SI inside (m, m², m³, kg); prices in the firm's own currency units.
 */

/** A framed porous panel: face W × H, porous slab of the given thickness, optional air gap behind it. */
export interface PanelBuild {
  kind: "panel";
  faceWidthM: number;
  faceHeightM: number;
  insulationThicknessM: number;
  /** air space behind the slab inside the frame, m (default 0) */
  airGapM?: number;
  insulationDensityKgM3: number;
}

/** A porous corner trap of right-isosceles section: perpendicular depth D (face 2D wide, legs D√2), run length ℓ. */
export interface CornerTrapBuild {
  kind: "corner-trap";
  depthM: number;
  lengthM: number;
  orientation: "floor-to-ceiling" | "wall-ceiling";
  insulationDensityKgM3: number;
}

/** A sealed box with a face sheet (plain: membrane; perforated: Helmholtz) over a cavity with porous fill. */
export interface MembraneTrapBuild {
  kind: "membrane-trap";
  faceWidthM: number;
  faceHeightM: number;
  cavityDepthM: number;
  fillThicknessM: number;
  faceSheetThicknessM: number;
  faceSheetDensityKgM3: number;
  insulationDensityKgM3: number;
  /** holes in the face sheet (a perforated-panel / Helmholtz trap); absent for a plain membrane */
  perforation?: { holeDiameterM: number; openAreaRatio: number };
}

/** Any build the sheet knows. */
export type Build = PanelBuild | CornerTrapBuild | MembraneTrapBuild;

/** Frame lumber: section thickness × width, m, and wood density (default 500 kg/m³, softwood, from memory). */
export interface Lumber {
  thicknessM: number;
  widthM: number;
  densityKgM3?: number;
}

/** One frame piece: length and count (per unit, or for a group). */
export interface CutPiece {
  label: string;
  lengthM: number;
  count: number;
}

/** A stock board length and its price. */
export interface StockBoard {
  lengthM: number;
  price?: number;
}

/** A rectangular stock item (insulation slab, sheet): length × width, m. */
export interface StockRect {
  lengthM: number;
  widthM: number;
}

/** The fabric: wrap allowance past the frame's back edge, price and mass per m². */
export interface Fabric {
  wrapM: number;
  pricePerM2?: number;
  /** default 0.3 kg/m² (from memory: a typical woven furnishing fabric) */
  massKgM2?: number;
}

/** Everything a job's sheet needs. */
export interface BuildSheetJob {
  items: { label?: string; build: Build; count: number }[];
  lumber: Lumber;
  stockBoards: StockBoard[];
  /** saw kerf consumed by each cut, m (e.g. 0.003) */
  kerfM: number;
  slab: StockRect & { thicknessM: number; price?: number };
  fabric: Fabric;
  /** face sheet stock for membrane traps (e.g. 2.44 × 1.22 m) */
  sheet?: StockRect & { price?: number };
  fixings?: { screwPrice?: number; cleatPrice?: number; bracketPrice?: number };
}
