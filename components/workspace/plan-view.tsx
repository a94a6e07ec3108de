"use client";

import { useRef, useState, type KeyboardEvent, type PointerEvent } from "react";
import { formatLength, type UnitSystem } from "@/lib/units/length";
import { KIND_LABEL, type PlanHeat, type PlanPosition } from "./types";

const PAD = { left: 34, right: 34, top: 30, bottom: 34 };
const MAX_W = 760;
const MAX_H = 440;
/** Keyboard steps: 5 cm / 25 cm in metres, 2 in / 1 ft in feet and inches. */
const STEP = { metric: [0.05, 0.25], imperial: [0.0508, 0.3048] } as const;

/** Marker of a position kind; the shapes differ so that a grey print still tells them apart. */
export function PositionGlyph({ kind, isMain = false, size = 9, className }: { kind: PlanPosition["kind"]; isMain?: boolean; size?: number; className?: string }) {
  const s = size;
  if (kind === "seat")
    return (
      <g className={className}>
        <circle r={s} className="fill-paper-raised stroke-ink" strokeWidth={2} />
        <circle r={isMain ? s * 0.5 : s * 0.28} className="fill-ink" />
      </g>
    );
  if (kind === "main-speaker") return <path d={`M0,${-s * 1.15} L${s * 1.05},${s * 0.75} L${-s * 1.05},${s * 0.75} Z`} className={`fill-[#0072B2] stroke-ink ${className ?? ""}`} strokeWidth={1.5} />;
  return (
    <g className={className}>
      <rect x={-s} y={-s} width={2 * s} height={2 * s} rx={2} className="fill-kiln-500 stroke-ink" strokeWidth={1.5} />
      <circle r={s * 0.55} className="fill-none stroke-paper-raised" strokeWidth={1.6} />
    </g>
  );
}

/**
 * The floor plan, to scale, seen from above: x (length) runs left → right from the front wall, y
 * (width) runs bottom → top from the left wall (the left hand of a listener facing the front).
 * Positions can be dragged with a pointer or moved with the arrow keys (Shift for bigger steps);
 * `onMove` follows the drag, `onMoveEnd` is called once when it ends (that is when it is saved).
 */
export function PlanView({
  room,
  positions,
  units,
  editable,
  heat,
  selectedId,
  onSelect,
  onMove,
  onMoveEnd,
  label,
}: {
  room: { lengthM: number; widthM: number };
  positions: PlanPosition[];
  units: UnitSystem;
  editable: boolean;
  heat?: PlanHeat | null;
  selectedId?: string | null;
  onSelect?: (id: string) => void;
  onMove?: (id: string, p: { xM: number; yM: number }) => void;
  onMoveEnd?: (id: string, p: { xM: number; yM: number }) => void;
  label: string;
}) {
  const { lengthM: L, widthM: W } = room;
  const scale = Math.min(MAX_W / L, MAX_H / W);
  const w = L * scale, h = W * scale;
  const sx = (x: number) => PAD.left + x * scale;
  const sy = (y: number) => PAD.top + (W - y) * scale;
  const svgRef = useRef<SVGSVGElement>(null);
  const drag = useRef<{ id: string; moved: boolean; last: { xM: number; yM: number } } | null>(null);
  const keyTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const keyPending = useRef<{ id: string; p: { xM: number; yM: number } } | null>(null);
  const [dragging, setDragging] = useState<string | null>(null);
  const clampP = (p: { xM: number; yM: number }) => ({ xM: Math.min(L, Math.max(0, round(p.xM))), yM: Math.min(W, Math.max(0, round(p.yM))) });

  function toRoom(e: PointerEvent) {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) return null;
    const pt = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
    return clampP({ xM: (pt.x - PAD.left) / scale, yM: W - (pt.y - PAD.top) / scale });
  }

  function onPointerDown(e: PointerEvent<SVGGElement>, id: string) {
    onSelect?.(id);
    if (!editable || e.button !== 0) return;
    e.preventDefault();
    (e.currentTarget as Element).setPointerCapture(e.pointerId);
    const p = positions.find((q) => q.id === id);
    drag.current = { id, moved: false, last: { xM: p?.xM ?? 0, yM: p?.yM ?? 0 } };
    setDragging(id);
  }
  function onPointerMove(e: PointerEvent<SVGGElement>) {
    const d = drag.current;
    if (!d) return;
    const p = toRoom(e);
    if (!p) return;
    d.moved = true;
    d.last = p;
    onMove?.(d.id, p);
  }
  function onPointerUp() {
    const d = drag.current;
    drag.current = null;
    setDragging(null);
    if (d?.moved) onMoveEnd?.(d.id, d.last);
  }
  function onKeyDown(e: KeyboardEvent<SVGGElement>, pos: PlanPosition) {
    if (!editable) return;
    const step = STEP[units][e.shiftKey ? 1 : 0];
    const delta = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, step], ArrowDown: [0, -step] }[e.key];
    if (!delta) return;
    e.preventDefault();
    const base = keyPending.current?.id === pos.id ? keyPending.current.p : { xM: pos.xM, yM: pos.yM };
    const p = clampP({ xM: base.xM + delta[0]!, yM: base.yM + delta[1]! });
    keyPending.current = { id: pos.id, p };
    onMove?.(pos.id, p);
    if (keyTimer.current) clearTimeout(keyTimer.current);
    // one save after the keys come to rest
    keyTimer.current = setTimeout(() => {
      const k = keyPending.current;
      keyPending.current = null;
      if (k) onMoveEnd?.(k.id, k.p);
    }, 450);
  }

  const cellW = heat && heat.xM.length ? (L / heat.xM.length) * scale : 0;
  const cellH = heat && heat.yM.length ? (W / heat.yM.length) * scale : 0;
  const gridStep = units === "metric" ? 0.5 : 0.6096; // 50 cm or 2 ft
  const gridX = Array.from({ length: Math.floor(L / gridStep) }, (_, i) => (i + 1) * gridStep).filter((x) => x < L - 1e-6);
  const gridY = Array.from({ length: Math.floor(W / gridStep) }, (_, i) => (i + 1) * gridStep).filter((y) => y < W - 1e-6);

  return (
    <svg
      ref={svgRef}
      viewBox={`0 0 ${w + PAD.left + PAD.right} ${h + PAD.top + PAD.bottom}`}
      className="block h-auto w-full max-w-full touch-none select-none"
      role="group"
      aria-label={label}
    >
      <title>{label}</title>
      <rect x={sx(0)} y={sy(W)} width={w} height={h} className="fill-paper-raised" />
      {heat && (
        <g aria-hidden="true">
          {heat.xM.map((x, ix) =>
            heat.yM.map((y, iy) => (
              <rect key={`${ix}-${iy}`} x={sx(x) - cellW / 2} y={sy(y) - cellH / 2} width={cellW + 0.6} height={cellH + 0.6} fill={heat.colour(heat.values[ix * heat.yM.length + iy]!)} />
            )),
          )}
          {heat.best && (
            <g transform={`translate(${sx(heat.best.xM)} ${sy(heat.best.yM)})`}>
              <path d="M-7,0H7M0,-7V7" className="stroke-paper-raised" strokeWidth={4} />
              <path d="M-7,0H7M0,-7V7" className="stroke-ink" strokeWidth={1.6} />
            </g>
          )}
        </g>
      )}
      {!heat && (
        <g aria-hidden="true" className="stroke-paper-line" strokeWidth={1}>
          {gridX.map((x) => <line key={`x${x}`} x1={sx(x)} x2={sx(x)} y1={sy(0)} y2={sy(W)} />)}
          {gridY.map((y) => <line key={`y${y}`} y1={sy(y)} y2={sy(y)} x1={sx(0)} x2={sx(L)} />)}
        </g>
      )}
      <rect x={sx(0)} y={sy(W)} width={w} height={h} className="fill-none stroke-ink" strokeWidth={2.5} />
      {/* the front wall, drawn heavier and labelled */}
      <line x1={sx(0)} x2={sx(0)} y1={sy(0)} y2={sy(W)} className="stroke-kiln-600" strokeWidth={6} />
      <g className="fill-ink-soft text-[12px]" aria-hidden="true">
        <text transform={`translate(${PAD.left - 12} ${PAD.top + h / 2}) rotate(-90)`} textAnchor="middle" className="fill-kiln-700 font-semibold">
          Front wall · width {formatLength(W, units)}
        </text>
        <text transform={`translate(${PAD.left + w + 16} ${PAD.top + h / 2}) rotate(90)`} textAnchor="middle">
          Rear wall
        </text>
        <text x={PAD.left + w / 2} y={PAD.top - 10} textAnchor="middle">
          Right wall
        </text>
        <text x={PAD.left + w / 2} y={PAD.top + h + 22} textAnchor="middle">
          Left wall · length {formatLength(L, units)}
        </text>
      </g>
      {positions.map((p) => {
        const selected = p.id === selectedId;
        const text = `${KIND_LABEL[p.kind]} ${p.name}${p.isMain ? " (main seat)" : ""} at ${formatLength(p.xM, units)} from the front wall, ${formatLength(p.yM, units)} from the left wall`;
        const labelLeft = sx(p.xM) > PAD.left + w - 90;
        return (
          <g
            key={p.id}
            transform={`translate(${sx(p.xM)} ${sy(p.yM)})`}
            tabIndex={0}
            role="button"
            aria-roledescription={editable ? "movable position" : "position"}
            aria-label={editable ? `${text}. Arrow keys move it, Shift for bigger steps.` : text}
            aria-pressed={selected}
            data-position-id={p.id}
            data-kind={p.kind}
            className={`${editable ? (dragging === p.id ? "cursor-grabbing" : "cursor-grab") : "cursor-pointer"} outline-none [&:focus-visible>.focus-ring]:opacity-100`}
            onPointerDown={(e) => onPointerDown(e, p.id)}
            onPointerMove={onPointerMove}
            onPointerUp={onPointerUp}
            onPointerCancel={onPointerUp}
            onKeyDown={(e) => onKeyDown(e, p)}
            onFocus={() => onSelect?.(p.id)}
          >
            <circle r={20} className="fill-transparent" />
            <circle r={16} className={`focus-ring fill-none stroke-kiln-500 ${selected ? "opacity-100" : "opacity-0"}`} strokeWidth={2} strokeDasharray={selected ? "" : "3 2"} />
            <PositionGlyph kind={p.kind} isMain={p.isMain} />
            <text x={labelLeft ? -15 : 15} y={4} textAnchor={labelLeft ? "end" : "start"} className="pointer-events-none fill-ink text-[11px] font-medium [paint-order:stroke] [stroke-linejoin:round]" stroke="#fffdf9" strokeWidth={3}>
              {p.name}
            </text>
          </g>
        );
      })}
    </svg>
  );
}

const round = (v: number) => Math.round(v * 1000) / 1000;

/** The legend of the plan's shapes. */
export function PlanLegend({ withHeat }: { withHeat?: boolean }) {
  const items: [PlanPosition["kind"], string, boolean][] = [
    ["seat", "Seat", false],
    ["seat", "Main seat", true],
    ["main-speaker", "Main speaker", false],
    ["subwoofer", "Subwoofer", false],
  ];
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
      {items.map(([k, t, main]) => (
        <li key={t} className="inline-flex items-center gap-1.5">
          <svg width="20" height="20" viewBox="-10 -10 20 20" aria-hidden="true">
            <PositionGlyph kind={k} isMain={main} size={7} />
          </svg>
          {t}
        </li>
      ))}
      {withHeat && (
        <li className="inline-flex items-center gap-1.5">
          <svg width="16" height="16" viewBox="-8 -8 16 16" aria-hidden="true">
            <path d="M-6,0H6M0,-6V6" className="stroke-ink" strokeWidth={1.6} />
          </svg>
          Flattest cell
        </li>
      )}
    </ul>
  );
}
