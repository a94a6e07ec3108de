// Pure: money in minor units (cents, pence, öre) and its display.

/** Currencies a fee may be set in; each has two decimal places (ISO 4217 minor unit 2). */
export const FEE_CURRENCIES = ["EUR", "GBP", "USD", "CHF", "SEK", "NOK", "DKK", "CAD", "AUD", "NZD"] as const;
export type FeeCurrency = (typeof FEE_CURRENCIES)[number];

/**
 * "850.5" → 85050 minor units, exactly (no floating point). Throws RangeError on anything that is not
 * a non-negative amount with at most two decimals.
 *
 * @example toMinorUnits("1 250.00") // 125000
 */
export function toMinorUnits(amount: string): number {
  const clean = amount.replace(/[\s\u00a0_]/g, "").replace(/,(\d{1,2})$/, ".$1");
  const m = /^(\d{1,9})(?:\.(\d{1,2}))?$/.exec(clean);
  if (!m) throw new RangeError(`amount must be a number with at most two decimals, got "${amount}"`);
  return Number(m[1]) * 100 + Number((m[2] ?? "").padEnd(2, "0"));
}

/** 85050 → "850.50" (for a form field). */
export function fromMinorUnits(minor: number): string {
  if (!Number.isInteger(minor) || minor < 0) throw new RangeError(`minor must be a non-negative integer, got ${minor}`);
  return `${Math.floor(minor / 100)}.${String(minor % 100).padStart(2, "0")}`;
}

/** 85050, "EUR" → "€850.50" in the reader's locale (en-GB by default). */
export function formatMoney(minor: number, currency: string, locale = "en-GB"): string {
  if (!Number.isInteger(minor)) throw new RangeError(`minor must be an integer, got ${minor}`);
  return new Intl.NumberFormat(locale, { style: "currency", currency }).format(minor / 100);
}
