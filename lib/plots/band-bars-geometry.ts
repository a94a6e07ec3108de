import { bandDomain, bandSlots, bandTicks, groupedBars, type BandSlot } from "./band-slots";
import { cartesianFrame, defaultAreaHeight, yTickCount, type CartesianFrame } from "./cartesian-frame";
import { formatFrequencyHz, formatValue } from "./format";
import { hatchPath, SERIES_HATCHES } from "./hatch";
import type { LegendItem } from "./legend-layout";
import { linearScale } from "./linear-scale";
import { logFrequencyScale } from "./log-frequency-scale";
import { markerPath } from "./markers";
import { INK, seriesStyle, VERDICT_STYLE, type Verdict } from "./palette";
import type { PlotCell, PlotTable, PointMarker, SeriesStyle } from "./types";

/** One scenario's value per band, e.g. predicted RT60 in s, with an optional verdict per band. */
export interface BandScenario {
  label: string;
  values: readonly (number | null)[];
  verdicts?: readonly (Verdict | null)[];
}

/** Allowed band per frequency band (e.g. from lib/reverb targetBands). */
export interface BandTarget {
  lowerS: number;
  upperS: number;
  targetS?: number;
}

/** Inputs of {@link bandBarsGeometry}. */
export interface BandBarsInput {
  /** nominal band centres, Hz, ascending (63, 125 … or third-octaves) */
  bandsHz: readonly number[];
  fraction?: 1 | 3;
  scenarios: readonly BandScenario[];
  /** aligned with bandsHz */
  target?: readonly BandTarget[];
  /** grouped bars (default) or one stepped line per scenario */
  mode?: "bars" | "steps";
  yTitle?: string;
  /** value unit for read-outs and the table, default "s" */
  unit?: string;
  /** y domain; default [0, max of values and target, niced] */
  yDomain?: readonly [number, number];
}

export interface DrawnBar {
  scenario: number;
  band: number;
  x: number;
  y: number;
  width: number;
  height: number;
  hatch: string;
}

/** Geometry of a per-band plot. */
export interface BandBarsGeometry extends CartesianFrame {
  slots: BandSlot[];
  styles: SeriesStyle[];
  bars: DrawnBar[];
  /** stepped lines, one per scenario (mode "steps") */
  steps: { scenario: number; path: string }[];
  /** shaded target region (fill only), its upper and lower edges as stepped lines, and its middle line */
  targetArea: string;
  targetEdges: string;
  targetLine: string;
  verdictMarkers: (PointMarker & { verdict: Verdict; scenario: number; band: number })[];
  hoverX: number[];
  table: PlotTable;
  summary: string;
}

const r2 = (v: number) => Math.round(v * 100) / 100;

/**
 * Geometry of a per-band plot (e.g. RT60 per octave band for several scenarios): grouped bars (hatched per
 * scenario) or stepped lines, a shaded target region, and each band's verdict as a shape (circle within,
 * triangle near, cross outside) above the bar.
 * @example bandBarsGeometry({ bandsHz: [125, 250], scenarios: [{ label: "Baseline", values: [0.6, 0.5] }] }, { width: 600 }).bars.length // 2
 */
export function bandBarsGeometry(input: BandBarsInput, size: { width: number; areaHeight?: number }): BandBarsGeometry {
  const n = input.bandsHz.length;
  if (n === 0) throw new RangeError("bandsHz must hold at least one band");
  input.scenarios.forEach((s, i) => {
    if (s.values.length !== n) throw new RangeError(`scenarios[${i}].values has ${s.values.length} values for ${n} bands`);
    if (s.verdicts && s.verdicts.length !== n) throw new RangeError(`scenarios[${i}].verdicts has ${s.verdicts.length} values for ${n} bands`);
  });
  if (input.target && input.target.length !== n) throw new RangeError(`target has ${input.target.length} bands for ${n} bands`);
  const fraction = input.fraction ?? 1;
  const mode = input.mode ?? "bars";
  const unit = input.unit ?? "s";
  const values = input.scenarios.flatMap((s) => s.values.filter((v): v is number => v !== null && Number.isFinite(v)));
  const top = Math.max(0.1, ...values, ...(input.target ?? []).map((t) => t.upperS));
  const areaHeight = size.areaHeight ?? defaultAreaHeight(size.width);
  // Headroom for the verdict markers above the tallest bar.
  const y = linearScale(input.yDomain ?? [0, top * 1.1], [areaHeight, 0], { count: yTickCount(areaHeight) });
  const styles = input.scenarios.map((_, i) => seriesStyle(i));
  const usedVerdicts = new Set(input.scenarios.flatMap((s) => (s.verdicts ?? []).filter((v): v is Verdict => v !== null)));
  const legendItems: LegendItem[] = input.scenarios.map((s, i) => {
    const h = SERIES_HATCHES[i % SERIES_HATCHES.length];
    return mode === "bars"
      ? { label: s.label, colour: styles[i]!.colour, kind: "box", fillOpacity: 0.35, hatchAngleDeg: h?.angleDeg, hatchSpacingPx: h?.spacingPx }
      : { label: s.label, colour: styles[i]!.colour, kind: "line", dash: styles[i]!.dash };
  });
  if (input.target) legendItems.push({ label: "target band", colour: INK.kiln, kind: "box", fillOpacity: 0.16, dash: "4 3" });
  for (const v of ["within", "near", "outside"] as const)
    if (usedVerdicts.has(v)) legendItems.push({ label: VERDICT_STYLE[v].label, colour: VERDICT_STYLE[v].colour, kind: "marker", marker: VERDICT_STYLE[v].marker });
  const domain = bandDomain(input.bandsHz, fraction);
  const frame = cartesianFrame({
    width: size.width,
    areaHeight,
    xTitle: fraction === 1 ? "Octave band (Hz)" : "Third-octave band (Hz)",
    yTitle: input.yTitle ?? "Reverberation time RT60 (s)",
    yTicks: () => y.ticks,
    xTicks: (w) => bandTicks(bandSlots(input.bandsHz, fraction, logFrequencyScale(domain, [0, w]))),
    legendItems,
  });
  const slots = bandSlots(input.bandsHz, fraction, logFrequencyScale(domain, [0, frame.area.width]));
  const baseline = y.map(Math.max(0, y.domain[0]));
  const bars: DrawnBar[] = [];
  const steps: { scenario: number; path: string }[] = [];
  const verdictMarkers: BandBarsGeometry["verdictMarkers"] = [];
  const groups = input.scenarios.length;
  input.scenarios.forEach((s, si) => {
    const hatch = SERIES_HATCHES[si % SERIES_HATCHES.length] ?? null;
    let d = "";
    let open = false;
    s.values.forEach((v, b) => {
      const slot = slots[b]!;
      const ok = v !== null && Number.isFinite(v);
      let markerX = slot.centre;
      let markerTop = 0;
      if (mode === "bars") {
        const g = groupedBars(slot, Math.max(1, groups), 0.14)[si]!;
        markerX = g.x + g.width / 2;
        if (ok) {
          const yv = y.map(v);
          const rect = { x: r2(g.x), y: r2(Math.min(yv, baseline)), width: r2(Math.max(0, g.width - 1)), height: r2(Math.abs(baseline - yv)) };
          bars.push({ scenario: si, band: b, ...rect, hatch: hatch ? hatchPath(rect, hatch) : "" });
          markerTop = rect.y;
        }
      } else if (ok) {
        const yv = r2(y.map(v));
        d += `${open ? "L" : "M"}${r2(slot.x0)},${yv}H${r2(slot.x1)}`;
        open = true;
        // Spread markers of several scenarios across the band so they do not overlap.
        markerX = slot.x0 + ((slot.x1 - slot.x0) * (si + 1)) / (groups + 1);
        // On the line itself (+8 cancels the lift above bars below): the line's dash tells whose verdict it is.
        markerTop = yv + 8;
      } else open = false;
      const verdict = s.verdicts?.[b];
      if (ok && verdict) {
        const st = VERDICT_STYLE[verdict];
        verdictMarkers.push({ x: r2(markerX), y: r2(markerTop - 8), shape: st.marker, path: markerPath(st.marker, 8), colour: st.colour, hollow: false, verdict, scenario: si, band: b });
      }
    });
    if (mode === "steps") steps.push({ scenario: si, path: d });
  });
  let targetArea = "", targetLine = "", upper = "", lower = "";
  if (input.target) {
    input.target.forEach((t, b) => {
      const slot = slots[b]!;
      const y0 = r2(y.map(t.upperS)), y1 = r2(y.map(t.lowerS));
      targetArea += `M${r2(slot.x0)},${y0}H${r2(slot.x1)}V${y1}H${r2(slot.x0)}Z`;
      // Edges continue from band to band (a vertical join where the limit changes), so the region reads as one.
      upper += `${b === 0 ? "M" : "L"}${r2(slot.x0)},${y0}H${r2(slot.x1)}`;
      lower += `${b === 0 ? "M" : "L"}${r2(slot.x0)},${y1}H${r2(slot.x1)}`;
      if (t.targetS !== undefined) targetLine += `M${r2(slot.x0)},${r2(y.map(t.targetS))}H${r2(slot.x1)}`;
    });
  }
  const targetEdges = upper + lower;
  const columns = [{ label: "Band", unit: "Hz" }, ...input.scenarios.flatMap((s) => [{ label: s.label, unit }, ...(s.verdicts ? [{ label: `${s.label} verdict` }] : [])])];
  if (input.target) columns.push({ label: "Target lower", unit }, { label: "Target upper", unit });
  const rows = input.bandsHz.map((f, b) => {
    const row: PlotCell[] = [f];
    for (const s of input.scenarios) {
      const v = s.values[b];
      row.push(v === null || v === undefined || !Number.isFinite(v) ? null : v);
      if (s.verdicts) row.push(s.verdicts[b] ?? null);
    }
    if (input.target) row.push(input.target[b]!.lowerS, input.target[b]!.upperS);
    return row;
  });
  const counts = (["within", "near", "outside"] as const).map((v) => `${input.scenarios.reduce((c, s) => c + (s.verdicts ?? []).filter((x) => x === v).length, 0)} ${v}`);
  const summary =
    `${input.scenarios.length} ${input.scenarios.length === 1 ? "scenario" : "scenarios"} over ${n} bands from ${formatFrequencyHz(input.bandsHz[0]!)} to ${formatFrequencyHz(input.bandsHz[n - 1]!)} Hz` +
    (values.length ? `, ${formatValue(Math.min(...values), 2)} to ${formatValue(Math.max(...values), 2)} ${unit}` : "") +
    (usedVerdicts.size ? `; band verdicts ${counts.join(", ")}.` : ".");
  return { ...frame, slots, styles, bars, steps, targetArea, targetEdges, targetLine, verdictMarkers, hoverX: slots.map((s) => s.centre), table: { columns, rows }, summary };
}
