"use client";

import type { RunResult } from "@/lib/calc/run";
import type { OutputMeta, OutputValue, Warning } from "@/lib/calc/types";
import type { BenchDescriptor } from "@/lib/calc/types";
import { formatOutput, formatPlain, outputLabel, outputTone } from "@/lib/bench/display";
import { BAND_PAINT } from "./band-paint";
import { RowsTable, type Column } from "./rows-table";
import { ShuntsTable } from "./shunts-table";

type View = Pick<BenchDescriptor, "headlines" | "format" | "words" | "tones">;

/** A figure whose value is bad news (the descriptor's tones) is shown in the hazard (danger alone) or caution colour. */
const TONE_CLASS = { hazard: "text-hazard", caution: "text-caution" } as const;
function tone(view: View, name: string, value: OutputValue): string {
  const t = outputTone(view, name, value);
  return t ? TONE_CLASS[t] : "text-ink";
}

export function ResultsPanel({ view, outputs, run }: { view: View; outputs: readonly OutputMeta[]; run: RunResult }) {
  if (!run.ok) {
    const named = Object.keys(run.error.fields).filter((k) => k !== "_").length;
    return (
      <div data-testid="no-result" className="rounded-card border-2 border-dashed border-rule bg-panel p-6">
        <h2 className="text-lead font-bold">No result yet</h2>
        <p className="mt-1 text-muted">
          {named ? "Fix the marked field" + (named > 1 ? "s" : "") + " and the answer appears here as you type." : run.error.message}
        </p>
      </div>
    );
  }
  const { outputs: values, warnings } = run.result;
  const headline: readonly string[] = view.headlines;
  const heads = outputs.filter((o) => headline.includes(o.name));
  const rest = outputs.filter((o) => !headline.includes(o.name) && values[o.name] !== null && values[o.name] !== undefined);
  return (
    <div data-testid="result" className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2" aria-live="polite">
        {heads.map((o) => (
          <div key={o.name} className="rounded-card border border-rule bg-panel p-4 shadow-card">
            <p className="text-note font-bold text-muted">{outputLabel(view, o)}</p>
            <p data-testid={`output-${o.name}`} className={`mt-1 font-mono text-reading font-bold ${tone(view, o.name, values[o.name])}`}>
              {formatOutput(view, o, values[o.name])}
            </p>
          </div>
        ))}
      </div>
      {rest.length ? (
        <dl className="divide-y divide-rule rounded-card border border-rule bg-panel">
          {rest.map((o) => (
            <div key={o.name} className={`px-4 py-2.5 ${TABLES.has(o.name) ? "" : "flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1"}`}>
              <dt className="text-muted">{outputLabel(view, o)}</dt>
              <dd data-testid={`output-${o.name}`} className={`font-mono font-bold ${tone(view, o.name, values[o.name])}`}>
                {Array.isArray(values[o.name]) ? <ListValue name={o.name} value={values[o.name] as OutputValue[]} /> : formatOutput(view, o, values[o.name])}
              </dd>
            </div>
          ))}
        </dl>
      ) : null}
      <Notes warnings={warnings} />
    </div>
  );
}

/** List outputs drawn as a table under their label rather than beside it. */
const TABLES = new Set(["stages", "shunts", "steps"]);

/** The supply filter's stages: what each passes, the ripple after it, its current and DC drop. */
const STAGE_COLUMNS: readonly Column[] = [
  { label: "Passes (fraction)", cell: (row) => formatPlain(row.attenuation, "", 3) },
  { label: "Ripple after", cell: (row) => formatPlain(row.rippleRms, "V") },
  { label: "Current", cell: (row) => (row.current === undefined ? "" : formatPlain(row.current, "A")) },
  { label: "DC drop", cell: (row) => formatPlain(row.dcDrop, "V") },
];

/** The reforming schedule: each step's voltage, the least time to hold it and the leakage to wait for. */
const STEP_COLUMNS: readonly Column[] = [
  { label: "Voltage", cell: (row) => formatPlain(row.voltage, "V") },
  { label: "Hold at least", cell: (row) => (typeof row.minutes === "number" ? `${row.minutes} min` : "—") },
  { label: "Leakage to wait for", cell: (row) => formatPlain(row.leakageLimit, "A") },
];

function ListValue({ name, value }: { name: string; value: OutputValue[] }) {
  if (name === "bands") {
    return (
      <span className="flex flex-wrap gap-2">
        {value.map((c, i) => (
          <span key={i} className="inline-flex items-center gap-1 font-sans font-normal">
            <span className="h-4 w-2.5 rounded-sm border border-rule" style={{ background: BAND_PAINT[String(c)] }} aria-hidden="true" />
            {String(c)}
          </span>
        ))}
      </span>
    );
  }
  if (name === "shunts") return <ShuntsTable value={value} />;
  if (name === "stages") {
    if (value.length === 0) return <span className="font-sans font-normal text-muted">no stages</span>;
    return <RowsTable first="Stage" columns={STAGE_COLUMNS} value={value} />;
  }
  if (name === "steps") return <RowsTable first="Step" columns={STEP_COLUMNS} value={value} />;
  return <>{value.map(String).join(", ")}</>;
}

const NOTE_STYLE: Record<string, string> = {
  caution: "border-caution bg-caution-bg",
  info: "border-rule bg-panel",
};

/** Cautions and notes (the danger warning has its own banner). */
function Notes({ warnings }: { warnings: Warning[] }) {
  const notes = warnings.filter((w) => w.level !== "danger");
  if (!notes.length) return null;
  return (
    <ul className="flex flex-col gap-2" aria-label="Notes on this result">
      {notes.map((w) => (
        <li key={w.message} data-level={w.level} className={`rounded-chip border-l-4 p-3 text-note ${NOTE_STYLE[w.level]}`}>
          <span className="font-bold">{w.level === "caution" ? "Caution: " : "Note: "}</span>
          {w.message}
        </li>
      ))}
    </ul>
  );
}
