import type { Config } from "tailwindcss";

// Cavitas's own palette: a drawing-sheet feel. Warm off-white paper, ink-dark navy for
// lines and text, one copper accent (resonance peaks, the selected panel), amber and red
// kept for rule breaks and failures only.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f2e9", deep: "#ece5d6", edge: "#d9cfbb" },
        ink: { DEFAULT: "#1a2740", soft: "#44506a", faint: "#566075" },
        copper: { DEFAULT: "#b0602f", soft: "#e9c8b0", deep: "#8a4520" },
        caution: { DEFAULT: "#c98a12", soft: "#f5e3b8", deep: "#8a5d0a" },
        fault: { DEFAULT: "#a8281f", soft: "#f3d3cf" },
        sage: { DEFAULT: "#4f6f52", soft: "#d9e4d6" },
      },
      fontFamily: {
        sans: ["var(--font-text)", "var(--font-greek)", "system-ui", "sans-serif"],
        mono: ["var(--font-figures)", "var(--font-greek)", "ui-monospace", "monospace"],
      },
      borderRadius: { sheet: "3px" },
    },
  },
};

export default config;
