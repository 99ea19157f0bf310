import type { Config } from "tailwindcss";

/**
 * Barwright's design tokens. Colours: a cream page, deep cocoa ink, a warm
 * cacao-pod amber accent, sage for "meets", brick for "short by".
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        cream: { DEFAULT: "#FBF7F1", deep: "#F4ECE1" },
        cocoa: {
          DEFAULT: "#2B1A12",
          700: "#4A3328",
          500: "#6E5647",
          300: "#A8968A",
        },
        sand: { DEFAULT: "#E6DACB", light: "#EFE6DA" },
        pod: { DEFAULT: "#C4711F", dark: "#9E5714", light: "#F6E2CB" },
        sage: { DEFAULT: "#5F7F62", light: "#E3EDE1" },
        brick: { DEFAULT: "#A23E2C", light: "#F5E0DA" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
      },
      spacing: {
        gutter: "1.5rem",
        section: "3rem",
      },
      borderRadius: {
        card: "0.75rem",
      },
      boxShadow: {
        card: "0 1px 2px rgba(43, 26, 18, 0.06), 0 4px 16px rgba(43, 26, 18, 0.05)",
      },
      maxWidth: {
        page: "72rem",
      },
    },
  },
};

export default config;
