import { INK, PLOT_FONT } from "@/lib/plots";

/** Font stack of every plot's SVG (the app's Inter, then system fonts); tabular figures for numbers. */
export const PLOT_FONT_FAMILY = "var(--font-inter), Inter, var(--font-inter-greek), system-ui, sans-serif";

/** Inline style of a plot's root <svg>: fonts travel with the SVG when it is exported. */
export const SVG_ROOT_STYLE = { fontFamily: PLOT_FONT_FAMILY, fontVariantNumeric: "tabular-nums", fontFeatureSettings: '"tnum" 1' } as const;

/** Text presets (presentation attributes, so they survive serialisation and map onto PDF Text). */
export const TEXT = {
  tick: { fontSize: PLOT_FONT.tickPx, fill: INK.soft },
  title: { fontSize: PLOT_FONT.titlePx, fill: INK.ink, fontWeight: 500 },
  legend: { fontSize: PLOT_FONT.legendPx, fill: INK.ink },
  note: { fontSize: PLOT_FONT.tickPx, fill: INK.soft, fontStyle: "italic" as const },
} as const;

/** A stable id usable in url(#…) references (React's useId contains characters CSS does not like). */
export function svgId(reactId: string, suffix: string): string {
  return `p${reactId.replace(/[^A-Za-z0-9_-]/g, "")}-${suffix}`;
}
