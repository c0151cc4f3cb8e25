import { z } from "zod";
import { ConflictError } from "@/lib/errors";
import type { FaultState, PartState, PowerUpOutcome } from "@/lib/vocabulary";
import { optionalText } from "./fields";
import type { ReadyIssue } from "./ready-check-ids";

/**
 * Checks before "ready" (issue: moving a job to ready-to-collect or sending the customer's message).
 * Pure: the job's record in, the things still undone out. They warn; an owner or technician may go on
 * with a reason, which goes to the Log.
 */

export { READY_CHECK_IDS, type ReadyCheckId, type ReadyIssue } from "./ready-check-ids";

export interface ReadyRecord {
  parts: readonly { designator: string; state: PartState }[];
  faults: readonly { symptom: string; state: FaultState }[];
  powerUps: readonly { outcome: PowerUpOutcome | null }[];
}

/** At most this many names in a message; the rest are counted. */
const NAMED = 6;

function listed(names: readonly string[]): string {
  const shown = names.slice(0, NAMED).join(", ");
  return names.length > NAMED ? `${shown} and ${names.length - NAMED} more` : shown;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function readyChecks(record: ReadyRecord): ReadyIssue[] {
  const issues: ReadyIssue[] = [];
  const unfitted = record.parts.filter((p) => p.state !== "fitted").map((p) => p.designator);
  if (unfitted.length) {
    issues.push({
      id: "parts-not-fitted",
      message: `${plural(unfitted.length, "part on the list is", "parts on the list are")} not fitted yet: ${listed(unfitted)}.`,
    });
  }
  // "found" is still open work: the cause is known but the repair is not written.
  const unfixed = record.faults.filter((f) => f.state !== "fixed").map((f) => `“${f.symptom}”`);
  if (unfixed.length) issues.push({ id: "open-faults", message: `${plural(unfixed.length, "fault is", "faults are")} not fixed: ${listed(unfixed)}.` });
  if (!record.powerUps.some((p) => p.outcome === "passed")) {
    issues.push({
      id: "no-passed-power-up",
      message: record.powerUps.length ? "No power-up session has been marked passed." : "No power-up session has been recorded.",
    });
  }
  return issues;
}

/** What the status change and the ready message accept to go on despite the checks. */
export const readyOverrideFields = {
  override: z.boolean({ error: "Send override as true or false." }).optional(),
  reason: optionalText(1000, "The reason"),
};

/** Refuses `override: true` without a reason, naming the field. */
export function requireOverrideReason(v: { override?: boolean; reason?: string | null }, ctx: z.RefinementCtx): void {
  if (v.override && !v.reason) ctx.addIssue({ code: "custom", path: ["reason"], message: "Say why the job may go ahead with these checks open." });
}

/** The 409 of a refused "ready": the message, and the checks as a list for the form to show. */
export class ReadyChecksError extends ConflictError {
  readonly details: { checks: ReadyIssue[] };
  constructor(readonly checks: ReadyIssue[]) {
    super(`Before “ready”: ${checks.map((c) => c.message).join(" ")} Continue with a reason, or finish these first.`);
    this.details = { checks };
  }
}
