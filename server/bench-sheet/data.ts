import "server-only";
import { EQUIPMENT_KIND_LABELS, JOB_STATUS_LABELS, PART_STATE_LABELS } from "@/lib/vocabulary";
import { getJobRecord } from "@/db/queries/job-record";
import type { Member } from "@/lib/auth/can";
import { formatQuantity } from "@/lib/calc/format";
import { getCalculator } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { HIGH_VOLTAGE_CAUTION } from "@/lib/calc/safety";
import type { OutputValue } from "@/lib/calc/types";
import { latexToText, pdfText } from "@/lib/jobs/latex-text";
import { PART_KIND_LABELS } from "@/lib/jobs/part-schemas";
import { VERDICT_LABELS } from "@/lib/jobs/reading-verdict";
import { benchRecordData } from "./record-data";

/** Everything the PDF bench sheet prints, as plain strings the embedded font can show. */

function outputText(value: OutputValue, unit: string): string {
  if (typeof value === "number") return formatQuantity(value, unit);
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (value === null) return "—";
  if (typeof value === "string") return value;
  return JSON.stringify(value);
}

const pct = (d: number | null) => (d === null ? "—" : `${d > 0 ? "+" : ""}${(d * 100).toFixed(1)} %`);
const date = (d: Date) => d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

export function benchSheetData(member: Member, jobId: number) {
  const record = getJobRecord(member, jobId);
  const { job } = record;
  const t = pdfText;
  const calculations = record.calculations.map((c) => {
    const calc = getCalculator(c.slug);
    const run = calc ? runCalculator(calc, c.inputs) : null;
    const results = calc
      ? calc.outputs
          .filter((o) => c.outputs[o.name] !== undefined)
          .map((o) => ({ label: t(o.label), value: t(outputText(c.outputs[o.name] as OutputValue, o.unit)) }))
      : Object.entries(c.outputs).map(([k, v]) => ({ label: k, value: t(outputText(v as OutputValue, "")) }));
    return {
      title: t(calc?.title ?? c.slug),
      note: c.note ? t(c.note) : null,
      byline: `${c.author?.name ?? "A former member"}, ${date(c.createdAt)}`,
      formulas: (calc?.formulas ?? []).map((f) => ({ label: t(f.label), text: t(latexToText(f.latex)) })),
      steps: run?.ok ? run.result.steps.map((s) => ({ label: t(s.label), text: t(latexToText(s.latex)) })) : [],
      results,
      warnings: run?.ok ? run.result.warnings.filter((w) => w.level !== "info").map((w) => ({ level: w.level, text: t(w.message) })) : [],
    };
  });
  const resistorRows = record.readings.filter((r) => r.kind === "resistor");
  const voltageRows = record.readings.filter((r) => r.kind === "voltage");
  return {
    workshop: t(member.workshopName),
    printedOn: date(new Date()),
    caution: HIGH_VOLTAGE_CAUTION,
    job: {
      number: job.number,
      title: t(job.title),
      facts: [
        ["Kind", EQUIPMENT_KIND_LABELS[job.equipmentKind]],
        ["Maker", job.maker],
        ["Model", job.model],
        ["Year", job.year ? String(job.year) : null],
        ["Customer", job.customerName],
        ["Status", JOB_STATUS_LABELS[job.status]],
        ["Came in", date(job.createdAt)],
      ]
        .filter((f): f is [string, string] => !!f[1])
        .map(([k, v]) => [k, t(v)] as [string, string]),
    },
    partsFitted: record.parts
      .filter((p) => p.state === "fitted")
      .map((p) => ({
        designator: t(p.designator),
        kind: PART_KIND_LABELS[p.kind],
        original: t([p.originalValue, p.originalRating].filter(Boolean).join(", ") || "—"),
        replacement: t([p.replacementValue, p.replacementRating].filter(Boolean).join(", ") || "—"),
        checked: p.checkedBy ? t(p.checkedBy.name) : "not yet",
      })),
    partsOutstanding: record.parts.filter((p) => p.state !== "fitted").map((p) => `${t(p.designator)} (${PART_STATE_LABELS[p.state].toLowerCase()})`),
    resistors: resistorRows.map((r) => ({
      designator: t(r.designator),
      nominal: t(formatQuantity(r.nominal, "Ω")),
      tolerance: `±${Math.round(r.tolerance * 100)} %`,
      measured: r.measured === null ? "open" : t(formatQuantity(r.measured, "Ω")),
      deviation: pct(r.deviation),
      verdict: VERDICT_LABELS[r.verdict],
    })),
    voltages: voltageRows.map((r) => ({
      designator: t(r.designator),
      expected: formatQuantity(r.nominal, "V"),
      measured: r.measured === null ? "—" : formatQuantity(r.measured, "V"),
      deviation: pct(r.deviation),
      verdict: VERDICT_LABELS[r.verdict],
    })),
    calculations,
    ...benchRecordData(member, jobId),
  };
}

export type BenchSheetData = ReturnType<typeof benchSheetData>;
