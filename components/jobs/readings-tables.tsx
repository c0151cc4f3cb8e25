"use client";

import { useMemo, useState } from "react";
import type { ReadingRow } from "@/db/queries/readings";
import { formatQuantity } from "@/lib/calc/format";
import { VERDICT_LABELS, type ReadingVerdict } from "@/lib/jobs/reading-verdict";
import { RemoveButton } from "./remove-button";

const TONE: Record<ReadingVerdict, string> = {
  within: "bg-ok-bg text-ok border-ok/40",
  high: "bg-caution-bg text-caution border-caution/40",
  low: "bg-caution-bg text-caution border-caution/40",
  open: "bg-flag-bg text-flag border-flag/40",
  unknown: "bg-sunk text-muted border-rule",
};

function Verdict({ v }: { v: ReadingVerdict }) {
  return <span className={`inline-block whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${TONE[v]}`}>{VERDICT_LABELS[v]}</span>;
}

const pct = (d: number | null) => (d === null ? "—" : `${d > 0 ? "+" : ""}${(d * 100).toFixed(1)} %`);
const th = "px-3 py-2 text-note font-bold uppercase tracking-wide text-muted";
const td = "px-3 py-2";

type Dir = "none" | "desc" | "asc";
/** Open resistors sort as the largest drift, so they lead a "worst first" list. */
const key = (r: ReadingRow) => (r.verdict === "open" ? Number.POSITIVE_INFINITY : (r.deviation ?? 0));

function RemoveReading({ jobId, r }: { jobId: number; r: ReadingRow }) {
  return (
    <RemoveButton url={`/api/jobs/${jobId}/readings/${r.id}`} confirm={`Remove the reading for ${r.designator}?`} label={`Remove reading ${r.designator}`} />
  );
}

export function ResistorSurvey({ jobId, rows, canEdit }: { jobId: number; rows: ReadingRow[]; canEdit: boolean }) {
  const [dir, setDir] = useState<Dir>("none");
  const sorted = useMemo(() => (dir === "none" ? rows : [...rows].sort((a, b) => (dir === "desc" ? key(b) - key(a) : key(a) - key(b)))), [rows, dir]);
  const next: Record<Dir, Dir> = { none: "desc", desc: "asc", asc: "none" };
  return (
    <table className="gb-stack w-full min-w-[40rem] border-collapse text-left" data-testid="resistor-survey">
      <thead className="border-b border-rule bg-sunk/60">
        <tr>
          <th scope="col" className={th}>
            Ref.
          </th>
          <th scope="col" className={th}>
            Marked
          </th>
          <th scope="col" className={th}>
            Tolerance
          </th>
          <th scope="col" className={th}>
            Measured
          </th>
          <th scope="col" className={th} aria-sort={dir === "none" ? "none" : dir === "asc" ? "ascending" : "descending"}>
            <button type="button" className="inline-flex min-h-11 items-center gap-1 uppercase hover:text-ink" onClick={() => setDir(next[dir])}>
              Deviation{" "}
              <span aria-hidden="true" className="font-mono">
                {dir === "desc" ? "▼" : dir === "asc" ? "▲" : "↕"}
              </span>
            </button>
          </th>
          <th scope="col" className={th}>
            Verdict
          </th>
          {canEdit ? (
            <th scope="col" className={th}>
              <span className="sr-only">Actions</span>
            </th>
          ) : null}
        </tr>
      </thead>
      <tbody className="divide-y divide-rule">
        {sorted.map((r) => (
          <tr key={r.id} data-testid={`reading-${r.designator}`}>
            <td className={`${td} font-mono font-bold`}>{r.designator}</td>
            <td data-label="Marked" className={`${td} font-mono`}>
              {formatQuantity(r.nominal, "Ω")}
            </td>
            <td data-label="Tolerance" className={`${td} font-mono`}>
              ±{Math.round(r.tolerance * 100)} %
            </td>
            <td data-label="Measured" className={`${td} font-mono`}>
              {r.measured === null ? "open" : formatQuantity(r.measured, "Ω")}
            </td>
            <td data-label="Deviation" className={`${td} font-mono`}>
              {pct(r.deviation)}
            </td>
            <td data-label="Verdict" className={td}>
              <Verdict v={r.verdict} />
            </td>
            {canEdit ? (
              <td className={`${td} text-right`}>
                <RemoveReading jobId={jobId} r={r} />
              </td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function VoltageTable({ jobId, rows, canEdit }: { jobId: number; rows: ReadingRow[]; canEdit: boolean }) {
  return (
    <table className="gb-stack w-full min-w-[36rem] border-collapse text-left" data-testid="voltage-readings">
      <thead className="border-b border-rule bg-sunk/60">
        <tr>
          <th scope="col" className={th}>
            Test point
          </th>
          <th scope="col" className={th}>
            Expected
          </th>
          <th scope="col" className={th}>
            Measured
          </th>
          <th scope="col" className={th}>
            Difference
          </th>
          <th scope="col" className={th}>
            Verdict
          </th>
          {canEdit ? (
            <th scope="col" className={th}>
              <span className="sr-only">Actions</span>
            </th>
          ) : null}
        </tr>
      </thead>
      <tbody className="divide-y divide-rule">
        {rows.map((r) => (
          <tr key={r.id} data-testid={`reading-${r.designator}`}>
            <td className={`${td} font-bold`}>
              {r.designator}
              {r.partDesignators ? (
                <span className="block text-note font-normal text-muted">
                  across <span className="font-mono">{r.partDesignators}</span>
                </span>
              ) : null}
            </td>
            <td data-label="Expected" className={`${td} font-mono`}>
              {formatQuantity(r.nominal, "V")} <span className="text-muted">±{Math.round(r.tolerance * 100)} %</span>
            </td>
            <td data-label="Measured" className={`${td} font-mono`}>
              {r.measured === null ? "—" : formatQuantity(r.measured, "V")}
            </td>
            <td data-label="Difference" className={`${td} font-mono`}>
              {pct(r.deviation)}
            </td>
            <td data-label="Verdict" className={td}>
              <Verdict v={r.verdict} />
            </td>
            {canEdit ? (
              <td className={`${td} text-right`}>
                <RemoveReading jobId={jobId} r={r} />
              </td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
