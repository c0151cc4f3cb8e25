/**
 * The pure half of the client submit path: docs/PRODUCT.md's JSON error body
 * (`{ error: { message, fields } }`) read into a form message and the field messages react-hook-form takes.
 */
import { READY_CHECK_IDS, type ReadyIssue } from "@/lib/jobs/ready-check-ids";

export type Failure = { ok: false; status: number; message: string; fields: Record<string, string>; details: Record<string, unknown> };

export const OFFLINE_MESSAGE = "Could not reach Glowbench. Check the connection and try again.";

/** A refused answer, whatever its body holds (a proxy's HTML page reads as no body at all). */
export function readFailure(status: number, json: unknown): Failure {
  const error = (json as { error?: unknown } | null)?.error;
  const body = error && typeof error === "object" ? (error as Record<string, unknown>) : {};
  const { message, fields, ...details } = body;
  const clean: Record<string, string> = {};
  if (fields && typeof fields === "object") {
    for (const [name, text] of Object.entries(fields)) if (typeof text === "string" && text) clean[name] = text;
  }
  return { ok: false, status, message: typeof message === "string" && message ? message : `Request failed (${status}).`, fields: clean, details };
}

/** "lines[0].price" and "lines.0.price" name the same input; react-hook-form reads the dotted one. */
export function dottedPath(name: string): string {
  return name.replace(/\[(\w+)\]/g, ".$1").replace(/^\./, "");
}

/**
 * The field messages to put beside their inputs: dotted paths, and, when the form says which names it
 * holds, only those (a nested path counts by its first segment), so no message lands on an input that
 * is not there. A form-level message (empty name) stays with the form error.
 */
export function fieldErrorsOf(fields: Record<string, string>, known?: readonly string[]): [string, string][] {
  const out: [string, string][] = [];
  for (const [raw, message] of Object.entries(fields)) {
    const path = dottedPath(raw);
    if (!path) continue;
    if (known && !known.includes(path) && !known.includes(path.split(".")[0])) continue;
    out.push([path, message]);
  }
  return out;
}

/**
 * The message for a control that stands for one input (a status button, a reason box): what the server
 * said of that input when it named it, else its message for the whole request.
 */
export function messageFor(failure: Failure, name: string): string {
  return failure.fields[name] ?? failure.message;
}

/** The first input message of a refusal, else its whole message: for a small form with one status line. */
export function firstMessage(failure: Failure): string {
  return Object.values(failure.fields)[0] ?? failure.message;
}

/**
 * The checks before "ready" a 409 lists (lib/jobs/ready-checks.ts): the `checks` beside the message, or,
 * from a server that puts them in `fields`, the fields named by check. Any other refusal lists none.
 */
export function readyChecksOf(failure: Failure): ReadyIssue[] {
  if (failure.status !== 409) return [];
  const list = failure.details.checks;
  if (Array.isArray(list)) return list.filter((c): c is ReadyIssue => typeof c?.id === "string" && typeof c?.message === "string");
  return Object.entries(failure.fields)
    .filter(([id]) => (READY_CHECK_IDS as readonly string[]).includes(id))
    .map(([id, message]) => ({ id: id as ReadyIssue["id"], message }));
}
