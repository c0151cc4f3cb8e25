import { JOB_STATUS_LABELS, type JobStatus } from "@/db/enums";

/** Colour by stage: waiting (neutral), on the bench (amber), done (green). */
const TONE: Record<JobStatus, string> = {
  "booked-in": "border-rule bg-sunk text-ink",
  inspecting: "border-glow/40 bg-caution-bg text-caution",
  "awaiting-go-ahead": "border-rule bg-sunk text-ink",
  recapping: "border-glow/40 bg-caution-bg text-caution",
  "slow-start": "border-hazard/40 bg-hazard-bg text-hazard",
  "fault-finding": "border-glow/40 bg-caution-bg text-caution",
  aligning: "border-glow/40 bg-caution-bg text-caution",
  ready: "border-ok/40 bg-ok-bg text-ok",
  returned: "border-rule bg-panel text-muted",
};

export function StatusBadge({ status }: { status: JobStatus }) {
  return (
    <span className={`inline-flex items-center whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${TONE[status]}`} data-testid="status-badge">
      {JOB_STATUS_LABELS[status]}
    </span>
  );
}
