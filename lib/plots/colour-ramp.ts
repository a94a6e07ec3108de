import { color, interpolateCividis, interpolateViridis } from "d3";
import { linearScale } from "./linear-scale";
import type { Tick } from "./types";

/** Sequential ramps that stay readable with colour-vision deficiencies and rise monotonically in lightness. */
export type RampName = "cividis" | "viridis";

const RAMPS: Record<RampName, (t: number) => string> = { cividis: interpolateCividis, viridis: interpolateViridis };

/** A value → colour mapping with what a legend needs. */
export interface ColourRamp {
  name: RampName;
  /** [min, max] of the values, after widening a zero-width domain */
  domain: [number, number];
  /** whether high values are dark (reversed ramp) */
  highIsDark: boolean;
  /** value → "#rrggbb"; values outside the domain clamp to its ends; non-finite → the paper-sunk grey */
  colour: (value: number) => string;
  /** gradient stops for a legend bar, offset 0…1 from the domain's minimum */
  stops: { offset: number; colour: string }[];
}

/** Colour of a cell without a value. */
export const NO_VALUE_COLOUR = "#efeae0";

/**
 * A sequential colour ramp over `domain` (d3-scale-chromatic cividis by default; cividis: Nuñez, Anderton &
 * Renslow 2018, PLOS ONE, designed for colour-vision deficiency). With `highIsDark` (default true) the ramp
 * runs light → dark as the value rises, so "more ink" means "more of it" in a grey print too.
 * @example colourRamp([0, 10]).colour(10) // "#002051" (the dark end of cividis)
 */
export function colourRamp(domain: readonly [number, number], options: { name?: RampName; highIsDark?: boolean; stopCount?: number } = {}): ColourRamp {
  let [lo, hi] = domain;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) throw new RangeError(`domain must be [min, max] with finite min <= max (got [${lo}, ${hi}])`);
  const name = options.name ?? "cividis";
  const ramp = RAMPS[name];
  if (!ramp) throw new TypeError(`name must be 'cividis' or 'viridis' (got ${String(name)})`);
  const highIsDark = options.highIsDark ?? true;
  const stopCount = options.stopCount ?? 11;
  if (!Number.isInteger(stopCount) || stopCount < 2 || stopCount > 256) throw new RangeError(`stopCount must be an integer in [2, 256] (got ${stopCount})`);
  const flat = lo === hi;
  const at = (t: number) => color(ramp(highIsDark ? 1 - t : t))!.formatHex();
  const colour = (v: number) => {
    if (!Number.isFinite(v)) return NO_VALUE_COLOUR;
    if (flat) return at(0.5);
    return at(Math.min(1, Math.max(0, (v - lo) / (hi - lo))));
  };
  if (flat) { lo -= 0.5; hi += 0.5; }
  const stops = Array.from({ length: stopCount }, (_, i) => {
    const offset = i / (stopCount - 1);
    return { offset, colour: flat ? at(0.5) : at(offset) };
  });
  return { name, domain: [lo, hi], highIsDark, colour, stops };
}

/**
 * Ticks for a horizontal colour legend bar of `lengthPx`, on the ramp's exact domain (not niced, so the bar's
 * ends are the data's ends).
 * @example colourLegendTicks(colourRamp([0, 10]), 100).map((t) => t.pos) // [0, 20, 40, 60, 80, 100]
 */
export function colourLegendTicks(ramp: ColourRamp, lengthPx: number, count = 5): Tick[] {
  if (!Number.isFinite(lengthPx) || lengthPx <= 0) throw new RangeError(`lengthPx must be a finite number > 0 (got ${lengthPx})`);
  return linearScale(ramp.domain, [0, lengthPx], { count, nice: false }).ticks;
}
