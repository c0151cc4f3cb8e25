"use client";

import { useRef, useState } from "react";
import { useAction } from "@/components/ui/use-submit";
import { CSV_COLUMNS } from "@/lib/jobs/parts-csv";

/** Export the list as CSV; import a CSV back (all rows or none, errors by spreadsheet row). */
export function PartsCsvTools({ jobId, canEdit }: { jobId: number; canEdit: boolean }) {
  const input = useRef<HTMLInputElement>(null);
  const [result, setResult] = useState<{ ok: boolean; message: string; rows: string[] } | null>(null);

  // The field messages here are spreadsheet rows, listed under the message rather than put on inputs.
  const { run } = useAction<{ imported: number }>({
    url: `/api/jobs/${jobId}/parts/import`,
    onDone: (data) => setResult({ ok: true, message: `Imported ${data.imported} part${data.imported === 1 ? "" : "s"}.`, rows: [] }),
    onFail: (f) => setResult({ ok: false, message: f.message, rows: Object.values(f.fields) }),
  });

  async function importFile(file: File) {
    setResult(null);
    const csv = await file.text();
    await run({ csv });
    if (input.current) input.current.value = "";
  }

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <a
          href={`/api/jobs/${jobId}/parts/csv`}
          download
          className="inline-flex min-h-11 items-center rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk"
        >
          Export CSV
        </a>
        {canEdit ? (
          <label className="inline-flex min-h-11 cursor-pointer items-center rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk focus-within:outline focus-within:outline-2 focus-within:outline-glow">
            Import CSV…
            <input ref={input} type="file" accept=".csv,text/csv" className="sr-only" onChange={(e) => e.target.files?.[0] && importFile(e.target.files[0])} />
          </label>
        ) : null}
        {canEdit ? <span className="text-note text-muted">Columns: {CSV_COLUMNS.join(", ")}. A file with any bad row imports nothing.</span> : null}
      </div>
      {result ? (
        <div role="alert" className={`rounded-card border p-3 ${result.ok ? "border-ok/50 bg-ok-bg text-ok" : "border-flag/50 bg-flag-bg"}`}>
          <p className={`font-bold ${result.ok ? "" : "text-flag"}`}>{result.message}</p>
          {result.rows.length ? (
            <ul className="mt-1 list-disc pl-5 text-note">
              {result.rows.map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
