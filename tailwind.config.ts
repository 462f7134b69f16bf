import type { Config } from "tailwindcss";

// Design tokens for Chillwright. Loaded from app/globals.css through `@config`.
// High contrast for daylight at the vehicle; generous sizes for gloved hands.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#0b1620", soft: "#2c3a47", muted: "#4a5a68" },
        paper: { DEFAULT: "#ffffff", sunk: "#eef2f5", line: "#b9c4cd" },
        glacier: {
          50: "#e6f4fb",
          100: "#c6e6f6",
          300: "#6cc0ea",
          500: "#0a6fa6",
          600: "#075b89",
          700: "#05476b",
          900: "#022436",
        },
        ember: { 50: "#fdefe6", 500: "#b4410b", 700: "#7f2c05" },
        caution: { 50: "#fff6d6", 500: "#8a6100", 700: "#5c4100" },
        sound: { 50: "#e7f6ec", 500: "#1b7a3e", 700: "#115229" },
      },
      fontFamily: {
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
        mono: ["var(--font-figures)", "ui-monospace", "monospace"],
      },
      minHeight: { touch: "2.75rem", glove: "3.5rem" },
      minWidth: { touch: "2.75rem", glove: "3.5rem" },
      borderRadius: { card: "0.75rem" },
    },
  },
};

export default config;
