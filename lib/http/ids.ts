import { notFound } from "@/lib/auth/errors";

/** A route's numeric id segment; anything else is simply not found (never a 500). */
export function idParam(value: string | undefined, what = "That record"): number {
  if (!value || !/^[1-9]\d{0,15}$/.test(value)) throw notFound(what);
  const n = Number(value);
  if (!Number.isSafeInteger(n)) throw notFound(what);
  return n;
}

export type JobParams = { params: Promise<{ id: string }> };
