import "server-only";
import path from "node:path";
import { Font } from "@react-pdf/renderer";

/**
 * The shipped OFL faces (fonts/) registered once for every PDF we make: Atkinson Hyperlegible for
 * words, JetBrains Mono for figures that line up in columns. WOFF, not WOFF2: the PDF font subsetter
 * drops the glyph outlines of WOFF2 files, leaving blank text.
 */

export const PDF_BODY = "Body";
export const PDF_FIGURES = "Figures";
/** JetBrains Mono's Greek subset: Ω, τ, π, ω and the rest, which the Latin faces lack. */
export const PDF_GREEK = "Greek";
/** Body text with the Greek face behind it: react-pdf takes each character from the first face that has it. */
export const PDF_BODY_STACK = [PDF_BODY, PDF_GREEK];

const fontFile = (name: string) => path.join(/*turbopackIgnore: true*/ process.cwd(), "fonts", name);

Font.register({
  family: PDF_BODY,
  fonts: [
    { src: fontFile("atkinson-hyperlegible-latin-400-normal.woff") },
    { src: fontFile("atkinson-hyperlegible-latin-700-normal.woff"), fontWeight: 700 },
    { src: fontFile("atkinson-hyperlegible-latin-400-italic.woff"), fontStyle: "italic" },
  ],
});
Font.register({
  family: PDF_FIGURES,
  fonts: [{ src: fontFile("jetbrains-mono-latin-400-normal.woff") }, { src: fontFile("jetbrains-mono-latin-600-normal.woff"), fontWeight: 600 }],
});
Font.register({
  family: PDF_GREEK,
  fonts: [
    { src: fontFile("jetbrains-mono-greek-400-normal.woff") },
    { src: fontFile("jetbrains-mono-greek-700-normal.woff"), fontWeight: 700 },
    { src: fontFile("jetbrains-mono-greek-400-italic.woff"), fontStyle: "italic" },
  ],
});
// Whole words only: a part number or value split by a hyphen misleads at the bench.
Font.registerHyphenationCallback((word) => [word]);
