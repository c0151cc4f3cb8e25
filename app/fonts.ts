import localFont from "next/font/local";

/**
 * Atkinson Hyperlegible for reading under a bench lamp; JetBrains Mono for figures. Both OFL, in fonts/.
 * Three faces, all preloaded: every byte fetched before the first paint counts against a phone's load
 * (README, "Pages on a phone and a desk"), so the few italic letters (quantity symbols, notes) are slanted by the
 * browser, and the few bold figures emboldened by it, rather than each costing a face of 18–22 kB.
 */
export const bodyFont = localFont({
  src: [
    { path: "../fonts/atkinson-hyperlegible-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/atkinson-hyperlegible-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-body",
  display: "swap",
});

export const figureFont = localFont({
  src: [{ path: "../fonts/jetbrains-mono-latin-400-normal.woff2", weight: "400", style: "normal" }],
  variable: "--font-figures",
  display: "swap",
});
