import type { FieldError, FieldErrors } from "react-hook-form";
import type { RunResult } from "@/lib/calc/run";

/** The message at a dotted path ("stages.0.resistance") of react-hook-form's nested errors, in plain words. */
export function errorAt(errors: FieldErrors, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) {
    if (node === null || typeof node !== "object") return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === "string" && message ? plain(message) : undefined;
}

/** Drops the machine prefix some list messages carry ("tubes.0: unknown tube type …"). */
export function plain(message: string): string {
  const m = message.replace(/^[a-zA-Z]+\.\d+:\s*/, "");
  return m.charAt(0).toUpperCase() + m.slice(1);
}

/**
 * A run's field messages as react-hook-form errors keyed by dotted path ("stages.0.resistance"), so the
 * form shows what the one parse behind the result found; the whole-form message ("_") is shown apart.
 */
export function runFieldErrors(run: RunResult | null): Record<string, FieldError> {
  const out: Record<string, FieldError> = {};
  if (!run || run.ok) return out;
  for (const [path, message] of Object.entries(run.error.fields)) if (path !== "_") out[path] = { type: "validate", message };
  return out;
}
