import "server-only";
import { Document, Page, Text, View } from "@react-pdf/renderer";
import type { BenchSheetData } from "./data";
import { CalculationBlock, Empty, FaultsSection, Heading, PowerUpsSection, Table, TubesSection } from "./sections";
import { s } from "./styles";

/**
 * The printable bench sheet: A4, our own layout, set in the shipped OFL faces (server/pdf/fonts.ts).
 * Paginates cleanly: headings keep room below them, table rows and small blocks never split.
 */

export function BenchSheetDocument({ data }: { data: BenchSheetData }) {
  const { job } = data;
  return (
    <Document title={`Bench sheet — ${job.title}`} author={data.workshop} creator="Glowbench">
      <Page size="A4" style={s.page}>
        <View style={s.top} fixed>
          <Text style={s.brand}>{data.workshop} · Bench sheet</Text>
          <Text style={s.brand}>
            Job {job.number} · printed {data.printedOn}
          </Text>
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

        <Heading>Parts fitted</Heading>
        {data.partsFitted.length ? (
          <Table
            cols={[
              { label: "Ref.", width: "10%" },
              { label: "Kind", width: "18%" },
              { label: "Original", width: "27%" },
              { label: "Fitted", width: "27%" },
              { label: "Checked", width: "18%" },
            ]}
            rows={data.partsFitted.map((p) => [p.designator, p.kind, p.original, p.replacement, p.checked])}
          />
        ) : (
          <Empty>No parts fitted yet.</Empty>
        )}
        {data.partsOutstanding.length ? <Text style={[s.muted, { marginTop: 4 }]}>Not yet fitted: {data.partsOutstanding.join(", ")}.</Text> : null}

        <Heading>Tubes</Heading>
        <TubesSection tubes={data.tubes} />

        <Heading>Power-ups</Heading>
        <PowerUpsSection sessions={data.powerUps} />

        <Heading>Faults</Heading>
        <FaultsSection faults={data.faults} />

        <Heading>Resistor survey</Heading>
        {data.resistors.length ? (
          <Table
            cols={[
              { label: "Ref.", width: "14%" },
              { label: "Marked", width: "16%" },
              { label: "Tolerance", width: "14%" },
              { label: "Measured", width: "16%" },
              { label: "Deviation", width: "16%" },
              { label: "Verdict", width: "24%" },
            ]}
            rows={data.resistors.map((r) => [r.designator, r.nominal, r.tolerance, r.measured, r.deviation, r.verdict])}
          />
        ) : (
          <Empty>No resistors measured.</Empty>
        )}

        <Heading>Voltages</Heading>
        {data.voltages.length ? (
          <Table
            cols={[
              { label: "Test point", width: "32%" },
              { label: "Expected", width: "16%" },
              { label: "Measured", width: "16%" },
              { label: "Difference", width: "14%" },
              { label: "Verdict", width: "22%" },
            ]}
            rows={data.voltages.map((r) => [r.designator, r.expected, r.measured, r.deviation, r.verdict])}
          />
        ) : (
          <Empty>No voltages recorded.</Empty>
        )}

        <Heading>Calculations</Heading>
        {data.calculations.length === 0 ? <Empty>No calculations saved to this job.</Empty> : null}
        {data.calculations.map((c, i) => (
          <CalculationBlock key={i} c={c} />
        ))}
        <Text style={s.footer} fixed>
          Figures are estimates to think with, not a guarantee of safety. Follow local codes and licensed practice.
        </Text>
        <Text style={s.pageNumber} fixed render={({ pageNumber, totalPages }) => `${pageNumber} / ${totalPages}`} />
      </Page>
    </Document>
  );
}
