import type { Config } from "tailwindcss";

/**
 * Frostfold's tokens. A dark slate-ink base keeps long planning sessions easy on the eyes;
 * frost (cyan) marks what can be acted on, ember marks caution, fault marks errors, moss marks
 * success. Every status also carries a word or an icon, so colour is never the only signal.
 * Text pairs used in the app all reach WCAG AA (ink-100..400 on ink-900/950, ink-950 on frost-400).
 */
export default {
  content: ["./index.html", "./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: {
          50: "#f3f6fa",
          100: "#e3e9f1",
          200: "#c5d0de",
          300: "#9fb0c5",
          400: "#7f92ab",
          500: "#566a85",
          600: "#3d4f69",
          700: "#2b3a52",
          800: "#1c283c",
          900: "#131c2c",
          950: "#0b111c",
        },
        frost: {
          100: "#d9f7fb",
          200: "#b0eef6",
          300: "#7fe1ee",
          400: "#45cde0",
          500: "#1fb2c8",
          600: "#168fa3",
          700: "#147283",
          800: "#155b69",
          900: "#0f3d47",
        },
        ember: {
          200: "#fed7b0",
          300: "#fdb97c",
          400: "#fb9447",
          500: "#f07422",
          600: "#d35a12",
          900: "#4a2410",
        },
        fault: {
          200: "#ffd0cc",
          300: "#ff9f96",
          400: "#f8766b",
          500: "#e5534a",
          900: "#4a1714",
        },
        moss: {
          200: "#c6f0d8",
          300: "#8fe0b0",
          400: "#5fcb8e",
          900: "#123a27",
        },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', "system-ui", "sans-serif"],
        mono: ['"IBM Plex Mono"', "ui-monospace", "monospace"],
      },
    },
  },
} satisfies Config;
