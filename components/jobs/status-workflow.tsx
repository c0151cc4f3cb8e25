"use client";

import { useState } from "react";
import { JOB_STATUSES, JOB_STATUS_LABELS, type JobStatus } from "@/lib/vocabulary";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";
import { messageFor, readyChecksOf } from "@/lib/client/submit-errors";
import type { ReadyIssue } from "@/lib/jobs/ready-checks";
import { LazyReadyChecksPanel as ReadyChecksPanel } from "./lazy-forms";

/** What each step means at the bench, in our words. */
const HINTS: Record<JobStatus, string> = {
  "on-the-rack": "In, labelled and on the rack; not opened yet.",
  inspecting: "Back off, looking for damage and cooked parts.",
  "customer-weighing-up": "The customer has the estimate and is deciding whether we go ahead.",
  recapping: "Replacing the paper and electrolytic capacitors.",
  "slow-start": "First power-up on a current-limited supply.",
  "fault-finding": "Tracing what still does not work.",
  aligning: "Peaking the IF and dial tracking.",
  "at-the-counter": "Finished and tested; on the counter for its owner to collect.",
  returned: "Back with its owner.",
};

export function StatusWorkflow({ jobId, status, canChange }: { jobId: number; status: JobStatus; canChange: boolean }) {
  const [other, setOther] = useState<JobStatus>(status);
  // A refused "ready": the checks the server listed, and the status that was asked for.
  const [held, setHeld] = useState<{ to: JobStatus; checks: ReadyIssue[] } | null>(null);
  const index = JOB_STATUSES.indexOf(status);
  const next = JOB_STATUSES[index + 1];
  const { run, error, setError, pending: busy } = useAction({ url: `/api/jobs/${jobId}/status`, onDone: () => setHeld(null) });

  async function move(to: JobStatus, override?: { override: true; reason: string }) {
    const res = await run({ status: to, ...override });
    if (res.ok) return;
    // A 409 with checks holds the move for a reason; any other refusal is said under the buttons.
    const checks = readyChecksOf(res);
    if (checks.length) {
      setError(null);
      setHeld({ to, checks });
    } else setError(messageFor(res, "reason"));
  }

  return (
    <div>
      <ol className="grid gap-1 sm:grid-cols-3 lg:grid-cols-9" aria-label="Workflow">
        {JOB_STATUSES.map((s, i) => (
          <li
            key={s}
            aria-current={s === status ? "step" : undefined}
            title={HINTS[s]}
            className={`rounded-chip border px-2 py-2 text-note leading-tight ${
              s === status ? "border-glow bg-glow text-glow-ink font-bold" : i < index ? "border-rule bg-sunk text-muted" : "border-rule bg-panel text-ink"
            }`}
          >
            <span className="block font-mono text-[0.75rem] opacity-80">{i + 1}</span>
            {JOB_STATUS_LABELS[s]}
          </li>
        ))}
      </ol>
      <p className="mt-3 text-muted">
        <strong className="text-ink">{JOB_STATUS_LABELS[status]}:</strong> {HINTS[status]}
      </p>
      {canChange ? (
        <div className="mt-4 flex flex-wrap items-end gap-3">
          {next ? (
            <Button onClick={() => move(next)} disabled={busy}>
              Move to “{JOB_STATUS_LABELS[next]}”
            </Button>
          ) : null}
          <label className="flex flex-col gap-1">
            <span className="text-note font-bold">Or set the status to</span>
            <select value={other} onChange={(e) => setOther(e.target.value as JobStatus)} className="min-h-11 rounded-chip border border-edge bg-panel px-3">
              {JOB_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {JOB_STATUS_LABELS[s]}
                </option>
              ))}
            </select>
          </label>
          <Button variant="secondary" onClick={() => move(other)} disabled={busy || other === status}>
            Set status
          </Button>
        </div>
      ) : (
        <p className="mt-3 text-note text-muted">Technicians and owners move a job along; each change is written to the Log.</p>
      )}
      {held ? (
        <div className="mt-4">
          <ReadyChecksPanel
            id={`status-checks-${jobId}`}
            checks={held.checks}
            action={`Move to “${JOB_STATUS_LABELS[held.to]}” anyway`}
            serverError={error}
            onContinue={(body) => move(held.to, body)}
            onCancel={() => setHeld(null)}
          />
        </div>
      ) : null}
      <p role="alert" className="mt-2 min-h-5 font-bold text-flag">
        {held ? "" : (error ?? "")}
      </p>
    </div>
  );
}
