"use client";

import { useState } from "react";
import { toCsv, type PlotTable } from "@/lib/plots";
import { downloadCsv, downloadPng, downloadSvg } from "./export-image";

/** Props of {@link PlotExportMenu}. */
export interface PlotExportMenuProps {
  /** plot title: the file names come from it */
  title: string;
  /** the plot's root <svg>, looked up when a download starts */
  getSvg: () => SVGSVGElement | null;
  /** the data behind the plot, written as CSV */
  table: PlotTable;
}

const button =
  "rounded px-2 py-1 text-xs font-medium text-ink-soft hover:bg-paper-sunk hover:text-ink disabled:cursor-wait disabled:text-ink-faint";

/** Download buttons for a plot: PNG (2×), SVG and CSV. Hidden in print. */
export function PlotExportMenu({ title, getSvg, table }: PlotExportMenuProps) {
  const [busy, setBusy] = useState<null | "png" | "svg">(null);
  const [error, setError] = useState<string | null>(null);
  const run = async (kind: "png" | "svg") => {
    const svg = getSvg();
    if (!svg) return;
    setBusy(kind);
    setError(null);
    try {
      await (kind === "png" ? downloadPng(svg, title) : downloadSvg(svg, title));
    } catch {
      setError(`The ${kind.toUpperCase()} could not be made in this browser; try SVG or CSV.`);
    } finally {
      setBusy(null);
    }
  };
  return (
    <div className="no-print flex items-center gap-1 print:hidden" role="group" aria-label={`Download ${title}`}>
      <span className="mr-1 text-xs text-ink-faint">Download</span>
      <button type="button" className={button} disabled={busy !== null} onClick={() => run("png")} aria-label={`Download ${title} as PNG image`}>
        {busy === "png" ? "PNG…" : "PNG"}
      </button>
      <button type="button" className={button} disabled={busy !== null} onClick={() => run("svg")} aria-label={`Download ${title} as SVG drawing`}>
        {busy === "svg" ? "SVG…" : "SVG"}
      </button>
      <button type="button" className={button} onClick={() => downloadCsv(toCsv(table), title)} aria-label={`Download the data of ${title} as CSV`}>
        CSV
      </button>
      {error && (
        <span role="alert" className="ml-2 text-xs text-outside">
          {error}
        </span>
      )}
    </div>
  );
}
