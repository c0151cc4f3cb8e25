import localFont from "next/font/local";

/**
 * Atkinson Hyperlegible for reading under a bench lamp; JetBrains Mono for figures. Both OFL, in fonts/.
 * Four faces, all preloaded: every byte fetched before the first paint counts against a phone's load
 * (README, "Pages on a phone and a desk"), so the few italic letters (quantity symbols, notes) are slanted by the
 * browser rather than costing an 18 kB face of their own.
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
  src: [
    { path: "../fonts/jetbrains-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/jetbrains-mono-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-figures",
  display: "swap",
});
