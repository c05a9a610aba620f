import type { Config } from "tailwindcss";

// Scalewright's own palette, named after the shop: spruce (paper/background), rosewood (primary),
// brass (accent), graphite (ink), moss (success), ember (danger), amber (warning).
// Contrast: graphite-900 on spruce-50 ≈ 15:1; rosewood-700 on white ≈ 8.9:1; white on rosewood-700 ≈ 8.9:1.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./emails/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        spruce: {
          50: "#fbf8f1", 100: "#f5efe0", 200: "#ebe0c4", 300: "#dcc99d", 400: "#c9ad72",
          500: "#b59452", 600: "#977841", 700: "#765c34", 800: "#57442a", 900: "#3b2f20",
        },
        rosewood: {
          50: "#fbf3f1", 100: "#f5e2dd", 200: "#e9c0b6", 300: "#d8968a", 400: "#c26a5c",
          500: "#a84b3e", 600: "#8c3a31", 700: "#712e28", 800: "#582522", 900: "#3f1b19",
        },
        brass: {
          50: "#fdf9ec", 100: "#f9efc9", 200: "#f2dd8f", 300: "#e8c654", 400: "#d9ad2c",
          500: "#b98f1d", 600: "#946f17", 700: "#715416", 800: "#553f15", 900: "#3a2b10",
        },
        graphite: {
          50: "#f5f6f6", 100: "#e6e8e9", 200: "#cdd1d3", 300: "#a9b0b3", 400: "#7e878c",
          500: "#626b70", 600: "#4d5459", 700: "#3e4448", 800: "#2c3033", 900: "#1c1f21",
        },
        moss: { 50: "#f1f7ef", 100: "#dcebd6", 500: "#4f7d3e", 600: "#3f6632", 700: "#324f28" },
        ember: { 50: "#fdf1ef", 100: "#fadcd6", 500: "#c23a22", 600: "#a12f1b", 700: "#7f2516" },
        amber: { 50: "#fdf6e7", 100: "#f9e7bd", 500: "#b7791f", 600: "#935f16", 700: "#6f4712" },
      },
      fontFamily: {
        display: ["var(--font-display)", "Georgia", "serif"],
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      // A type scale on a 1.2 ratio from 15 px body text; line heights tuned for tables of numbers.
      fontSize: {
        "2xs": ["0.694rem", { lineHeight: "1rem" }],
        xs: ["0.833rem", { lineHeight: "1.15rem" }],
        sm: ["0.9375rem", { lineHeight: "1.4rem" }],
        base: ["1rem", { lineHeight: "1.55rem" }],
        lg: ["1.2rem", { lineHeight: "1.7rem" }],
        xl: ["1.44rem", { lineHeight: "1.9rem" }],
        "2xl": ["1.728rem", { lineHeight: "2.2rem" }],
        "3xl": ["2.074rem", { lineHeight: "2.5rem" }],
        "4xl": ["2.488rem", { lineHeight: "2.9rem" }],
        "5xl": ["2.986rem", { lineHeight: "3.3rem" }],
      },
      borderRadius: { chip: "0.3rem", panel: "0.6rem" },
      boxShadow: {
        panel: "0 1px 0 rgba(59,47,32,0.06), 0 2px 6px -2px rgba(59,47,32,0.12)",
        lift: "0 8px 24px -8px rgba(59,47,32,0.28)",
      },
    },
  },
};

export default config;
