/**
 * lib/build-sheet — what a builder needs to make the treatment: frame cut lists packed into stock
 * boards (first-fit decreasing with saw kerf), insulation slabs from the firm's slab size, fabric with
 * wrap allowance, face sheets, fixings by rules of thumb (marked common practice), finished weights,
 * mounting notes, job totals and materials cost, metric or imperial text at the edge, and the safety
 * cautions. Pure TypeScript; bad arguments throw TypeError/RangeError naming the field.
 */
export type { Build, BuildSheetJob, CornerTrapBuild, CutPiece, Fabric, Lumber, MembraneTrapBuild, PanelBuild, StockBoard, StockRect } from "./types";
export { BUILD_SHEET_CAUTIONS } from "./cautions";
export { DEFAULT_FABRIC_MASS_KG_M2, DEFAULT_WOOD_DENSITY_KG_M3 } from "./constants";
export { checkBuild, frameDepthM, framePieces } from "./frame";
export { optimiseCuts, type BoardPlan, type CutPlan } from "./cut-list";
export { piecesPerSheet, triangleLayersPerSlab } from "./stock";
export { fabricCutSize } from "./fabric";
export { buildQuantities, type BuildQuantities } from "./quantities";
export { buildSheet, type BuildSheet, type BuildSheetGroup } from "./build-sheet";
export { presentArea, presentBuildSheet, presentLength, presentMass, type UnitSystem } from "./present";
export { buildSchema, buildSheetJobSchema, cornerTrapBuildSchema, membraneTrapBuildSchema, panelBuildSchema, type BuildSheetJobRequest } from "./schemas";
