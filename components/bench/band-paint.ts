/** Screen colours for the bands (approximate paint, for recognition only), in the band pickers and the result. */
export const BAND_PAINT: Record<string, string> = {
  black: "#1c1917",
  brown: "#7c3f12",
  red: "#c81e1e",
  orange: "#ea7a0c",
  yellow: "#facc15",
  green: "#15803d",
  blue: "#1d4ed8",
  violet: "#7e22ce",
  grey: "#8a8580",
  gray: "#8a8580",
  white: "#f8f7f4",
  gold: "#c9a227",
  silver: "#b8bcc2",
  pink: "#f4a6c1",
  none: "transparent",
};
