import type { AnalysisRoom, AnalysisScenario, ScenarioResults } from "@/lib/analysis";

export type ReportPaperSize = "A4" | "LETTER";

/** One scenario as the report reads it: its inputs and the results of lib/analysis analyzeScenario. */
export interface ReportScenarioInput {
  id: string;
  name: string;
  isBaseline: boolean;
  notes: string;
  analysis: AnalysisScenario;
  results: ScenarioResults;
}

/** A photo of the room for the report (uploads fill this later; null or [] leaves the section out). */
export interface ReportPhoto {
  caption: string;
  /** PNG or JPEG bytes */
  data: Buffer;
  format: "png" | "jpg";
}

/** Everything a report is made from. Numbers arrive as lib/analysis results; nothing is computed twice. */
export interface ReportInput {
  firm: { name: string; contactEmail: string | null };
  project: { name: string; clientName: string; siteAddress: string };
  room: AnalysisRoom & { name: string };
  engineerName: string;
  number: string;
  revision: number;
  issuedAt: Date;
  paperSize: ReportPaperSize;
  /** "draft" renders a preview marked as not issued */
  status: "draft" | "issued";
  note: string;
  /** the untreated room (the baseline scenario, or an analysis without items) */
  before: ReportScenarioInput;
  /** the scenarios chosen for the report, in order; the last is the recommendation */
  scenarios: ReportScenarioInput[];
  /** who signs and how to check; null for a draft preview */
  signature: { signerName: string; certificateSubject: string; certificateFingerprint: string; verifyUrl: string } | null;
  photos: ReportPhoto[] | null;
}
