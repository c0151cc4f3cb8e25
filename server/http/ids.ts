import "server-only";
import { notFound } from "@/lib/errors";
import { parseId } from "@/lib/ids";

/** A route's numeric id segment; anything else is simply not found (never a 500). */
export function idParam(value: string | undefined, what = "That record"): number {
  const id = parseId(value);
  if (id === null) throw notFound(what);
  return id;
}
