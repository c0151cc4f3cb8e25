import "server-only";
import { Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { BenchSheetData } from "./data";
import { HEADING_AHEAD, caution, hazard, s } from "./styles";

/** The bench sheet's building blocks: headings that keep company, tables whose rows never split, and the record's sections. */

export function Heading({ children }: { children: ReactNode }) {
  return (
    <Text style={s.h2} minPresenceAhead={HEADING_AHEAD}>
      {children}
    </Text>
  );
}

export function Empty({ children }: { children: ReactNode }) {
  return <Text style={s.muted}>{children}</Text>;
}

/** A table: the header row repeats nothing, but never sits alone at a page foot; rows never split. */
export function Table({ cols, rows, marked }: { cols: { label: string; width: string }[]; rows: string[][]; marked?: boolean[] }) {
  return (
    <View>
      <View style={s.head} minPresenceAhead={30} wrap={false}>
        {cols.map((c) => (
          <Text key={c.label} style={{ width: c.width }}>
            {c.label}
          </Text>
        ))}
      </View>
      {rows.map((r, i) => (
        <View key={i} style={marked?.[i] ? [s.row, s.danger_text] : s.row} wrap={false}>
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

const levelColour = (level: string) => (level === "danger" ? hazard : level === "caution" ? caution : undefined);
const levelWord = (level: string) => (level === "danger" ? "Danger: " : level === "caution" ? "Caution: " : "");

export function TubesSection({ tubes }: { tubes: BenchSheetData["tubes"] }) {
  if (!tubes.rows.length) return <Empty>No tubes listed.</Empty>;
  return (
    <View>
      <Table
        cols={[
          { label: "Socket", width: "10%" },
          { label: "Type", width: "13%" },
          { label: "Function", width: "30%" },
          { label: "Test", width: "15%" },
          { label: "Verdict", width: "15%" },
          { label: "Substitute", width: "17%" },
        ]}
        rows={tubes.rows.map((r) => [r.position, r.type, r.function, r.test, r.verdict, r.substitute])}
      />
      {tubes.seriesString ? <Text style={[s.muted, { marginTop: 3 }]}>Heaters in a series string: every heater carries the same current.</Text> : null}
      {tubes.substitutions.map((sub, i) => (
        <View key={i} style={{ marginTop: 5 }} wrap={false}>
          <Text style={{ fontWeight: 700 }}>{sub.title}</Text>
          {sub.lines.map((l, k) => (
            <Text key={k} style={{ color: levelColour(l.level) }}>
              {levelWord(l.level)}
              {l.text}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

export function PowerUpsSection({ sessions }: { sessions: BenchSheetData["powerUps"] }) {
  if (!sessions.length) return <Empty>No power-up sessions recorded.</Empty>;
  return (
    <View>
      {sessions.map((p, i) => (
        <View key={i} style={{ marginBottom: 8 }}>
          <View minPresenceAhead={50} wrap={false}>
            <Text style={s.h3}>{p.title}</Text>
            <Text>{p.setup}</Text>
            <Text>Outcome: {p.outcome}</Text>
            {p.notDone.length ? <Text style={{ color: caution }}>{p.notDone.join(" ")}</Text> : null}
          </View>
          {p.steps.length ? (
            <Table
              cols={[
                { label: "Supply", width: "13%" },
                { label: "Current", width: "13%" },
                { label: "Held", width: "11%" },
                { label: "B+", width: "12%" },
                { label: "Seen, heard or smelt", width: "51%" },
              ]}
              rows={p.steps.map((st) => [st.supply, st.current, st.minutes, st.bPlus, st.note])}
              marked={p.steps.map((st) => st.overStop)}
            />
          ) : (
            <Empty>No steps recorded.</Empty>
          )}
        </View>
      ))}
    </View>
  );
}

export function FaultsSection({ faults }: { faults: BenchSheetData["faults"] }) {
  if (!faults.length) return <Empty>No faults recorded.</Empty>;
  return (
    <View>
      {faults.map((f, i) => (
        <View key={i} style={s.block}>
          <View minPresenceAhead={40} wrap={false}>
            <Text style={s.blockTitle}>{f.title}</Text>
            <Text style={s.muted}>
              {f.state}
              {f.section ? ` · points to the ${f.section}` : ""}
            </Text>
          </View>
          {f.candidates.map((c, k) => (
            <View key={k} wrap={false} style={{ marginTop: 2 }}>
              <Text style={c.cause ? { fontWeight: 700 } : undefined}>{c.text}</Text>
              {c.evidence ? <Text style={[s.muted, { marginLeft: 10 }]}>{c.evidence}</Text> : null}
            </View>
          ))}
          {f.resolution ? <Text style={{ marginTop: 3 }}>Repair: {f.resolution}</Text> : null}
        </View>
      ))}
    </View>
  );
}

/** A saved calculation: its head stays together; long working may run onto the next page. */
export function CalculationBlock({ c }: { c: BenchSheetData["calculations"][number] }) {
  return (
    <View style={s.block}>
      <View minPresenceAhead={40} wrap={false}>
        <Text style={s.blockTitle}>{c.title}</Text>
        <Text style={s.muted}>{c.byline}</Text>
        {c.note ? <Text style={{ fontStyle: "italic", marginVertical: 2 }}>{c.note}</Text> : null}
      </View>
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
        <Text key={`w${k}`} style={{ color: levelColour(w.level), marginTop: 2 }}>
          {levelWord(w.level)}
          {w.text}
        </Text>
      ))}
    </View>
  );
}
