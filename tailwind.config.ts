import type { Config } from "tailwindcss";

/**
 * Loamcast's identity: forest-floor neutrals ("loam"), a moss green for action,
 * a high-visibility amber for caution and a brick red for closures. Status is never
 * carried by colour alone: every status also has a label and a pattern.
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        loam: {
          50: "#f7f5f2",
          100: "#ece7df",
          200: "#d7cdbd",
          300: "#b9a98f",
          400: "#9a8565",
          500: "#7c6749",
          600: "#63513a",
          700: "#4b3d2d",
          800: "#342b21",
          900: "#221c16",
        },
        moss: { 500: "#3f7d3a", 600: "#2f6a2c", 700: "#245522", 100: "#e3f0df" },
        flare: { 400: "#f2b12c", 500: "#d99307", 700: "#8a5a00", 100: "#fdf1d2" },
        brick: { 500: "#b73a26", 600: "#98301f", 100: "#f8e1dc" },
        trail: {
          easiest: "#f4f4f4",
          easy: "#2e8b3d",
          intermediate: "#1f5fbf",
          difficult: "#111111",
          extreme: "#111111",
        },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      minHeight: { tap: "48px" },
      minWidth: { tap: "48px" },
    },
  },
};

export default config;
