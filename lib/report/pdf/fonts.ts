import path from "node:path";
import { Font } from "@react-pdf/renderer";

/** The app's own fonts as .woff (react-pdf cannot read woff2): Inter (latin + greek) and Source Serif 4. */
const FONT_DIR = path.join(process.cwd(), "assets", "fonts");

let registered = false;

/** Registers the report fonts once per process; families "Inter", "InterGreek" (fallback) and "Serif". */
export function registerReportFonts(): void {
  if (registered) return;
  const f = (name: string) => path.join(FONT_DIR, name);
  Font.register({
    family: "Inter",
    fonts: [400, 500, 600, 700].map((w) => ({ src: f(`inter-latin-${w}-normal.woff`), fontWeight: w })),
  });
  Font.register({
    family: "InterGreek",
    fonts: [400, 500, 600, 700].map((w) => ({ src: f(`inter-greek-${w}-normal.woff`), fontWeight: w })),
  });
  Font.register({
    family: "Serif",
    fonts: [
      { src: f("source-serif-4-latin-400-normal.woff"), fontWeight: 400 },
      { src: f("source-serif-4-latin-600-normal.woff"), fontWeight: 600 },
    ],
  });
  // Words are never split with hyphens in a report.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}

/** Font stacks: Inter with the Greek subset as fallback (α, σ, ρ). */
export const SANS = ["Inter", "InterGreek"];
export const SERIF = ["Serif", "InterGreek"];
