import { JOB_STATUS_LABELS, type JobStatus } from "@/lib/vocabulary";

/** Colour by stage: waiting (neutral), on the bench (the primary's tint), done (green). Caution and hazard colours are kept for results. */
const TONE: Record<JobStatus, string> = {
  "on-the-rack": "border-rule bg-sunk text-ink",
  inspecting: "border-glow/40 bg-glow-bg text-glow",
  "customer-weighing-up": "border-rule bg-sunk text-ink",
  recapping: "border-glow/40 bg-glow-bg text-glow",
  "slow-start": "border-glow/40 bg-glow-bg text-glow",
  "fault-finding": "border-glow/40 bg-glow-bg text-glow",
  aligning: "border-glow/40 bg-glow-bg text-glow",
  "at-the-counter": "border-ok/40 bg-ok-bg text-ok",
  returned: "border-rule bg-panel text-muted",
};

export function StatusBadge({ status }: { status: JobStatus }) {
  return (
    <span
      className={`inline-flex items-center whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${TONE[status]}`}
      data-testid="status-badge"
    >
      {JOB_STATUS_LABELS[status]}
    </span>
  );
}
