import { renderToBuffer } from "@react-pdf/renderer";
import { buildReportModel, type ReportModel } from "./model";
import { registerReportFonts } from "./pdf/fonts";
import { ReportDocument } from "./pdf/document";
import type { ReportInput } from "./types";

/** Number of pages of a PDF made by react-pdf (its page tree's /Count). */
export function pdfPageCount(pdf: Buffer): number {
  const m = [...pdf.toString("latin1").matchAll(/\/Type\s*\/Pages\b[^>]*?\/Count\s+(\d+)/g)];
  const alt = [...pdf.toString("latin1").matchAll(/\/Count\s+(\d+)/g)];
  const v = m.at(-1)?.[1] ?? alt.at(-1)?.[1];
  if (!v) throw new RangeError("the PDF has no page tree");
  return Number(v);
}

/** Renders the report model to PDF bytes (server side; react-pdf with the app's fonts). */
export async function renderModel(model: ReportModel): Promise<Buffer> {
  registerReportFonts();
  return renderToBuffer(<ReportDocument m={model} />);
}

/** Shapes and renders a report; returns the model too (its figures are what the tests compare). */
export async function renderReport(input: ReportInput): Promise<{ pdf: Buffer; model: ReportModel; pageCount: number }> {
  const model = buildReportModel(input);
  const pdf = await renderModel(model);
  return { pdf, model, pageCount: pdfPageCount(pdf) };
}
