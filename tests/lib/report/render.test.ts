// The report renders (A4 and US Letter) and its extracted text (pdftotext, poppler-utils) holds the
// figures of the analysis; pages carry "Page n of N".
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { bandLabel } from "@/lib/report";
import { renderReport } from "@/lib/report/render";
import { reportInput } from "./fixture";

function pdfText(pdf: Buffer): { text: string; info: string } {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "er-report-"));
  const file = path.join(dir, "r.pdf");
  fs.writeFileSync(file, pdf);
  return { text: execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" }), info: execFileSync("pdfinfo", [file], { encoding: "utf8" }) };
}

const squash = (s: string) => s.replace(/[\u00a0\u202f]/g, " ").replace(/\s+/g, " ");

describe("renderReport", () => {
  it("renders A4 with the figures of the analysis in its text", async () => {
    const { pdf, model, pageCount } = await renderReport(reportInput());
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    const { text, info } = pdfText(pdf);
    expect(info).toMatch(/Page size:\s+595(\.\d+)? x 841(\.\d+)? pts \(A4\)/);
    expect(info).toMatch(new RegExp(`Pages:\\s+${pageCount}\\b`));
    expect(pageCount).toBeGreaterThanOrEqual(8);
    const flat = squash(text);
    for (const key of ["lf.spreadBefore", "lf.spreadAfter", "lf.schroeder", "room.volume", "costs.total", "lf.firstMode", "summary.worstBefore", "summary.worstAfter"]) {
      expect(flat, key).toContain(squash(model.figures[key]!));
    }
    // The decay table prints each band's before and after times (the unit is in the column head).
    for (const f of [63, 125, 250, 500, 1000, 2000, 4000, 8000]) {
      const before = model.figures[`rt.before.${f}`]!.replace(/\s*s$/, "");
      const after = model.figures[`rt.after.${f}`]!.replace(/\s*s$/, "");
      expect(flat, `${f} Hz`).toContain(squash(`${bandLabel(f)} ${before} ${after}`));
    }
    expect(flat).toContain("ER-2026-0001");
    expect(flat).toContain(`Page ${pageCount} of ${pageCount}`);
    expect(flat).toMatch(/licensed professionals/);
    expect(flat).toMatch(/Schroeder frequency/);
  }, 60_000);

  it("renders US Letter", async () => {
    const { pdf } = await renderReport(reportInput({ paperSize: "LETTER" }));
    expect(pdfText(pdf).info).toMatch(/Page size:\s+612 x 792 pts \(letter\)/);
  }, 60_000);

  it("marks a draft on its pages", async () => {
    const { pdf } = await renderReport(reportInput({ status: "draft", signature: null }));
    expect(squash(pdfText(pdf).text)).toMatch(/DRAFT/);
  }, 60_000);
});
