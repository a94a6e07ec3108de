"use client";

import { useState, type CSSProperties, type KeyboardEvent, type PointerEvent, type ReactNode } from "react";
import { INK, nearestIndex, type Rect } from "@/lib/plots";

/** One line of a read-out. */
export interface ReadoutRow {
  label: string;
  value: string;
  /** swatch colour and dash of the series */
  colour?: string;
  dash?: string;
  /** px in plot-area coordinates of the point on the crosshair (draws a ring there) */
  y?: number;
}

/** What a read-out shows at one position. */
export interface Readout {
  heading: string;
  rows: ReadoutRow[];
}

/** Props of {@link HoverReadout}. */
export interface HoverReadoutProps {
  /** the plot area within the SVG, px */
  area: Rect;
  /** x positions of the read-out points, px in plot-area coordinates, ascending */
  positions: readonly number[];
  /** the read-out at position index i */
  describe: (index: number) => Readout;
  /** accessible name, e.g. "Read-out of modal response; arrow keys move along frequency" */
  label: string;
}

/** The value box shared by every plot's read-out. */
export function ReadoutBox({ readout, side, style }: { readout: Readout; side: "left" | "right"; style?: CSSProperties }) {
  return (
    <div
      className={`pointer-events-none absolute z-10 min-w-32 rounded-md border border-paper-line bg-paper-raised/95 px-2.5 py-1.5 text-xs text-ink shadow-[0_2px_8px_rgba(31,35,40,0.12)] tabular-nums ${side === "left" ? "-translate-x-full" : ""}`}
      style={style}
    >
      <div className="mb-0.5 font-semibold">{readout.heading}</div>
      {readout.rows.map((r, i) => (
        <div key={i} className="flex items-center gap-2 whitespace-nowrap">
          {r.colour && (
            <svg width="18" height="6" aria-hidden="true" className="shrink-0">
              <line x1="0" x2="18" y1="3" y2="3" stroke={r.colour} strokeWidth="2" strokeDasharray={r.dash || undefined} />
            </svg>
          )}
          <span className="text-ink-soft">{r.label}</span>
          <span className="ml-auto pl-3 font-medium">{r.value}</span>
        </div>
      ))}
    </div>
  );
}

/** Screen-reader text of a read-out. */
export function readoutText(r: Readout): string {
  return `${r.heading}: ${r.rows.map((x) => `${x.label} ${x.value}`).join("; ")}`;
}

/**
 * Crosshair and value box over a plot area. Pointer: the nearest point to the pointer (binary search on x).
 * Keyboard: focus the plot, then ← → move one point, Home/End jump to the ends, PageUp/PageDown move ten,
 * Escape hides. The layer is an HTML overlay (role="slider"), so it never ends up in an export.
 */
export function HoverReadout({ area, positions, describe, label }: HoverReadoutProps) {
  const [index, setIndex] = useState<number | null>(null);
  const n = positions.length;
  const onPointer = (e: PointerEvent<HTMLDivElement>) => {
    const box = e.currentTarget.getBoundingClientRect();
    const i = nearestIndex(positions, e.clientX - box.left);
    if (i !== undefined) setIndex(i);
  };
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    if (n === 0) return;
    const cur = index ?? 0;
    const moves: Record<string, number> = { ArrowRight: cur + 1, ArrowUp: cur + 1, ArrowLeft: cur - 1, ArrowDown: cur - 1, Home: 0, End: n - 1, PageUp: cur + 10, PageDown: cur - 10 };
    if (e.key === "Escape") { setIndex(null); return; }
    const next = moves[e.key];
    if (next === undefined) return;
    e.preventDefault();
    setIndex(index === null && e.key.startsWith("Arrow") ? cur : Math.max(0, Math.min(n - 1, next)));
  };
  const active = index !== null && index < n ? index : null;
  const readout = active !== null ? describe(active) : null;
  const x = active !== null ? positions[active]! : 0;
  let overlay: ReactNode = null;
  if (readout) {
    overlay = (
      <>
        <svg className="pointer-events-none absolute inset-0 overflow-visible" width={area.width} height={area.height} aria-hidden="true">
          <line x1={x} x2={x} y1={0} y2={area.height} stroke={INK.ink} strokeWidth={1} strokeDasharray="3 3" />
          {readout.rows.map((r, i) =>
            r.y !== undefined && r.y >= 0 && r.y <= area.height ? <circle key={i} cx={x} cy={r.y} r={4.5} fill="none" stroke={r.colour ?? INK.ink} strokeWidth={2} /> : null,
          )}
        </svg>
        <ReadoutBox readout={readout} side={x > area.width * 0.6 ? "left" : "right"} style={{ left: x > area.width * 0.6 ? x - 10 : x + 10, top: 6 }} />
      </>
    );
  }
  return (
    <div
      className="no-print absolute rounded-sm outline-offset-2 print:hidden"
      style={{ left: area.x, top: area.y, width: area.width, height: area.height, touchAction: "pan-y" }}
      tabIndex={n > 0 ? 0 : -1}
      role="slider"
      aria-label={label}
      aria-valuemin={n > 0 ? 1 : 0}
      aria-valuemax={n}
      aria-valuenow={active !== null ? active + 1 : undefined}
      aria-valuetext={readout ? readoutText(readout) : "Move with the arrow keys to read values"}
      onPointerMove={onPointer}
      onPointerDown={onPointer}
      onPointerLeave={(e) => { if (document.activeElement !== e.currentTarget) setIndex(null); }}
      onKeyDown={onKey}
      onBlur={() => setIndex(null)}
    >
      {overlay}
    </div>
  );
}
