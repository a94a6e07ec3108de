"use client";

import { useCallback, type ReactNode } from "react";
import type { PlotTable } from "@/lib/plots";
import { cn } from "@/components/ui/cn";
import { PlotExportMenu } from "./plot-export-menu";
import { useElementWidth } from "./use-element-width";
import { DataTable } from "./data-table";

/** Props of {@link PlotFrame}. */
export interface PlotFrameProps<G extends { table: PlotTable }> {
  title: string;
  /** unit note beside the title, e.g. "dB, relative to the mean" */
  units?: string;
  /** figure caption below the plot */
  caption?: ReactNode;
  /** the plot's geometry at a measured width, px; its `table` feeds the screen-reader table and CSV */
  geometry: (widthPx: number) => G;
  /** draws the plot from its geometry */
  children: (geometry: G) => ReactNode;
  /** width before measuring (server rendering), px */
  fallbackWidth?: number;
  /** hide the download buttons */
  noExport?: boolean;
  className?: string;
}

/**
 * A plot's figure: title with units, download buttons, the drawing at the container's width (ResizeObserver,
 * with a fallback width for server rendering), caption, and a visually hidden data table for screen readers.
 * The drawing's <svg> carries role="img" and an aria-label with the summary.
 */
export function PlotFrame<G extends { table: PlotTable }>({ title, units, caption, geometry, children, fallbackWidth, noExport, className }: PlotFrameProps<G>) {
  const [ref, width] = useElementWidth<HTMLDivElement>(fallbackWidth);
  // One geometry per render: the drawing and its data table come from the same computation.
  const g = geometry(width);
  const table = g.table;
  const getSvg = useCallback(() => ref.current?.querySelector<SVGSVGElement>("svg[data-plot-root]") ?? null, [ref]);
  return (
    <figure className={cn("rounded-[10px] border border-paper-line bg-paper-raised p-4 break-inside-avoid print:border-0 print:p-0", className)}>
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <div className="min-w-0">
          <h3 className="font-sans text-sm font-semibold text-ink">{title}</h3>
          {units && <p className="text-xs text-ink-soft">{units}</p>}
        </div>
        {!noExport && <PlotExportMenu title={title} getSvg={getSvg} table={table} />}
      </div>
      <div ref={ref} className="relative w-full">
        {children(g)}
      </div>
      {caption && <figcaption className="mt-2 max-w-prose text-xs leading-relaxed text-ink-soft">{caption}</figcaption>}
      <DataTable title={title} table={table} />
    </figure>
  );
}
