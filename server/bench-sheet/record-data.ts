import "server-only";
import type { Member } from "@/lib/auth/can";
import { listFaults } from "@/db/queries/faults";
import { listPowerUps } from "@/db/queries/power-ups";
import { listTubes } from "@/db/queries/tubes";
import { formatQuantity } from "@/lib/calc/format";
import { pdfText as t } from "@/lib/jobs/latex-text";
import { FAULT_CANDIDATE_STATUS_LABELS, FAULT_STATE_LABELS, POWER_UP_LIMITER_LABELS, POWER_UP_OUTCOME_LABELS, TUBE_VERDICT_LABELS } from "@/lib/vocabulary";

/** The bench record's part of the bench sheet: tubes and their verdicts, each power-up's steps, faults with their causes. */

const date = (d: Date) => d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
const volts = (v: number | null) => (v === null ? "—" : formatQuantity(v, "V"));
const amps = (a: number | null) => (a === null ? "—" : formatQuantity(a, "A"));

function tubesData(member: Member, jobId: number) {
  const { tubes, seriesString } = listTubes(member, jobId);
  return {
    seriesString,
    rows: tubes.map((x) => ({
      position: t(x.position),
      type: t(x.type),
      function: t(x.function ?? "—"),
      test: x.test ? `${x.test.reading} (min. ${x.test.minimum})` : "—",
      verdict: TUBE_VERDICT_LABELS[x.verdict],
      substitute: x.substitute ? t(x.substitute) : "—",
    })),
    // Only what differs, or what needs a look: the same heater is not news on paper.
    substitutions: tubes
      .filter((x) => x.substitute)
      .map((x) => ({
        title: t(`${x.position}: ${x.type} replaced by ${x.substitute}`),
        lines: x.differences
          .filter((d) => d.level !== "info" || d.original !== d.substitute)
          .map((d) => ({ level: d.level, text: t(`${d.what}: ${d.original} (original), ${d.substitute} (substitute)${d.note ? `. ${d.note}` : ""}`) })),
      })),
  };
}

function limiterText(s: { limiter: keyof typeof POWER_UP_LIMITER_LABELS | null; lampPower: number | null; currentLimit: number | null }): string {
  if (s.limiter === null) return "Limiter not recorded (moved from the Log)";
  if (s.limiter === "series-lamp") return `${POWER_UP_LIMITER_LABELS["series-lamp"]}, ${formatQuantity(s.lampPower ?? 0, "W")}`;
  if (s.limiter === "limited-supply") return `${POWER_UP_LIMITER_LABELS["limited-supply"]}, ${amps(s.currentLimit)}`;
  return POWER_UP_LIMITER_LABELS.variac;
}

function powerUpsData(member: Member, jobId: number) {
  return listPowerUps(member, jobId).map((s, i) => ({
    title: `Session ${i + 1}, ${date(s.startedAt)}${s.author ? `, ${t(s.author.name)}` : ""}`,
    setup: t(`${limiterText(s)}; stop current ${amps(s.stopCurrent)}`),
    outcome: s.outcome ? t(`${POWER_UP_OUTCOME_LABELS[s.outcome]}${s.reason ? `: ${s.reason}` : ""}`) : t(s.reason ?? "Not closed"),
    notDone: s.checklistWarnings.map((w) => t(w.message)),
    steps: s.steps.map((st) => ({
      supply: volts(st.supplyVoltage),
      current: amps(st.currentDrawn),
      minutes: st.minutes === null ? "—" : `${st.minutes} min`,
      bPlus: volts(st.bPlus),
      note: t(`${st.overStop ? "OVER STOP CURRENT. " : ""}${st.note ?? ""}`) || "—",
      overStop: st.overStop,
    })),
  }));
}

function faultsData(member: Member, jobId: number) {
  return listFaults(member, jobId).map((f) => ({
    title: t(f.symptom),
    state: FAULT_STATE_LABELS[f.state],
    section: f.section ? t(f.section) : null,
    candidates: f.candidates.map((c) => ({
      text: t(`${c.position}. ${c.description} — ${FAULT_CANDIDATE_STATUS_LABELS[c.status].toLowerCase()}`),
      cause: c.status === "cause",
      evidence: [
        c.evidence,
        c.reading ? `reading ${c.reading.designator}: ${c.reading.measured === null ? "open" : formatQuantity(c.reading.measured, c.reading.unit)}` : null,
      ]
        .filter(Boolean)
        .map((e) => t(e!))
        .join("; "),
    })),
    resolution: f.resolution ? t(f.resolution) : null,
  }));
}

export function benchRecordData(member: Member, jobId: number) {
  return { tubes: tubesData(member, jobId), powerUps: powerUpsData(member, jobId), faults: faultsData(member, jobId) };
}
export type BenchRecordData = ReturnType<typeof benchRecordData>;
