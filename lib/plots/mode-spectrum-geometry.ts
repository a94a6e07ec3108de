import { cartesianFrame, type CartesianFrame } from "./cartesian-frame";
import { placeMarkerLabels, type DrawnMarkerLine } from "./frequency-response-geometry";
import { formatFrequencyHz } from "./format";
import type { LegendItem } from "./legend-layout";
import { linearScale } from "./linear-scale";
import { logDomainCovering, logFrequencyScale } from "./log-frequency-scale";
import { markerPath } from "./markers";
import { INK, MODE_KIND_STYLE } from "./palette";
import type { MarkerLine, PlotTable, SeriesStyle, Tick } from "./types";

/** Mode kinds in lane order, top to bottom. */
export const MODE_KINDS = ["axial", "tangential", "oblique"] as const;
export type PlotModeKind = (typeof MODE_KINDS)[number];

/** A room mode as the plot needs it (lib/modes RoomMode fits). */
export interface PlotMode {
  nx: number;
  ny: number;
  nz: number;
  frequencyHz: number;
  kind: PlotModeKind;
}

/** Inputs of {@link modeSpectrumGeometry}. */
export interface ModeSpectrumInput {
  modes: readonly PlotMode[];
  /** x axis: "log" (default) or "linear" in Hz */
  scale?: "log" | "linear";
  domainHz?: readonly [number, number];
  /** half-power bandwidth of every mode, Hz (e.g. modalBandwidthHz(T60)); draws a bar f ± B/2 */
  bandwidthHz?: number;
  markers?: readonly MarkerLine[];
}

/** One drawn stem (modes closer than 1.5 px in a lane share a stem and count). */
export interface ModeStem {
  kind: PlotModeKind;
  x: number;
  yTop: number;
  yBottom: number;
  /** modes on this stem, ascending */
  modes: PlotMode[];
  /** bandwidth bar of the stem's first mode, px (absent without bandwidthHz) */
  bar?: { x0: number; x1: number; y: number; height: number };
  /** whether the "×n" count of a shared stem is drawn (skipped where it would touch the previous one) */
  countLabel: boolean;
}

/** Geometry of a mode-spectrum plot: three lanes (axial, tangential, oblique) of stems over frequency. */
export interface ModeSpectrumGeometry extends CartesianFrame {
  lanes: { kind: PlotModeKind; label: string; y0: number; y1: number; style: SeriesStyle & { label: string }; markerPath: string }[];
  stems: ModeStem[];
  markerLines: DrawnMarkerLine[];
  /** sorted stems' x (px), for read-outs */
  hoverX: number[];
  /** stem index per hover position */
  hoverStem: number[];
  table: PlotTable;
  summary: string;
}

const LANE_PX = 46;

/**
 * Geometry of a mode spectrum: each mode a stem in the lane of its kind, topped by the kind's marker, with an
 * optional bandwidth bar; modes that coincide on screen share a stem with a count.
 * @example modeSpectrumGeometry({ modes: [{ nx: 1, ny: 0, nz: 0, frequencyHz: 29.6, kind: "axial" }] }, { width: 600 }).stems.length // 1
 */
export function modeSpectrumGeometry(input: ModeSpectrumInput, size: { width: number }): ModeSpectrumGeometry {
  input.modes.forEach((m, i) => {
    if (!Number.isFinite(m.frequencyHz) || m.frequencyHz <= 0) throw new RangeError(`modes[${i}].frequencyHz must be a finite number > 0 (got ${m.frequencyHz})`);
    if (!MODE_KINDS.includes(m.kind)) throw new TypeError(`modes[${i}].kind must be axial, tangential or oblique (got ${String(m.kind)})`);
  });
  if (input.bandwidthHz !== undefined && !(Number.isFinite(input.bandwidthHz) && input.bandwidthHz >= 0))
    throw new RangeError(`bandwidthHz must be a finite number >= 0 (got ${input.bandwidthHz})`);
  const linear = input.scale === "linear";
  const freqs = input.modes.map((m) => m.frequencyHz);
  const domainHz: [number, number] = input.domainHz
    ? [input.domainHz[0], input.domainHz[1]]
    : linear
      ? [0, freqs.length ? linearScale([0, Math.max(...freqs)], [0, 1]).domain[1] : 200]
      : (logDomainCovering(freqs) ?? [20, 200]);
  const areaHeight = LANE_PX * MODE_KINDS.length;
  const lanes = MODE_KINDS.map((kind, i) => ({ kind, label: MODE_KIND_STYLE[kind].label, y0: i * LANE_PX, y1: (i + 1) * LANE_PX, style: MODE_KIND_STYLE[kind], markerPath: markerPath(MODE_KIND_STYLE[kind].marker, 7) }));
  const laneTicks: Tick[] = lanes.map((l) => ({ value: 0, pos: (l.y0 + l.y1) / 2, label: l.label, major: true }));
  const legendItems: LegendItem[] = lanes.map((l) => ({ label: `${l.label} mode`, colour: l.style.colour, kind: "line", dash: l.style.dash, marker: l.style.marker }));
  if (input.bandwidthHz !== undefined) legendItems.push({ label: `bandwidth ${input.bandwidthHz.toFixed(1)} Hz`, colour: INK.soft, kind: "box", fillOpacity: 0.25 });
  const makeX = (w: number) =>
    linear
      ? (() => { const s = linearScale(domainHz, [0, w], { nice: false, count: Math.max(2, Math.floor(w / 70)) }); return { map: s.map, ticks: s.ticks.map((t) => ({ ...t, label: formatFrequencyHz(t.value) })) }; })()
      : logFrequencyScale(domainHz, [0, w]);
  const hasMarkers = (input.markers ?? []).length > 0;
  const frame = cartesianFrame({ width: size.width, areaHeight, xTitle: "Frequency (Hz)", yTitle: "", yTicks: () => laneTicks, xTicks: (w) => makeX(w).ticks, legendItems, topPx: hasMarkers ? 22 : 12 });
  const x = makeX(frame.area.width);
  const stems: ModeStem[] = [];
  for (const lane of lanes) {
    const inLane = input.modes.filter((m) => m.kind === lane.kind && m.frequencyHz >= domainHz[0] && m.frequencyHz <= domainHz[1]).sort((a, b) => a.frequencyHz - b.frequencyHz);
    for (const m of inLane) {
      const px = x.map(m.frequencyHz);
      const last = stems[stems.length - 1];
      if (last && last.kind === lane.kind && Math.abs(last.x - px) < 1.5) { last.modes.push(m); continue; }
      const stem: ModeStem = { kind: lane.kind, x: px, yTop: lane.y0 + 12, yBottom: lane.y1, modes: [m], countLabel: false };
      if (input.bandwidthHz !== undefined) {
        const x0 = Math.max(0, x.map(Math.max(domainHz[0], m.frequencyHz - input.bandwidthHz / 2)));
        const x1 = Math.min(frame.area.width, x.map(m.frequencyHz + input.bandwidthHz / 2));
        stem.bar = { x0, x1, y: lane.y0 + LANE_PX * 0.55, height: 8 };
      }
      stems.push(stem);
    }
  }
  // "×n" labels sit right of the marker, about 16 px wide; keep them from touching.
  let lastLabelEnd = -Infinity;
  let lastKind: PlotModeKind | undefined;
  for (const s of stems) {
    if (s.kind !== lastKind) { lastLabelEnd = -Infinity; lastKind = s.kind; }
    if (s.modes.length > 1 && s.x + 5 > lastLabelEnd + 2) { s.countLabel = true; lastLabelEnd = s.x + 5 + 16; }
  }
  const order = stems.map((s, i) => ({ x: s.x, i })).sort((a, b) => a.x - b.x);
  const markerLines = placeMarkerLabels(
    (input.markers ?? []).filter((m) => m.value >= domainHz[0] && m.value <= domainHz[1]).map((m) => ({ x: x.map(m.value), label: m.label })),
    frame.area.width,
  ).map((l) => ({ ...l, labelY: l.labelY - 20 }));
  const sorted = [...input.modes].sort((a, b) => a.frequencyHz - b.frequencyHz);
  const counts = MODE_KINDS.map((k) => `${input.modes.filter((m) => m.kind === k).length} ${k}`).join(", ");
  return {
    ...frame,
    lanes,
    stems,
    markerLines,
    hoverX: order.map((o) => o.x),
    hoverStem: order.map((o) => o.i),
    table: {
      columns: [{ label: "Frequency", unit: "Hz" }, { label: "Kind" }, { label: "nx" }, { label: "ny" }, { label: "nz" }],
      rows: sorted.map((m) => [m.frequencyHz, m.kind, m.nx, m.ny, m.nz]),
    },
    summary: input.modes.length
      ? `${input.modes.length} room modes from ${formatFrequencyHz(sorted[0]!.frequencyHz)} to ${formatFrequencyHz(sorted[sorted.length - 1]!.frequencyHz)} Hz: ${counts}.`
      : "No room modes in range.",
  };
}
