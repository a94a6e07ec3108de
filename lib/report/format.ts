/** Number formatting of the report: fixed decimals, a real minus sign, thin grouping for money. */

/**
 * A number with fixed decimals and a real minus sign ("−0.12"); "—" for null or non-finite values.
 * @example fixed(-0.123, 2) // "−0.12"
 */
export function fixed(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const s = value.toFixed(decimals);
  return Number(s) === 0 ? (0).toFixed(decimals) : s.replace(/^-/, "\u2212");
}

/** A value with its unit, separated by a no-break space: withUnit(0.4, 2, "s") → "0.40 s". */
export function withUnit(value: number | null | undefined, decimals: number, unit: string): string {
  const v = fixed(value, decimals);
  return v === "—" ? v : `${v}\u00a0${unit}`;
}

/** Signed difference, e.g. "+1.2" or "−0.30". */
export function signed(value: number, decimals: number): string {
  const s = fixed(value, decimals);
  return value > 0 && s !== (0).toFixed(decimals) ? `+${s}` : s;
}

/** Money as entered in the firm's currency: two decimals, thousands grouped with commas. */
export function money(value: number): string {
  const [int, dec] = Math.abs(value).toFixed(2).split(".");
  const grouped = int!.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return `${value < 0 ? "\u2212" : ""}${grouped}.${dec}`;
}

/** Frequency label of an octave band: 63 → "63 Hz", 1000 → "1 kHz". */
export function bandLabel(nominalHz: number): string {
  return nominalHz >= 1000 ? `${nominalHz / 1000}\u00a0kHz` : `${nominalHz}\u00a0Hz`;
}

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** A date in words, in UTC: "1 December 2026". */
export function longDate(d: Date): string {
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

/** Date and time in UTC: "1 December 2026, 19:42 UTC". */
export function longDateTime(d: Date): string {
  return `${longDate(d)}, ${String(d.getUTCHours()).padStart(2, "0")}:${String(d.getUTCMinutes()).padStart(2, "0")} UTC`;
}
