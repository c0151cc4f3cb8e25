import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import colors from "tailwindcss/colors";
import { describe, expect, test } from "vitest";
import { contrastRatio, deltaEOk, hexToRgb, hueOf, oklchToOklab, rgbToOklab, type Lab } from "@/lib/theme/colour";
import { DARK, LIGHT, TOKENS, type Palette, type Token } from "@/lib/theme/palette";

const root = path.resolve(import.meta.dirname, "../..");
const read = (p: string) => readFileSync(path.join(root, p), "utf8");
const THEMES = [
  ["light", LIGHT],
  ["dark", DARK],
] as const;
const lab = (hex: string) => rgbToOklab(hexToRgb(hex));
const ratio = (p: Palette, a: Token, b: Token) => contrastRatio(hexToRgb(p[a]), hexToRgb(p[b]));

/** The `--gb-name: r g b;` variables of one CSS block, as #rrggbb. */
function cssTokens(block: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of block.matchAll(/--gb-([\w-]+):\s*(\d+)\s+(\d+)\s+(\d+);/g)) {
    out[m[1]] = `#${[m[2], m[3], m[4]].map((n) => Number(n).toString(16).padStart(2, "0")).join("")}`;
  }
  return out;
}

describe("colour arithmetic (WCAG 2.2 definitions of relative luminance and contrast ratio)", () => {
  test("black on white is 21:1 and a colour on itself 1:1", () => {
    expect(contrastRatio([0, 0, 0], [255, 255, 255])).toBeCloseTo(21, 6);
    expect(contrastRatio([120, 40, 200], [120, 40, 200])).toBe(1);
  });
  test("#767676 on white is 4.54:1, the familiar lightest AA grey (from memory)", () => {
    expect(contrastRatio(hexToRgb("#767676"), [255, 255, 255])).toBeCloseTo(4.54, 2);
  });
  test("OKLab puts white at L = 1 with no chroma (Ottosson 2020)", () => {
    const [l, a, b] = rgbToOklab([255, 255, 255]);
    expect(l).toBeCloseTo(1, 3);
    expect(Math.hypot(a, b)).toBeLessThan(1e-3);
  });
});

describe("the CSS carries exactly the palette's values", () => {
  const css = read("app/globals.css");
  const darkStart = css.indexOf("@media (prefers-color-scheme: dark)");
  test.each([
    ["light", css.slice(0, darkStart), LIGHT],
    ["dark", css.slice(darkStart, css.indexOf("}", css.indexOf(":root", darkStart))), DARK],
  ] as const)("%s theme", (_, block, palette) => {
    expect(cssTokens(block)).toEqual({ ...palette });
  });
  test("tailwind.config.ts names every token and no other colour", () => {
    const names = [...read("tailwind.config.ts").matchAll(/v\("([\w-]+)"\)/g)].map((m) => m[1]);
    expect(names.sort()).toEqual([...TOKENS].sort());
  });
});

describe.each(THEMES)("contrast, %s theme (WCAG 2.2 AA)", (_, p) => {
  const TEXT: Token[] = ["ink", "muted", "glow", "signal", "hazard", "caution", "ok", "flag"];
  const SURFACES: Token[] = ["paper", "panel", "sunk"];
  test.each(TEXT.flatMap((fg) => SURFACES.map((bg) => [fg, bg] as const)))("%s text on %s is at least 4.5:1 (SC 1.4.3)", (fg, bg) => {
    expect(ratio(p, fg, bg)).toBeGreaterThanOrEqual(4.5);
  });
  const TINTS = ["glow", "hazard", "caution", "ok", "flag"] as const;
  test.each(TINTS)("%s and ink text on the %s tint are at least 4.5:1", (t) => {
    expect(ratio(p, t, `${t}-bg`)).toBeGreaterThanOrEqual(4.5);
    expect(ratio(p, "ink", `${t}-bg`)).toBeGreaterThanOrEqual(4.5);
    expect(ratio(p, "muted", `${t}-bg`)).toBeGreaterThanOrEqual(4.5);
  });
  test("button text on the primary is at least 4.5:1", () => {
    expect(ratio(p, "glow-ink", "glow")).toBeGreaterThanOrEqual(4.5);
  });
  test("control outlines, the focus ring and the hazard stripe are at least 3:1 (SC 1.4.11)", () => {
    for (const bg of ["paper", "panel"] as const) {
      expect(ratio(p, "edge", bg)).toBeGreaterThanOrEqual(3);
      expect(ratio(p, "glow", bg)).toBeGreaterThanOrEqual(3);
    }
    expect(ratio(p, "hazard", "hazard-bg")).toBeGreaterThanOrEqual(3);
  });
});

describe.each(THEMES)("each hue keeps to its job, %s theme", (_, p) => {
  const ACCENTS: Token[] = ["glow", "signal", "caution", "ok", "flag"];
  test.each(ACCENTS)("hazard red stands apart from %s (ΔE_OK ≥ 0.12)", (t) => {
    expect(deltaEOk(lab(p.hazard), lab(p[t]))).toBeGreaterThanOrEqual(0.12);
  });
  test("the primary is nowhere near caution amber: ΔE_OK ≥ 0.15 and hues at least 90° apart", () => {
    expect(deltaEOk(lab(p.glow), lab(p.caution))).toBeGreaterThanOrEqual(0.15);
    const d = Math.abs(hueOf(lab(p.glow)) - hueOf(lab(p.caution)));
    expect(Math.min(d, 360 - d)).toBeGreaterThanOrEqual(90);
  });
});

describe("none of the framework's stock colours", () => {
  const stock: [string, Lab][] = [];
  for (const [family, shades] of Object.entries(colors)) {
    if (typeof shades !== "object") continue;
    for (const [shade, value] of Object.entries(shades as Record<string, string>)) {
      const m = /oklch\(([\d.]+)% ([\d.]+) ([\d.]+)\)/.exec(value);
      if (m) stock.push([`${family}-${shade}`, oklchToOklab(Number(m[1]) / 100, Number(m[2]), Number(m[3]))]);
    }
  }
  test("the stock palette was read (so the check below checks something)", () => {
    expect(stock.length).toBeGreaterThan(200);
  });
  // Accents must be a noticeable step (0.02) from any stock shade; neutrals at least 0.01, since
  // the stock greys crowd the near-whites so closely that nothing lighter stays 0.02 clear.
  const ACCENTS = new Set<Token>(["glow", "signal", "hazard", "caution", "ok", "flag"]);
  test.each(THEMES.flatMap(([theme, p]) => TOKENS.map((t) => [theme, t, p[t]] as const)))("%s %s (%s)", (_, t, hex) => {
    const [name, d] = stock.map(([n, s]) => [n, deltaEOk(lab(hex), s)] as const).sort((a, b) => a[1] - b[1])[0];
    expect(d, `nearest stock shade ${name}`).toBeGreaterThanOrEqual(ACCENTS.has(t) ? 0.02 : 0.01);
  });
});

describe("red for danger alone, in the components", () => {
  // Files whose hazard colour marks a real danger: lethal voltage, an arc, charge left after the time allowed.
  const DANGER_FILES = new Set([
    "app/globals.css",
    "components/bench/danger-banner.tsx",
    "components/jobs/high-voltage-note.tsx",
    "components/estimates/repair-disclaimer.tsx",
    "components/bench/results-panel.tsx",
    "components/bench/charts/chart-frame.tsx",
    "components/bench/charts/discharge-chart.tsx",
    "components/bench/charts/breakdown-chart.tsx",
    // A power-up step over its stop current (a live set drawing more than the limit chosen), and a shorted
    // tube or a substitute whose heater would overrun a series string.
    "components/jobs/power-ups/current-chart-slot.tsx",
    "components/jobs/power-ups/current-chart.tsx",
    "components/jobs/power-ups/step-add-form.tsx",
    "components/jobs/power-ups/steps-table.tsx",
    "components/jobs/tubes/tube-card.tsx",
    "components/jobs/tubes/tube-verdict.tsx",
  ]);
  const files = (dir: string): string[] =>
    readdirSync(path.join(root, dir)).flatMap((f) => {
      const rel = `${dir}/${f}`;
      return statSync(path.join(root, rel)).isDirectory() ? files(rel) : /\.(tsx?|css)$/.test(f) ? [rel] : [];
    });
  const all = [...files("app"), ...files("components")];
  test("the hazard colour appears only where it marks a danger", () => {
    const uses = all.filter((f) => /\b[a-z]+(?:-[a-z]+)?-hazard(?:-bg)?\b|C\.hazard|--gb-hazard/.test(read(f)));
    expect(uses.length).toBeGreaterThan(0);
    expect(
      uses.filter((f) => !DANGER_FILES.has(f)),
      "hazard is for danger alone: use flag for errors and Remove, glow or a neutral for states",
    ).toEqual([]);
  });
  test("no stock colour utilities (text-red-600 and the like) anywhere in the UI", () => {
    const stockClass =
      /\b(?:text|bg|border|fill|stroke|ring|outline|accent|from|to|via|decoration)-(?:red|orange|amber|yellow|lime|green|emerald|teal|cyan|sky|blue|indigo|violet|purple|fuchsia|pink|rose|slate|gray|zinc|neutral|stone)-\d{2,3}\b/;
    expect(all.filter((f) => stockClass.test(read(f)))).toEqual([]);
  });
});
