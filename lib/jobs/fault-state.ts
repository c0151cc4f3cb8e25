import type { FaultCandidateStatus, FaultState } from "@/lib/vocabulary";

/**
 * A fault's state from its candidates and resolution (docs/PRODUCT.md "Faults"): open while no candidate is
 * the cause, found once one is, fixed once the repair is written too. Reopening the cause makes the
 * fault open again even if a resolution was written, so a wrong diagnosis never shows as fixed.
 */

export interface FaultForState {
  resolution: string | null;
  candidates: readonly { status: FaultCandidateStatus }[];
}

export function faultState(fault: FaultForState): FaultState {
  if (!fault.candidates.some((c) => c.status === "cause")) return "open";
  return fault.resolution?.trim() ? "fixed" : "found";
}

/** The next candidate to test: the first still open, in the order they will be tested. */
export function nextCandidate<C extends { status: FaultCandidateStatus; position: number }>(candidates: readonly C[]): C | undefined {
  return [...candidates].sort((a, b) => a.position - b.position).find((c) => c.status === "open");
}
