import type { Config } from "tailwindcss";

// Spanwright's design tokens. Strong contrast and large targets: the app is read on a phone in
// daylight at the anchor as often as on a desk.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    colors: {
      transparent: "transparent",
      current: "currentColor",
      white: "#ffffff",
      black: "#000000",
      // Slate-blue ink and paper: the product's neutral scale.
      ink: {
        50: "#f4f6f8",
        100: "#e6eaef",
        200: "#cbd3dc",
        300: "#9eabb9",
        400: "#6d7d90",
        500: "#4d5d71",
        600: "#3a485a",
        700: "#2b3746",
        800: "#1d2632",
        900: "#111822",
      },
      // Spruce green: primary actions and the brand.
      spruce: {
        50: "#ecf7f3",
        100: "#cdebdf",
        300: "#6cc1a0",
        500: "#1f8a64",
        600: "#17704f",
        700: "#11573d",
        800: "#0c402d",
      },
      // Meaning colours, each paired with a word and an icon, never colour alone.
      ok: { 100: "#dcf2e4", 700: "#145c33" },
      caution: { 100: "#fdf0c4", 500: "#c98a00", 800: "#5c3d00" },
      danger: { 100: "#fbe0dd", 600: "#b42318", 700: "#8f1d14" },
      info: { 100: "#dfeafb", 700: "#1c4e91" },
    },
    fontFamily: {
      sans: ["'Inter Variable'", "system-ui", "sans-serif"],
      mono: ["ui-monospace", "SFMono-Regular", "Menlo", "monospace"],
    },
    // Type scale: a 1.2 ratio from a 17 px body, readable at arm's length outdoors.
    fontSize: {
      xs: ["0.8125rem", { lineHeight: "1.25rem" }],
      sm: ["0.9375rem", { lineHeight: "1.375rem" }],
      base: ["1.0625rem", { lineHeight: "1.625rem" }],
      lg: ["1.275rem", { lineHeight: "1.75rem" }],
      xl: ["1.53rem", { lineHeight: "2rem" }],
      "2xl": ["1.836rem", { lineHeight: "2.25rem" }],
      "3xl": ["2.2rem", { lineHeight: "2.625rem" }],
    },
    extend: {
      spacing: {
        // The smallest comfortable touch target for a gloved finger.
        target: "2.75rem",
        gutter: "1.25rem",
        rail: "15rem",
      },
      borderRadius: { control: "0.5rem", panel: "0.875rem" },
      boxShadow: { panel: "0 1px 2px rgb(17 24 34 / 0.08), 0 4px 12px rgb(17 24 34 / 0.06)" },
      maxWidth: { page: "72rem" },
    },
  },
  plugins: [],
};

export default config;
