"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { FaultCandidate } from "@/db/queries/faults";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useAction } from "@/components/ui/use-submit";
import { formatQuantity } from "@/lib/calc/format";
import { messageFor } from "@/lib/client/submit-errors";
import { candidateUpdateSchema } from "@/lib/jobs/fault-schemas";
import { FAULT_CANDIDATE_STATUSES, FAULT_CANDIDATE_STATUS_LABELS, type FaultCandidateStatus } from "@/lib/vocabulary";
import { fieldError, useRecordForm } from "../record-form";
import { STATUS_TONE } from "./fault-state-badge";

type CandidateView = Pick<FaultCandidate, "id" | "position" | "description" | "status" | "evidence" | "readingId" | "reading">;

export interface ReadingChoice {
  id: number;
  label: string;
}

export function readingText(r: NonNullable<CandidateView["reading"]>): string {
  return `${r.designator}: ${r.measured === null ? "open" : formatQuantity(r.measured, r.unit)}`;
}

function EvidenceForm({
  url,
  candidate,
  readings,
  onClose,
}: {
  url: string;
  candidate: CandidateView;
  readings: readonly ReadingChoice[];
  onClose: () => void;
}) {
  const defaults = { evidence: candidate.evidence ?? "", readingId: candidate.readingId ? String(candidate.readingId) : "" };
  const { form, onSubmit, formError } = useRecordForm<typeof defaults, typeof candidateUpdateSchema>(candidateUpdateSchema, {
    url,
    method: "PATCH",
    defaults,
    onDone: onClose,
  });
  const { errors, isSubmitting } = form.formState;
  const err = (n: string) => fieldError(errors as Record<string, unknown>, n);
  const id = (n: string) => `cand-${candidate.id}-${n}`;
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Evidence for ${candidate.description}`} className="mt-2 grid gap-x-3 sm:grid-cols-2">
      <TextareaField
        id={id("evidence")}
        label="Evidence"
        rows={2}
        placeholder="Substituted a known-good tube: no change"
        error={err("evidence")}
        {...form.register("evidence")}
      />
      <SelectField
        id={id("reading")}
        label="Or a reading"
        hint={readings.length ? "From this job's Readings tab" : "No readings on this job yet"}
        options={[{ value: "", label: "None" }, ...readings.map((r) => ({ value: String(r.id), label: r.label }))]}
        error={err("readingId")}
        {...form.register("readingId")}
      />
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          Save evidence
        </Button>
        <Button type="button" variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}

/** One suspect: its place in the test order, its status as three buttons, and the evidence for it. */
export function CandidateItem({
  jobId,
  faultId,
  candidate,
  readings,
  next,
}: {
  jobId: number;
  faultId: number;
  candidate: CandidateView;
  readings: readonly ReadingChoice[];
  next: boolean;
}) {
  const [editing, setEditing] = useState(false);
  const url = `/api/jobs/${jobId}/faults/${faultId}/candidates/${candidate.id}`;
  const { run, error, setError, pending: busy } = useAction({ url, method: "PATCH" });
  async function mark(status: FaultCandidateStatus) {
    const res = await run({ status });
    if (!res.ok) setError(messageFor(res, "status"));
  }
  const c = candidate;
  return (
    <li className={`rounded-card border p-3 ${STATUS_TONE[c.status]}`} data-testid={`candidate-${c.position}`} data-status={c.status}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
        <p className={`min-w-0 ${c.status === "ruled-out" ? "text-muted line-through decoration-muted/60" : ""}`}>
          <span className="mr-2 font-mono font-bold">{c.position}.</span>
          <span className="font-bold">{c.description}</span>
        </p>
        {next ? <span className="rounded-full bg-glow px-2 py-0.5 text-note font-bold text-glow-ink">Test next</span> : null}
      </div>
      {c.evidence || c.reading ? (
        <p className="mt-1 text-note">
          <span className="text-muted">Evidence: </span>
          {c.evidence}
          {c.evidence && c.reading ? " · " : ""}
          {c.reading ? <span className="font-mono">{readingText(c.reading)}</span> : null}
        </p>
      ) : null}
      <div className="mt-2 flex flex-wrap items-center gap-2">
        {/* One control with three positions: the pressed one is the candidate's status. */}
        <div
          role="group"
          aria-label={`Status of ${c.description}`}
          className="grid w-full grid-cols-3 overflow-hidden rounded-chip border border-edge sm:inline-grid sm:w-auto"
        >
          {FAULT_CANDIDATE_STATUSES.map((s) => {
            const on = c.status === s;
            return (
              <button
                key={s}
                type="button"
                aria-pressed={on}
                disabled={busy}
                onClick={() => (on ? undefined : mark(s))}
                className={`min-h-11 border-l border-edge px-2 text-note font-bold leading-tight first:border-l-0 disabled:cursor-wait sm:px-4 sm:text-body ${on ? "bg-glow text-glow-ink" : "bg-panel text-ink hover:bg-sunk"}`}
              >
                {FAULT_CANDIDATE_STATUS_LABELS[s]}
              </button>
            );
          })}
        </div>
        {!editing ? (
          <Button
            type="button"
            variant="quiet"
            onClick={() => setEditing(true)}
            aria-label={`${c.evidence || c.reading ? "Edit" : "Add"} evidence for ${c.description}`}
          >
            {c.evidence || c.reading ? "Edit evidence" : "Add evidence"}
          </Button>
        ) : null}
      </div>
      {error ? (
        <p role="alert" className="mt-1 text-note font-bold text-flag">
          {error}
        </p>
      ) : null}
      {editing ? <EvidenceForm url={url} candidate={c} readings={readings} onClose={() => setEditing(false)} /> : null}
    </li>
  );
}
