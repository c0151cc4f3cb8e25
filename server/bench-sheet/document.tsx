import "server-only";
import { Document, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import { LIGHT } from "@/lib/theme/palette";
import { PDF_BODY } from "@/server/pdf/fonts";
import type { BenchSheetData } from "./data";

/** The printable bench sheet: A4, our own layout, set in the shipped OFL faces (server/pdf/fonts.ts). */

const ink = LIGHT.ink;
const rule = LIGHT.rule;
const muted = LIGHT.muted;
const s = StyleSheet.create({
  page: { fontFamily: PDF_BODY, fontSize: 10, color: ink, padding: 36, paddingBottom: 48, lineHeight: 1.35 },
  top: { flexDirection: "row", justifyContent: "space-between", borderBottom: `2 solid ${ink}`, paddingBottom: 6, marginBottom: 10 },
  brand: { fontSize: 9, color: muted },
  title: { fontSize: 17, fontWeight: 700, lineHeight: 1.2, marginBottom: 8 },
  facts: { flexDirection: "row", flexWrap: "wrap", marginBottom: 10 },
  fact: { width: "33%", marginBottom: 3 },
  factLabel: { fontSize: 8, color: muted },
  danger: { border: `1.5 solid ${LIGHT.hazard}`, backgroundColor: LIGHT["hazard-bg"], padding: 8, marginBottom: 12 },
  dangerHead: { fontWeight: 700, color: LIGHT.hazard, marginBottom: 2 },
  h2: { fontSize: 12.5, fontWeight: 700, marginTop: 10, marginBottom: 5, borderBottom: `1 solid ${rule}`, paddingBottom: 2 },
  row: { flexDirection: "row", borderBottom: `0.5 solid ${rule}`, paddingVertical: 2.5 },
  head: { flexDirection: "row", borderBottom: `1 solid ${ink}`, paddingVertical: 2.5, fontWeight: 700, fontSize: 9 },
  muted: { color: muted },
  calc: { marginBottom: 8, padding: 7, border: `0.75 solid ${rule}` },
  calcTitle: { fontWeight: 700, fontSize: 11 },
  mono: { fontSize: 9.5 },
  footer: { position: "absolute", bottom: 20, left: 36, right: 36, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: muted },
});

function Table({ cols, rows }: { cols: { label: string; width: string }[]; rows: string[][] }) {
  return (
    <View>
      <View style={s.head}>
        {cols.map((c) => (
          <Text key={c.label} style={{ width: c.width }}>
            {c.label}
          </Text>
        ))}
      </View>
      {rows.map((r, i) => (
        <View key={i} style={s.row} wrap={false}>
          {r.map((cell, k) => (
            <Text key={k} style={{ width: cols[k].width }}>
              {cell}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

export function BenchSheetDocument({ data }: { data: BenchSheetData }) {
  const { job } = data;
  return (
    <Document title={`Bench sheet — ${job.title}`} author={data.workshop} creator="Glowbench">
      <Page size="A4" style={s.page}>
        <View style={s.top} fixed>
          <Text style={s.brand}>{data.workshop} · Bench sheet</Text>
          <Text style={s.brand}>Job {job.number} · printed {data.printedOn}</Text>
        </View>
        <Text style={s.title}>{job.title}</Text>
        <View style={s.facts}>
          {job.facts.map(([label, value]) => (
            <View key={label} style={s.fact}>
              <Text style={s.factLabel}>{label}</Text>
              <Text>{value}</Text>
            </View>
          ))}
        </View>
        <View style={s.danger} wrap={false}>
          <Text style={s.dangerHead}>High voltage</Text>
          <Text>{data.caution}</Text>
        </View>

        <Text style={s.h2} minPresenceAhead={60}>Parts fitted</Text>
        {data.partsFitted.length ? (
          <Table
            cols={[{ label: "Ref.", width: "12%" }, { label: "Kind", width: "22%" }, { label: "Original", width: "33%" }, { label: "Fitted", width: "33%" }]}
            rows={data.partsFitted.map((p) => [p.designator, p.kind, p.original, p.replacement])}
          />
        ) : (
          <Text style={s.muted}>No parts fitted yet.</Text>
        )}
        {data.partsOutstanding.length ? <Text style={[s.muted, { marginTop: 4 }]}>Not yet fitted: {data.partsOutstanding.join(", ")}.</Text> : null}

        <Text style={s.h2} minPresenceAhead={60}>Resistor survey</Text>
        {data.resistors.length ? (
          <Table
            cols={[{ label: "Ref.", width: "14%" }, { label: "Marked", width: "16%" }, { label: "Tolerance", width: "14%" }, { label: "Measured", width: "16%" }, { label: "Deviation", width: "16%" }, { label: "Verdict", width: "24%" }]}
            rows={data.resistors.map((r) => [r.designator, r.nominal, r.tolerance, r.measured, r.deviation, r.verdict])}
          />
        ) : (
          <Text style={s.muted}>No resistors measured.</Text>
        )}

        <Text style={s.h2} minPresenceAhead={60}>Voltages</Text>
        {data.voltages.length ? (
          <Table
            cols={[{ label: "Test point", width: "32%" }, { label: "Expected", width: "16%" }, { label: "Measured", width: "16%" }, { label: "Difference", width: "14%" }, { label: "Verdict", width: "22%" }]}
            rows={data.voltages.map((r) => [r.designator, r.expected, r.measured, r.deviation, r.verdict])}
          />
        ) : (
          <Text style={s.muted}>No voltages recorded.</Text>
        )}

        <Text style={s.h2} minPresenceAhead={60}>Calculations</Text>
        {data.calculations.length === 0 ? <Text style={s.muted}>No calculations saved to this job.</Text> : null}
        {data.calculations.map((c, i) => (
          <View key={i} style={s.calc} wrap={false}>
            <Text style={s.calcTitle}>{c.title}</Text>
            <Text style={s.muted}>{c.byline}</Text>
            {c.note ? <Text style={{ fontStyle: "italic", marginVertical: 2 }}>{c.note}</Text> : null}
            {c.formulas.map((f, k) => (
              <Text key={`f${k}`} style={s.mono}>
                {f.label}: {f.text}
              </Text>
            ))}
            {c.steps.map((st, k) => (
              <Text key={`s${k}`} style={[s.mono, s.muted]}>
                {st.label}: {st.text}
              </Text>
            ))}
            <Text style={{ marginTop: 3, fontWeight: 700 }}>{c.results.map((r) => `${r.label}: ${r.value}`).join("   ·   ")}</Text>
            {c.warnings.map((w, k) => (
              <Text key={`w${k}`} style={{ color: w.level === "danger" ? LIGHT.hazard : LIGHT.caution, marginTop: 2 }}>
                {w.level === "danger" ? "Danger" : "Caution"}: {w.text}
              </Text>
            ))}
          </View>
        ))}
        <View style={s.footer} fixed>
          <Text>Figures are estimates to think with, not a guarantee of safety. Follow local codes and licensed practice.</Text>
          <Text render={({ pageNumber, totalPages }) => `${pageNumber} / ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}
