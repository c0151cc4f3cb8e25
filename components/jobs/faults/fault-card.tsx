import { formatDateTime } from "@/lib/jobs/dates";
import { nextCandidate } from "@/lib/jobs/fault-state";
import type { Fault } from "@/db/queries/faults";
import { CandidateItem, type ReadingChoice } from "./candidate-item";
import { FaultStateBadge, STATE_HINT } from "./fault-state-badge";
import { CandidateAddForm, ResolutionForm } from "./fault-forms";

type FaultView = Fault;

/** Symptom → candidates in test order → evidence → the cause → the repair. */
export function FaultCard({ jobId, fault, readings, canAdd }: { jobId: number; fault: FaultView; readings: readonly ReadingChoice[]; canAdd: boolean }) {
  const ordered = [...fault.candidates].sort((a, b) => a.position - b.position);
  const next = fault.state === "open" ? nextCandidate(ordered) : undefined;
  const hasCause = ordered.some((c) => c.status === "cause");
  return (
    <article
      className="rounded-card border border-rule bg-panel p-4 shadow-card sm:p-6"
      data-testid={`fault-${fault.id}`}
      aria-labelledby={`fault-${fault.id}-h`}
    >
      <header className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
        <div className="min-w-0">
          <h3 id={`fault-${fault.id}-h`} className="text-lead font-bold">
            {fault.symptom}
          </h3>
          <p className="text-note text-muted">
            {fault.section ? (
              <>
                Points to <strong className="text-ink">{fault.section}</strong> ·{" "}
              </>
            ) : null}
            noted {formatDateTime(fault.createdAt)}
          </p>
        </div>
        <FaultStateBadge state={fault.state} />
      </header>
      <p className="mt-1 text-note text-muted">{STATE_HINT[fault.state]}</p>
      <h4 className="mb-2 mt-4 font-bold">Candidates, in the order to test them</h4>
      {ordered.length ? (
        <ol className="flex flex-col gap-2" data-testid="candidates">
          {ordered.map((c) => (
            <CandidateItem key={c.id} jobId={jobId} faultId={fault.id} candidate={c} readings={readings} next={next?.id === c.id} />
          ))}
        </ol>
      ) : (
        <p className="text-muted">No candidates yet: list what could cause it, the quickest or likeliest to test first.</p>
      )}
      {canAdd ? (
        <div className="mt-4 flex flex-col gap-4 border-t border-rule pt-4">
          <CandidateAddForm jobId={jobId} faultId={fault.id} />
          {hasCause || fault.resolution ? <ResolutionForm jobId={jobId} faultId={fault.id} resolution={fault.resolution} /> : null}
        </div>
      ) : fault.resolution ? (
        <p className="mt-3">
          <strong>Resolution:</strong> {fault.resolution}
        </p>
      ) : null}
    </article>
  );
}
