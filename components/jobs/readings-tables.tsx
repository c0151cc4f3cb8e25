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

const pct = (d: number | null) => (d === null ? "—" : `${d > 0 ? "+" : ""}${(d * 100).toFixed(1)} %`);
const th = "px-3 py-2 text-note font-bold uppercase tracking-wide text-muted";
const td = "px-3 py-2";

type Dir = "none" | "desc" | "asc";
const NEXT: Record<Dir, Dir> = { none: "desc", desc: "asc", asc: "none" };
/** Open resistors sort as the largest drift, so they lead a "worst first" list. */
const key = (r: ReadingRow) => (r.verdict === "open" ? Number.POSITIVE_INFINITY : (r.deviation ?? 0));

/** A column: its heading, and the cell it makes of a reading (the cell carries the heading as its card label on a phone). */
interface Column {
  label: string;
  cell: (r: ReadingRow) => React.ReactNode;
  mono?: boolean;
  /** The heading is a sort button instead of text. */
  sort?: { dir: Dir; onSort: () => void };
}

function SortHeading({ label, dir, onSort }: { label: string; dir: Dir; onSort: () => void }) {
  return (
    <button type="button" className="inline-flex min-h-11 items-center gap-1 uppercase hover:text-ink" onClick={onSort}>
      {label}{" "}
      <span aria-hidden="true" className="font-mono">
        {dir === "desc" ? "▼" : dir === "asc" ? "▲" : "↕"}
      </span>
    </button>
  );
}

/**
 * The two readings tables share this shell: the first column (the reference or test point) heads each
 * row and its card on a phone; the others are labelled; the verdict comes last, then Remove.
 */
function ReadingsTable({
  testId,
  minWidth,
  first,
  columns,
  rows,
  jobId,
  canEdit,
}: {
  testId: string;
  minWidth: string;
  first: Column;
  columns: Column[];
  rows: ReadingRow[];
  jobId: number;
  canEdit: boolean;
}) {
  const headings = [first, ...columns, { label: "Verdict", cell: () => null }];
  return (
    <table className={`gb-stack w-full ${minWidth} border-collapse text-left`} data-testid={testId}>
      <thead className="border-b border-rule bg-sunk/60">
        <tr>
          {headings.map((c) => (
            <th
              key={c.label}
              scope="col"
              className={th}
              aria-sort={c.sort ? (c.sort.dir === "none" ? "none" : c.sort.dir === "asc" ? "ascending" : "descending") : undefined}
            >
              {c.sort ? <SortHeading label={c.label} dir={c.sort.dir} onSort={c.sort.onSort} /> : c.label}
            </th>
          ))}
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
            <td className={`${td} font-bold ${first.mono ? "font-mono" : ""}`}>{first.cell(r)}</td>
            {columns.map((c) => (
              <td key={c.label} data-label={c.label} className={`${td} ${c.mono === false ? "" : "font-mono"}`}>
                {c.cell(r)}
              </td>
            ))}
            <td data-label="Verdict" className={td}>
              <span className={`inline-block whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${TONE[r.verdict]}`}>
                {VERDICT_LABELS[r.verdict]}
              </span>
            </td>
            {canEdit ? (
              <td className={`${td} text-right`}>
                <RemoveButton
                  url={`/api/jobs/${jobId}/readings/${r.id}`}
                  confirm={`Remove the reading for ${r.designator}?`}
                  label={`Remove reading ${r.designator}`}
                />
              </td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function ResistorSurvey({ jobId, rows, canEdit }: { jobId: number; rows: ReadingRow[]; canEdit: boolean }) {
  const [dir, setDir] = useState<Dir>("none");
  const sorted = useMemo(() => (dir === "none" ? rows : [...rows].sort((a, b) => (dir === "desc" ? key(b) - key(a) : key(a) - key(b)))), [rows, dir]);
  return (
    <ReadingsTable
      testId="resistor-survey"
      minWidth="min-w-[40rem]"
      jobId={jobId}
      canEdit={canEdit}
      rows={sorted}
      first={{ label: "Ref.", mono: true, cell: (r) => r.designator }}
      columns={[
        { label: "Marked", cell: (r) => formatQuantity(r.nominal, "Ω") },
        { label: "Tolerance", cell: (r) => `±${Math.round(r.tolerance * 100)} %` },
        { label: "Measured", cell: (r) => (r.measured === null ? "open" : formatQuantity(r.measured, "Ω")) },
        { label: "Deviation", cell: (r) => pct(r.deviation), sort: { dir, onSort: () => setDir(NEXT[dir]) } },
      ]}
    />
  );
}

export function VoltageTable({ jobId, rows, canEdit }: { jobId: number; rows: ReadingRow[]; canEdit: boolean }) {
  return (
    <ReadingsTable
      testId="voltage-readings"
      minWidth="min-w-[36rem]"
      jobId={jobId}
      canEdit={canEdit}
      rows={rows}
      first={{
        label: "Test point",
        cell: (r) => (
          <>
            {r.designator}
            {r.partDesignators ? (
              <span className="block text-note font-normal text-muted">
                across <span className="font-mono">{r.partDesignators}</span>
              </span>
            ) : null}
          </>
        ),
      }}
      columns={[
        {
          label: "Expected",
          cell: (r) => (
            <>
              {formatQuantity(r.nominal, "V")} <span className="text-muted">±{Math.round(r.tolerance * 100)} %</span>
            </>
          ),
        },
        { label: "Measured", cell: (r) => (r.measured === null ? "—" : formatQuantity(r.measured, "V")) },
        { label: "Difference", cell: (r) => pct(r.deviation) },
      ]}
    />
  );
}
