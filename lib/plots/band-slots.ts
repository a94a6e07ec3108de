import { formatFrequencyHz } from "./format";
import type { LogFrequencyScale } from "./log-frequency-scale";
import type { Tick } from "./types";

/** The px extent of one band on a log-frequency axis. */
export interface BandSlot {
  nominalHz: number;
  /** band edges, Hz: centre / 2^(1/(2b)) and centre · 2^(1/(2b)) for 1/b-octave bands */
  lowHz: number;
  highHz: number;
  x0: number;
  x1: number;
  centre: number;
}

/**
 * Slots of octave (fraction 1) or third-octave (fraction 3) bands on a log-frequency scale: each band spans
 * its edges f·2^(∓1/(2b)) around the nominal centre (IEC 61260-1 base-2 edges), so bands tile the axis.
 * @example bandSlots([125, 250], 1, logFrequencyScale([88.4, 353.6], [0, 200])).map((s) => [s.x0, s.x1]) // ≈ [[0, 100], [100, 200]]
 */
export function bandSlots(nominalHz: readonly number[], fraction: 1 | 3, scale: LogFrequencyScale): BandSlot[] {
  if (fraction !== 1 && fraction !== 3) throw new RangeError(`fraction must be 1 or 3 (got ${fraction})`);
  const k = 2 ** (1 / (2 * fraction)); // IEC 61260-1 band-edge ratio
  return nominalHz.map((f, i) => {
    if (!Number.isFinite(f) || f <= 0) throw new RangeError(`nominalHz[${i}] must be a finite number > 0 (got ${f})`);
    const exact = exactCentre(f, fraction);
    const lowHz = exact / k, highHz = exact * k;
    const x0 = scale.map(lowHz), x1 = scale.map(highHz);
    return { nominalHz: f, lowHz, highHz, x0, x1, centre: (x0 + x1) / 2 };
  });
}

/** Exact base-2 mid-band frequency nearest a nominal one: 1000 · 2^(n/b) (IEC 61260-1). */
function exactCentre(nominalHz: number, fraction: 1 | 3): number {
  const n = Math.round(fraction * Math.log2(nominalHz / 1000));
  return 1000 * 2 ** (n / fraction);
}

/** Ticks at band centres labelled with their nominal frequencies ("63", "125", "1k" …). */
export function bandTicks(slots: readonly BandSlot[]): Tick[] {
  return slots.map((s) => ({ value: s.nominalHz, pos: s.centre, label: formatFrequencyHz(s.nominalHz), major: true }));
}

/**
 * Log-frequency domain spanning the outer band edges of the given nominal bands.
 * @example bandDomain([125, 250], 1) // [88.388…, 353.553…]
 */
export function bandDomain(nominalHz: readonly number[], fraction: 1 | 3): [number, number] {
  if (nominalHz.length === 0) throw new RangeError("nominalHz must hold at least one band");
  const k = 2 ** (1 / (2 * fraction));
  const exact = nominalHz.map((f) => exactCentre(f, fraction));
  return [Math.min(...exact) / k, Math.max(...exact) * k];
}

/**
 * Splits a band slot into `groups` bars with a gap `padding` (0…0.9) of the slot at each side.
 * @example groupedBars({ x0: 0, x1: 100 }, 2, 0.1) // [{ x: 10, width: 40 }, { x: 50, width: 40 }]
 */
export function groupedBars(slot: { x0: number; x1: number }, groups: number, padding = 0.12): { x: number; width: number }[] {
  if (!Number.isInteger(groups) || groups < 1) throw new RangeError(`groups must be an integer >= 1 (got ${groups})`);
  if (!(padding >= 0 && padding < 0.5)) throw new RangeError(`padding must be in [0, 0.5) (got ${padding})`);
  const w = slot.x1 - slot.x0;
  const inner = w * (1 - 2 * padding);
  const bw = inner / groups;
  return Array.from({ length: groups }, (_, i) => ({ x: slot.x0 + w * padding + i * bw, width: bw }));
}
