import type { Config } from "tailwindcss";

// Paper-and-ink palette with one warm accent for flags. The four sourcing colours are fixed here and
// used by every chart, table and badge (components/ui/sourcing.ts pairs each with a label and pattern).
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  darkMode: "class",
  theme: {
    extend: {
      colors: {
        paper: "var(--paper)",
        "paper-2": "var(--paper-2)",
        ink: "var(--ink)",
        "ink-2": "var(--ink-2)",
        rule: "var(--rule)",
        accent: "var(--accent)",
        "accent-ink": "var(--accent-ink)",
        src: {
          unsourced: "var(--src-unsourced)",
          nolocator: "var(--src-nolocator)",
          locator: "var(--src-locator)",
          secondary: "var(--src-secondary)",
        },
      },
      fontFamily: {
        serif: ["var(--font-serif)", "Georgia", "serif"],
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
    },
  },
};
export default config;
