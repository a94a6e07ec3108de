import { scaleLog } from "d3";
import { formatFrequencyHz } from "./format";
import type { Tick } from "./types";

/** Which mantissas of each decade carry labels, densest first. */
const LABEL_SETS: readonly (readonly number[])[] = [
  [1, 2, 3, 4, 5, 6, 7, 8, 9],
  [1, 2, 5],
  [1],
];

/** A log-frequency axis mapping Hz to px. */
export interface LogFrequencyScale {
  domain: [number, number];
  range: [number, number];
  /** Hz → px (values outside the domain extrapolate) */
  map: (frequencyHz: number) => number;
  /** px → Hz */
  invert: (px: number) => number;
  ticks: Tick[];
}

/**
 * Ticks of a log-frequency axis: every 1…9 × 10^k inside the domain; the 1-2-5 mantissas carry labels
 * ("20", "50", "100", "200", "500", "1k", "2k" …), the others are minor and unlabelled. When labels would
 * sit closer than `minLabelSpacingPx`, only decades are labelled; in a domain narrower than one 1-2-5
 * step every mantissa is labelled so that at least two labels show.
 * @param domain [lowHz, highHz], 0 < low < high
 * @param range [startPx, endPx]
 * @example logFrequencyTicks([20, 200], [0, 300]).filter((t) => t.major).map((t) => t.label) // ["20", "50", "100", "200"]
 */
export function logFrequencyTicks(domain: readonly [number, number], range: readonly [number, number], minLabelSpacingPx = 34): Tick[] {
  const [lo, hi] = checkDomain(domain);
  const scale = scaleLog().domain([lo, hi]).range([range[0], range[1]]);
  const candidates: { value: number; mantissa: number }[] = [];
  const eps = 1e-9;
  for (let k = Math.floor(Math.log10(lo)); k <= Math.ceil(Math.log10(hi)); k++) {
    for (let m = 1; m <= 9; m++) {
      // Build 10^k exactly (10 ** -1 is 0.1, 1 / 10 is too; 10 ** -2 * 3 is not exactly 0.03)
      const value = k >= 0 ? m * 10 ** k : m / 10 ** -k;
      if (value >= lo * (1 - eps) && value <= hi * (1 + eps)) candidates.push({ value, mantissa: m });
    }
  }
  const spacingOk = (set: readonly number[]) => {
    const labelled = candidates.filter((c) => set.includes(c.mantissa)).map((c) => scale(c.value));
    for (let i = 1; i < labelled.length; i++) if (Math.abs(labelled[i]! - labelled[i - 1]!) < minLabelSpacingPx) return false;
    return true;
  };
  const count = (set: readonly number[]) => candidates.filter((c) => set.includes(c.mantissa)).length;
  // Prefer 1-2-5; fall back to every mantissa in a narrow domain, to decades when crowded.
  let chosen: readonly number[] = LABEL_SETS[1]!;
  if (count(chosen) < 2 && spacingOk(LABEL_SETS[0]!)) chosen = LABEL_SETS[0]!;
  else if (!spacingOk(chosen)) chosen = LABEL_SETS[2]!;
  return candidates.map(({ value, mantissa }) => {
    const major = chosen.includes(mantissa);
    return { value, pos: scale(value), label: major ? formatFrequencyHz(value) : "", major };
  });
}

/**
 * A log-frequency scale (d3 scaleLog) with its ticks, as plain data for SVG and PDF renderers.
 * @example logFrequencyScale([20, 20000], [0, 600]).map(632.456) // 300 (the geometric middle)
 */
export function logFrequencyScale(domain: readonly [number, number], range: readonly [number, number], minLabelSpacingPx?: number): LogFrequencyScale {
  const [lo, hi] = checkDomain(domain);
  if (!Number.isFinite(range[0]) || !Number.isFinite(range[1])) throw new RangeError(`range must hold two finite numbers (got ${range.join(", ")})`);
  const scale = scaleLog().domain([lo, hi]).range([range[0], range[1]]);
  return {
    domain: [lo, hi],
    range: [range[0], range[1]],
    map: (f) => scale(f),
    invert: (px) => scale.invert(px),
    ticks: logFrequencyTicks([lo, hi], range, minLabelSpacingPx),
  };
}

function checkDomain(domain: readonly [number, number]): [number, number] {
  if (!Array.isArray(domain) || domain.length !== 2) throw new TypeError("domain must be [lowHz, highHz]");
  const [lo, hi] = domain;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo <= 0 || hi <= lo)
    throw new RangeError(`domain must satisfy 0 < lowHz < highHz, both finite (got [${lo}, ${hi}])`);
  return [lo, hi];
}

/**
 * A log-frequency domain covering the given frequencies, widened outward to the next 1-2-5 value,
 * e.g. [22, 180] → [20, 200]. Non-positive and non-finite values are ignored; undefined when none is left.
 * @example logDomainCovering([22, 180]) // [20, 200]
 */
export function logDomainCovering(frequenciesHz: Iterable<number>): [number, number] | undefined {
  let lo = Infinity, hi = -Infinity;
  for (const f of frequenciesHz) if (Number.isFinite(f) && f > 0) { lo = Math.min(lo, f); hi = Math.max(hi, f); }
  if (lo === Infinity) return undefined;
  const steps = [1, 2, 5, 10];
  const down = (v: number) => { const p = 10 ** Math.floor(Math.log10(v)); const m = v / p; return [...steps].reverse().find((s) => s <= m * (1 + 1e-9))! * p; };
  const up = (v: number) => { const p = 10 ** Math.floor(Math.log10(v)); const m = v / p; return steps.find((s) => s >= m * (1 - 1e-9))! * p; };
  const a = down(lo), b = up(hi);
  return b > a ? [a, b] : [a, up(a * 1.0001)];
}
