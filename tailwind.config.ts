import type { Config } from "tailwindcss";

// Loaded from app/globals.css with `@config`. Ionleaf's palette: "slate ink" text on
// "paper" backgrounds, with a copper accent (the metal of many a working electrode) and
// a teal for computed values.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./editor/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#fbfaf7", deep: "#f3f1ea" },
        ink: { DEFAULT: "#1f2933", soft: "#52606d", faint: "#5f6b78" },
        copper: {
          50: "#fbf3ee",
          100: "#f4e0d3",
          300: "#dfa27d",
          500: "#b8683d",
          600: "#9c5430",
          700: "#7d4226",
        },
        lagoon: { 50: "#eef8f7", 100: "#d3efec", 500: "#22807a", 600: "#1b6964", 700: "#15524e" },
      },
      fontFamily: {
        sans: ["'Inter Variable'", "system-ui", "sans-serif"],
        mono: ["'JetBrains Mono Variable'", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
