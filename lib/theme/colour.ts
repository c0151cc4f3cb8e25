/** Colour arithmetic for checking the palette: WCAG contrast and OKLab distance. Pure, no I/O. */

export type Rgb = readonly [number, number, number];

export function hexToRgb(hex: string): Rgb {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`Not a #rrggbb colour: ${hex}`);
  return [parseInt(m[1], 16), parseInt(m[2], 16), parseInt(m[3], 16)];
}

/** sRGB channel (0–255) to linear light, the transfer function WCAG 2.2 gives under "relative luminance". */
const linear = (c: number) => {
  const s = c / 255;
  return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
};

/** WCAG 2.2 relative luminance: 0.2126 R + 0.7152 G + 0.0722 B of the linear channels. */
export function relativeLuminance([r, g, b]: Rgb): number {
  return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
}

/** WCAG 2.2 contrast ratio (L1 + 0.05) / (L2 + 0.05), lighter over darker: 1 to 21. */
export function contrastRatio(a: Rgb, b: Rgb): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

export type Lab = readonly [number, number, number];

/** sRGB to OKLab, with the matrices of B. Ottosson, "A perceptual color space for image processing" (2020). */
export function rgbToOklab(rgb: Rgb): Lab {
  const [r, g, b] = rgb.map(linear);
  const l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
  const m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  return [
    0.2104542553 * l + 0.793617785 * m - 0.0040720468 * s,
    1.9779984951 * l - 2.428592205 * m + 0.4505937099 * s,
    0.0259040371 * l + 0.7827717662 * m - 0.808675766 * s,
  ];
}

/** OKLCh (lightness 0–1, chroma, hue in degrees) to OKLab: the polar form of the same space. */
export function oklchToOklab(l: number, c: number, hDeg: number): Lab {
  const h = (hDeg * Math.PI) / 180;
  return [l, c * Math.cos(h), c * Math.sin(h)];
}

/** Euclidean distance in OKLab (ΔE_OK); about 0.02 is a just-noticeable difference (from memory). */
export function deltaEOk(p: Lab, q: Lab): number {
  return Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
}

/** Hue angle in degrees (0–360) of an OKLab colour. */
export function hueOf([, a, b]: Lab): number {
  return ((Math.atan2(b, a) * 180) / Math.PI + 360) % 360;
}
