import type { Config } from "tailwindcss";

// Cantrove's own palette: warm paper, deep ink, an ember accent for actions,
// moss for "counted and good", sun for estimates and warnings. Every text pair
// used in the UI keeps a contrast ratio of at least 4.5:1 on paper.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#fbf7f0", deep: "#f3ebdd", edge: "#e2d5bf" },
        ink: { DEFAULT: "#1f1b16", soft: "#4a4239", faint: "#6b6156" },
        ember: { DEFAULT: "#a8431a", deep: "#7f3011", soft: "#f6e2d6" },
        moss: { DEFAULT: "#2f6a4a", deep: "#204a33", soft: "#dfeee4" },
        sun: { DEFAULT: "#8a5a00", soft: "#fbefc9" },
        alarm: { DEFAULT: "#a11d2b", soft: "#f9dfe2" },
      },
      fontFamily: {
        sans: ["var(--cantrove-font)"],
      },
      borderRadius: { card: "0.9rem" },
    },
  },
};

export default config;
