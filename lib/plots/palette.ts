import type { MarkerShape, SeriesStyle } from "./types";

/** Paper, ink and accent of the product (tailwind.config.ts). */
export const INK = Object.freeze({
  ink: "#1f2328",
  soft: "#4a5058",
  faint: "#6b7179",
  paper: "#f7f4ee",
  raised: "#fffdf9",
  sunk: "#efeae0",
  line: "#e2dbcd",
  kiln: "#b2572a",
  kilnSoft: "#f5dccb",
});

/**
 * The Okabe–Ito colour-blind-safe set (Okabe & Ito 2008, "Color Universal Design"). Black is our ink,
 * and yellow, which is too pale on paper, comes last.
 */
export const OKABE_ITO = Object.freeze({
  black: "#000000",
  orange: "#E69F00",
  skyBlue: "#56B4E9",
  bluishGreen: "#009E73",
  yellow: "#F0E442",
  blue: "#0072B2",
  vermillion: "#D55E00",
  reddishPurple: "#CC79A7",
});

/**
 * Series colours from the Okabe–Ito set, ink in place of black, ordered by contrast on paper: the first four
 * reach the 3:1 non-text contrast of WCAG 2.1 (1.4.11) on #fffdf9; orange, sky blue and yellow, which do
 * not, come last (they still differ by dash and marker).
 */
export const SERIES_COLOURS: readonly string[] = Object.freeze([
  INK.ink, OKABE_ITO.blue, OKABE_ITO.vermillion, OKABE_ITO.bluishGreen, OKABE_ITO.reddishPurple, OKABE_ITO.orange, OKABE_ITO.skyBlue, OKABE_ITO.yellow,
]);

/** Dash patterns (stroke-dasharray) that tell series apart in a grey print; '' is solid. */
export const SERIES_DASHES: readonly string[] = Object.freeze(["", "7 3", "2 2.5", "9 3 2 3", "4 2", "12 3 2 3 2 3", "1 3", "6 2 6 6"]);

/** Markers in the same order, so colour, dash and marker together identify a series. */
export const SERIES_MARKERS: readonly MarkerShape[] = Object.freeze(["circle", "square", "triangle", "diamond", "cross", "star", "plus", "wye"]);

/**
 * Style of series `index` (wraps after eight).
 * @example seriesStyle(1) // { colour: "#0072B2", dash: "7 3", marker: "square" }
 */
export function seriesStyle(index: number): SeriesStyle {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`index must be an integer >= 0 (got ${index})`);
  const n = SERIES_COLOURS.length;
  return { colour: SERIES_COLOURS[index % n]!, dash: SERIES_DASHES[index % n]!, marker: SERIES_MARKERS[index % n]! };
}

/** A verdict of a band against its target. */
export type Verdict = "within" | "near" | "outside";

/** Status colours (tailwind.config.ts) and the shape each verdict always travels with. */
export const VERDICT_STYLE: Readonly<Record<Verdict, { colour: string; soft: string; marker: MarkerShape; hollow: boolean; label: string }>> = Object.freeze({
  within: { colour: "#0f7a63", soft: "#dff1ea", marker: "circle", hollow: false, label: "within target" },
  near: { colour: "#a06a00", soft: "#f8ecd0", marker: "triangle", hollow: false, label: "near target" },
  outside: { colour: "#b3261e", soft: "#f8dedb", marker: "cross", hollow: false, label: "outside target" },
});

/** Mode kinds with their marker and dash (axial strongest and solid; oblique weakest and dotted). */
export const MODE_KIND_STYLE: Readonly<Record<"axial" | "tangential" | "oblique", SeriesStyle & { label: string }>> = Object.freeze({
  axial: { colour: OKABE_ITO.vermillion, dash: "", marker: "circle", label: "axial" },
  tangential: { colour: OKABE_ITO.blue, dash: "5 2.5", marker: "square", label: "tangential" },
  oblique: { colour: OKABE_ITO.bluishGreen, dash: "1.5 2", marker: "triangle", label: "oblique" },
});
