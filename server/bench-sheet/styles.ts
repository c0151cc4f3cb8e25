import "server-only";
import { StyleSheet } from "@react-pdf/renderer";
import { LIGHT } from "@/lib/theme/palette";
import { PDF_BODY_STACK } from "@/server/pdf/fonts";

/** The bench sheet's look: A4, palette colours, body text with the Greek face behind it (Ω, µ, τ). */

export const ink = LIGHT.ink;
export const rule = LIGHT.rule;
export const muted = LIGHT.muted;
export const hazard = LIGHT.hazard;
export const caution = LIGHT.caution;

/** Room a heading needs below it on its page (points): a heading never ends a page on its own. */
export const HEADING_AHEAD = 90;

export const s = StyleSheet.create({
  page: { fontFamily: PDF_BODY_STACK, fontSize: 10, color: ink, padding: 36, paddingBottom: 52, lineHeight: 1.35 },
  top: { flexDirection: "row", justifyContent: "space-between", borderBottom: `2 solid ${ink}`, paddingBottom: 6, marginBottom: 10 },
  brand: { fontSize: 9, color: muted },
  title: { fontSize: 17, fontWeight: 700, lineHeight: 1.2, marginBottom: 8 },
  facts: { flexDirection: "row", flexWrap: "wrap", marginBottom: 10 },
  fact: { width: "33%", marginBottom: 3 },
  factLabel: { fontSize: 8, color: muted },
  danger: { border: `1.5 solid ${hazard}`, backgroundColor: LIGHT["hazard-bg"], padding: 8, marginBottom: 12 },
  dangerHead: { fontWeight: 700, color: hazard, marginBottom: 2 },
  h2: { fontSize: 12.5, fontWeight: 700, marginTop: 10, marginBottom: 5, borderBottom: `1 solid ${rule}`, paddingBottom: 2 },
  h3: { fontSize: 10.5, fontWeight: 700, marginTop: 6, marginBottom: 2 },
  row: { flexDirection: "row", borderBottom: `0.5 solid ${rule}`, paddingVertical: 2.5 },
  head: { flexDirection: "row", borderBottom: `1 solid ${ink}`, paddingVertical: 2.5, fontWeight: 700, fontSize: 9 },
  muted: { color: muted },
  block: { marginBottom: 8, padding: 7, border: `0.75 solid ${rule}` },
  blockTitle: { fontWeight: 700, fontSize: 11 },
  mono: { fontSize: 9.5 },
  danger_text: { color: hazard },
  caution_text: { color: caution },
  footer: { position: "absolute", bottom: 20, left: 36, right: 110, fontSize: 8, color: muted },
  // A fixed box: react-pdf lays a page-number Text out again on every page, and without a size of its own
  // it is measured wrongly once a document runs past a couple of dozen pages (it failed at 20 calculations).
  pageNumber: { position: "absolute", bottom: 20, right: 36, width: 70, height: 12, textAlign: "right", fontSize: 8, color: muted },
});
