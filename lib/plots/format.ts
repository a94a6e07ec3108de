/**
 * Frequency label in Hz with a "k" for thousands: 20 → "20", 31.5 → "31.5", 1000 → "1k", 2500 → "2.5k",
 * 20000 → "20k". Up to three significant figures; no unit (the axis title carries it).
 * @example formatFrequencyHz(1000) // "1k"
 */
export function formatFrequencyHz(frequencyHz: number): string {
  if (!Number.isFinite(frequencyHz)) throw new RangeError(`frequencyHz must be a finite number (got ${frequencyHz})`);
  const a = Math.abs(frequencyHz);
  if (a >= 1e6) return `${trim(frequencyHz / 1e6)}M`;
  if (a >= 1000) return `${trim(frequencyHz / 1000)}k`;
  return trim(frequencyHz);
}

/** Three significant figures, trailing zeros removed, never "-0". */
function trim(v: number): string {
  const a = Math.abs(v);
  const digits = a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : 3;
  const s = Number(v.toFixed(digits)).toString();
  return s === "-0" ? "0" : s;
}

/**
 * A number with a fixed count of decimals and a real minus sign (U+2212), for read-outs and tables.
 * @example formatValue(-3.14159, 1) // "−3.1"
 */
export function formatValue(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return "–";
  const s = value.toFixed(decimals);
  const neg = s.startsWith("-") && Number(s) !== 0;
  return neg ? `\u2212${s.slice(1)}` : s.replace(/^-/, "");
}
