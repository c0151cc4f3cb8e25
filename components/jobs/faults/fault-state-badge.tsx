import { FAULT_STATE_LABELS, type FaultCandidateStatus, type FaultState } from "@/lib/vocabulary";

/** A fault's state in calm colours: amber while open, teal once the cause is known, green once the repair is written. */
const STATE_TONE: Record<FaultState, string> = {
  open: "border-caution/40 bg-caution-bg text-caution",
  found: "border-signal/40 bg-sunk text-signal",
  fixed: "border-ok/40 bg-ok-bg text-ok",
};

export const STATE_HINT: Record<FaultState, string> = {
  open: "Still hunting: no candidate is the cause yet.",
  found: "The cause is found; write the repair to close it.",
  fixed: "Repaired, and the repair is written down.",
};

export function FaultStateBadge({ state }: { state: FaultState }) {
  return (
    <span
      className={`whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${STATE_TONE[state]}`}
      data-testid="fault-state"
      data-state={state}
    >
      {FAULT_STATE_LABELS[state]}
    </span>
  );
}

export const STATUS_TONE: Record<FaultCandidateStatus, string> = {
  open: "border-rule bg-panel text-ink",
  "ruled-out": "border-rule bg-sunk text-muted",
  cause: "border-signal bg-glow-bg text-ink",
};
