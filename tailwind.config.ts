import type { Config } from "tailwindcss";

/**
 * Eigenroom's identity: paper, ink and one warm accent (kiln, a burnt-clay orange). Status colours
 * always travel with a shape (see components/ui/status-mark.tsx) so that a grey print still reads.
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f4ee", raised: "#fffdf9", sunk: "#efeae0", line: "#e2dbcd" },
        ink: { DEFAULT: "#1f2328", soft: "#4a5058", faint: "#6b7179" },
        kiln: { 50: "#fbf1ea", 100: "#f5dccb", 300: "#e0a27b", 500: "#b2572a", 600: "#9a4a1f", 700: "#7c3b19" },
        within: { DEFAULT: "#0f7a63", soft: "#dff1ea" },
        near: { DEFAULT: "#a06a00", soft: "#f8ecd0" },
        outside: { DEFAULT: "#b3261e", soft: "#f8dedb" },
      },
      fontFamily: {
        sans: ["var(--font-inter)", "var(--font-inter-greek)", "system-ui", "sans-serif"],
        serif: ["var(--font-serif)", "Georgia", "serif"],
      },
    },
  },
};

export default config;
