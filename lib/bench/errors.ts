import type { FieldErrors } from "react-hook-form";

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
