import { format, scaleLinear } from "d3";
import type { Tick } from "./types";

/** A linear axis mapping values to px. */
export interface LinearScale {
  /** the domain after niceing */
  domain: [number, number];
  range: [number, number];
  map: (value: number) => number;
  invert: (px: number) => number;
  ticks: Tick[];
}

/** Options of {@link linearScale}. */
export interface LinearScaleOptions {
  /** approximate number of ticks (d3's count), default 5 */
  count?: number;
  /** extend the domain to round tick values, default true */
  nice?: boolean;
  /** decimals of the labels; default from the tick step */
  decimals?: number;
}

/**
 * A linear scale (d3 scaleLinear) with nice ticks, as plain data. A zero-width domain [v, v] is widened
 * to [v − 1, v + 1] (or by 10 % of |v| when larger) so that it still maps. Labels use a real minus sign;
 * magnitudes of a million and more use SI prefixes ("2M", "1.5G").
 * @param domain [min, max], finite, min ≤ max
 * @param range [startPx, endPx] (for a y axis usually [height, 0])
 * @example linearScale([0, 1], [0, 100]).ticks.map((t) => t.label) // ["0.0", "0.2", "0.4", "0.6", "0.8", "1.0"]
 */
export function linearScale(domain: readonly [number, number], range: readonly [number, number], options: LinearScaleOptions = {}): LinearScale {
  if (!Array.isArray(domain) || domain.length !== 2) throw new TypeError("domain must be [min, max]");
  let [lo, hi] = domain;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) throw new RangeError(`domain must be [min, max] with finite min <= max (got [${lo}, ${hi}])`);
  if (!Number.isFinite(range[0]) || !Number.isFinite(range[1])) throw new RangeError(`range must hold two finite numbers (got ${range.join(", ")})`);
  const count = options.count ?? 5;
  if (!Number.isInteger(count) || count < 1 || count > 50) throw new RangeError(`count must be an integer in [1, 50] (got ${count})`);
  if (lo === hi) {
    const pad = Math.max(1, Math.abs(lo) * 0.1);
    lo -= pad;
    hi += pad;
  }
  const scale = scaleLinear().domain([lo, hi]).range([range[0], range[1]]);
  if (options.nice ?? true) scale.nice(count);
  const values = scale.ticks(count);
  const [d0, d1] = scale.domain() as [number, number];
  const step = values.length > 1 ? values[1]! - values[0]! : Math.abs(d1 - d0);
  const label = tickFormatter(step, Math.max(Math.abs(d0), Math.abs(d1)), options.decimals);
  return {
    domain: [d0, d1],
    range: [range[0], range[1]],
    map: (v) => scale(v),
    invert: (px) => scale.invert(px),
    ticks: values.map((value) => ({ value, pos: scale(value), label: label(value), major: true })),
  };
}

function tickFormatter(step: number, magnitude: number, decimals?: number): (v: number) => string {
  const minus = (s: string) => s.replace(/^-/, "\u2212");
  if (decimals === undefined && magnitude >= 1e6) {
    const si = format("~s");
    return (v) => minus(si(v));
  }
  const d = decimals ?? Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  return (v) => {
    const s = v.toFixed(d);
    return Number(s) === 0 ? (0).toFixed(d) : minus(s);
  };
}
