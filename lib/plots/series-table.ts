import type { PlotCell, PlotTable } from "./types";

/** A series of y values over x values, e.g. level in dB over frequency in Hz. */
export interface XYSeries {
  label: string;
  x: readonly number[];
  y: readonly (number | null)[];
}

/**
 * The data table of several x/y series: one x column and a column per series when every series has the
 * same x values (a wide table), otherwise long form (series, x, y). Lengths must match per series.
 * @example seriesTable({ label: "Frequency", unit: "Hz" }, { unit: "dB" }, [{ label: "A", x: [20], y: [1] }]).rows // [[20, 1]]
 */
export function seriesTable(x: { label: string; unit?: string }, y: { label?: string; unit?: string }, series: readonly XYSeries[]): PlotTable {
  series.forEach((s, i) => {
    if (s.x.length !== s.y.length) throw new RangeError(`series[${i}] (${s.label}): x has ${s.x.length} values but y has ${s.y.length}`);
  });
  const first = series[0];
  const shared = first !== undefined && series.every((s) => s.x.length === first.x.length && s.x.every((v, i) => v === first.x[i]));
  if (shared) {
    return {
      columns: [x, ...series.map((s) => ({ label: s.label, unit: y.unit }))],
      rows: first.x.map((xv, i) => [xv, ...series.map((s) => clean(s.y[i]))]),
    };
  }
  return {
    columns: [{ label: "Series" }, x, { label: y.label ?? "Value", unit: y.unit }],
    rows: series.flatMap((s) => s.x.map((xv, i) => [s.label, xv, clean(s.y[i])] as PlotCell[])),
  };
}

const clean = (v: number | null | undefined): PlotCell => (v === null || v === undefined || !Number.isFinite(v) ? null : v);
