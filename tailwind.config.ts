import type { Config } from "tailwindcss";

// Graphite ink on a warm off-white ground, one brass-ochre accent, and a red kept for cautions alone.
export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./lib/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ground: { DEFAULT: "#f6f2ea", raised: "#fffdf8", sunk: "#ece6da" },
        ink: { DEFAULT: "#23262b", soft: "#4a4f57", faint: "#6b7079" },
        rule: { DEFAULT: "#d9d1c3", strong: "#b9ae9b" },
        brass: { DEFAULT: "#8a5d12", light: "#c99a3b", wash: "#f3e6c9", deep: "#6b470b" },
        caution: { DEFAULT: "#b3261e", wash: "#fbe9e7" },
      },
      fontFamily: {
        sans: ['"Atkinson Hyperlegible"', "system-ui", "sans-serif"],
        mono: ['"JetBrains Mono"', "ui-monospace", "monospace"],
      },
    },
  },
} satisfies Config;
