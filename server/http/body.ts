import "server-only";
import { serverEnv } from "@/server/env";
import { HttpError } from "./errors";

/** What a state-changing request must look like before its body is read: same origin, the right type, bounded. */

export const MAX_JSON_BYTES = 64 * 1024;

/** The origin (scheme, host and port) this request was addressed to, as the browser saw it. */
export function requestOrigin(request: Request): string | null {
  const first = (name: string) => request.headers.get(name)?.split(",")[0].trim() || null;
  const host = first("x-forwarded-host") ?? first("host");
  const scheme = first("x-forwarded-proto") ?? new URL(request.url).protocol.replace(/:$/, "");
  if (!host) return null;
  try {
    return new URL(`${scheme}://${host}`).origin;
  } catch {
    return null;
  }
}

/**
 * True when the request carries no Origin (non-browser clients; browsers always send one on cross-site
 * writes) or one equal, scheme included, to this server's own origin or GLOWBENCH_PUBLIC_URL's.
 */
export function sameOrigin(request: Request): boolean {
  const origin = request.headers.get("origin");
  if (origin === null) return true;
  let sent: string;
  try {
    sent = new URL(origin).origin;
  } catch {
    return false; // "null" (sandboxed frames, file: pages) and garbage
  }
  const configured = serverEnv().GLOWBENCH_PUBLIC_URL;
  if (configured && URL.canParse(configured) && new URL(configured).origin === sent) return true;
  return sent === requestOrigin(request);
}

export function assertSameOrigin(request: Request): void {
  if (!sameOrigin(request)) throw new HttpError(403, "Cross-site requests are not accepted.");
}

/**
 * Reads the body as it arrives and stops at `limit` bytes, so a chunked body without Content-Length
 * costs at most `limit` bytes of memory however long the sender goes on. The rest is left unread rather
 * than cancelled: cancelling resets the connection before the 413 is sent, and closing right after it
 * (Connection: close) resets it under a sender still writing, which can lose the answer. Unread, the
 * answer goes out, the sender stops, and the idle connection closes at the server's keep-alive timeout.
 */
export async function readBounded(request: Request, limit: number, tooLarge: () => HttpError): Promise<Buffer> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > limit) throw tooLarge();
  if (!request.body) return Buffer.alloc(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.byteLength;
      if (size > limit) throw tooLarge();
      chunks.push(value);
    }
  } finally {
    reader.releaseLock();
  }
  return Buffer.concat(chunks, size);
}

/** Content types a route may take; the message answers a 415. */
export const BODY_TYPES = {
  json: { pattern: /^application\/json\b/i, refusal: "Send the body as application/json." },
  form: { pattern: /^multipart\/form-data\b/i, refusal: "Send the file as multipart/form-data." },
} as const;

export function assertContentType(request: Request, kind: keyof typeof BODY_TYPES): void {
  const { pattern, refusal } = BODY_TYPES[kind];
  if (!pattern.test(request.headers.get("content-type") ?? "")) throw new HttpError(415, refusal);
}
