/**
 * lib/report — the signed room report: pure data shaping (model.ts: every figure from lib/analysis
 * results, plots as lib/plots geometry) and the react-pdf document (server-side rendering).
 */
export type { ReportInput, ReportPaperSize, ReportPhoto, ReportScenarioInput } from "./types";
export { buildReportModel, peakAndDip, type BuildSheetEntry, type ReportModel, type ReportTable } from "./model";
export { planGeometry, type PlanGeometry } from "./plan";
export { bandLabel, fixed, longDate, longDateTime, money, signed, withUnit } from "./format";
export { CAUTIONS, DISCLAIMER, METHODS } from "./texts";
