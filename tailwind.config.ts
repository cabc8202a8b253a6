import type { Config } from "tailwindcss";

// Sagline's own identity: warm paper and deep ink, with "charge" amber for the sag line and a cool
// "cell" teal for measured values. Chart series use the Okabe–Ito colour-blind-safe palette
// (Okabe & Ito, 2008) and always pair colour with a shape or dash.
const config: Config = {
  content: ["./app/**/*.{ts,tsx,mdx}", "./components/**/*.{ts,tsx}", "./content/**/*.{md,mdx}"],
  darkMode: "media",
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f4ee", raised: "#ffffff", sunk: "#ece8de" },
        ink: { DEFAULT: "#1b1f27", soft: "#4a5160", faint: "#7b8291" },
        night: { DEFAULT: "#12151b", raised: "#1a1e26", sunk: "#0c0e12", line: "#2c313c" },
        charge: { 50: "#fff7e8", 100: "#ffe9bf", 400: "#f2a93b", 500: "#e08a12", 600: "#b86d09", 700: "#8c5206" },
        cell: { 50: "#e7f6f4", 100: "#c3eae4", 400: "#35a99b", 500: "#1d8a7e", 600: "#146d63", 700: "#0e524b" },
        warn: { DEFAULT: "#b42318", soft: "#fde8e6" },
      },
      fontFamily: {
        sans: ["'Inter Variable'", "system-ui", "sans-serif"],
        mono: ["'JetBrains Mono Variable'", "ui-monospace", "monospace"],
      },
      maxWidth: { page: "72rem" },
    },
  },
};
export default config;
