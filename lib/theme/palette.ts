/**
 * Glowbench's colour tokens, the one list of their values. app/globals.css carries the same values as
 * CSS variables (tests/unit/palette.test.ts keeps the two in step and checks contrast); the PDFs and
 * e-mails, which cannot read CSS variables, take their colours from here.
 *
 * Meanings, each hue kept to one job:
 * - glow: the primary (actions, focus, the current place); a cobalt valve-glass blue, nowhere near
 *   the caution amber.
 * - hazard: danger alone (lethal voltage, an arc, a current over the stop limit). Never a button,
 *   a job state or a form error.
 * - caution: a result to double-check. ok: within limits, done.
 * - flag: something to put right or that cannot be undone (form errors, failed saves, an open
 *   resistor, Remove). Plum, so it never reads as the hazard red.
 * - signal: links and the second line of a chart.
 * - rule: hairlines between things; edge: the outline of a control you type in or pick from
 *   (at least 3:1 against the panel, WCAG 2.2 SC 1.4.11, where rule is not).
 */

export const TOKENS = [
  "paper",
  "panel",
  "sunk",
  "ink",
  "muted",
  "rule",
  "edge",
  "glow",
  "glow-ink",
  "glow-bg",
  "signal",
  "hazard",
  "hazard-bg",
  "caution",
  "caution-bg",
  "ok",
  "ok-bg",
  "flag",
  "flag-bg",
] as const;

export type Token = (typeof TOKENS)[number];
export type Palette = Record<Token, string>;

export const LIGHT: Palette = {
  paper: "#f3ecde",
  panel: "#fffdf3",
  sunk: "#e9e2d2",
  ink: "#26201a",
  muted: "#594f42",
  rule: "#d3c8b4",
  edge: "#8c7f6c",
  glow: "#2f3f94",
  "glow-ink": "#fffdf3",
  "glow-bg": "#dfe3f4",
  signal: "#14616a",
  hazard: "#b3121f",
  "hazard-bg": "#fae2d8",
  caution: "#7a5200",
  "caution-bg": "#f6ecca",
  ok: "#206a3a",
  "ok-bg": "#dff1e2",
  flag: "#7a2a7e",
  "flag-bg": "#f2e1ef",
};

export const DARK: Palette = {
  paper: "#15130f",
  panel: "#231f1b",
  sunk: "#110d09",
  ink: "#f2ebdf",
  muted: "#bdb2a2",
  rule: "#4a4237",
  edge: "#857a68",
  glow: "#98b0f8",
  "glow-ink": "#131836",
  "glow-bg": "#242947",
  signal: "#6fd0d6",
  hazard: "#ff8a7a",
  "hazard-bg": "#4a1713",
  caution: "#f2c94c",
  "caution-bg": "#3b2e0a",
  ok: "#8fdca6",
  "ok-bg": "#143522",
  flag: "#e3a4f0",
  "flag-bg": "#3a1a3d",
};

/** The tube's own lit-filament orange, used only inside the mark (app/icon.svg, components/shell/logo.tsx). */
export const FILAMENT = "#f08a24";
