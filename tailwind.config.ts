import type { Config } from "tailwindcss";

/**
 * Glowbench's own palette (none of the framework's stock colours): warm bench paper and bakelite ink
 * by day, a dim bench at night. Colours are CSS variables (app/globals.css, values from
 * lib/theme/palette.ts) so the dark theme (prefers-color-scheme) swaps them in one place.
 * Each hue has one job: glow the primary, hazard for danger alone, caution, ok, flag for errors and
 * actions that cannot be undone. tests/unit/palette.test.ts checks WCAG AA contrast of every pair we use.
 */
const v = (name: string) => `rgb(var(--gb-${name}) / <alpha-value>)`;

const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: v("paper"),
        panel: v("panel"),
        sunk: v("sunk"),
        ink: v("ink"),
        muted: v("muted"),
        rule: v("rule"),
        edge: v("edge"),
        glow: v("glow"),
        "glow-ink": v("glow-ink"),
        "glow-bg": v("glow-bg"),
        signal: v("signal"),
        hazard: v("hazard"),
        "hazard-bg": v("hazard-bg"),
        caution: v("caution"),
        "caution-bg": v("caution-bg"),
        ok: v("ok"),
        "ok-bg": v("ok-bg"),
        flag: v("flag"),
        "flag-bg": v("flag-bg"),
      },
      fontFamily: {
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
        mono: ["var(--font-figures)", "ui-monospace", "monospace"],
      },
      fontSize: {
        // A bench-lamp type scale: nothing smaller than 14 px, body at 17 px.
        note: ["0.875rem", { lineHeight: "1.35rem" }],
        body: ["1.0625rem", { lineHeight: "1.6rem" }],
        lead: ["1.25rem", { lineHeight: "1.8rem" }],
        title: ["1.75rem", { lineHeight: "2.2rem", letterSpacing: "-0.01em" }],
        display: ["2.5rem", { lineHeight: "2.9rem", letterSpacing: "-0.02em" }],
        reading: ["2rem", { lineHeight: "2.4rem" }],
      },
      borderRadius: { chip: "0.375rem", card: "0.75rem" },
      boxShadow: { card: "0 1px 0 rgb(var(--gb-rule)), 0 6px 18px -10px rgb(0 0 0 / 0.25)" },
    },
  },
};

export default config;
