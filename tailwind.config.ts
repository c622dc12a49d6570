import type { Config } from "tailwindcss";

// Our palette: calm ink on paper, one field green, and voice colours chosen to
// stay distinct for the common colour-vision deficiencies (see lib/voices.ts).
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      fontFamily: { sans: ["var(--font-sans)", "system-ui", "sans-serif"] },
      colors: {
        ink: { DEFAULT: "#1c2430", soft: "#4a5566", faint: "#8a94a3" },
        paper: { DEFAULT: "#f7f6f2", raised: "#ffffff", sunk: "#ecebe5" },
        turf: { DEFAULT: "#2f6b46", dark: "#1f4d31", light: "#dcebdf" },
        signal: { ok: "#1d6b3a", warn: "#9a5b00", bad: "#a3242b" },
      },
    },
  },
};

export default config;
