import type { Config } from "tailwindcss";

// Tailwind 4 reads this file through `@config` in app/globals.css; `content` is ignored there.
const config: Config = {
  content: [],
  theme: {
    extend: {
      colors: {
        // Slipway's own palette: deep river water, reed green, signal amber.
        river: {
          50: "#eef6f8",
          100: "#d5e9ee",
          200: "#a9d2dc",
          500: "#2f7f94",
          600: "#236a7d",
          700: "#1b5566",
          800: "#15424f",
          900: "#0f2f39",
        },
        reed: { 100: "#e3f1de", 600: "#3f7a2e", 800: "#2a5420" },
        signal: { 100: "#fdf0d5", 600: "#a45f00", 800: "#6d3f00" },
        alarm: { 100: "#fbe3e1", 600: "#b3261e", 800: "#7a1a14" },
      },
      fontFamily: {
        sans: ["var(--font-slipway)", "system-ui", "sans-serif"],
      },
    },
  },
};

export default config;
