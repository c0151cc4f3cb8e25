import "server-only";
import { NextResponse } from "next/server";
import {
  ConflictError,
  DomainError,
  ForbiddenError,
  GoneError,
  NotConfiguredError,
  NotFoundError,
  NotSignedInError,
  TooLargeError,
  UnsupportedTypeError,
  UpstreamError,
  ValidationError,
} from "@/lib/errors";

/** docs/PRODUCT.md's error shape, and the one place a thrown error becomes an HTTP answer. */

export interface ApiErrorBody {
  /** Some refusals add a list beside message and fields (the checks before "ready": `checks`). */
  error: { message: string; fields: Record<string, string> } & Record<string, unknown>;
}

export function apiError(status: number, message: string, fields: Record<string, string> = {}, headers?: HeadersInit, details?: Record<string, unknown>) {
  return NextResponse.json<ApiErrorBody>({ error: { ...details, message, fields } }, { status, headers });
}

/** A JSON response from text already serialised (the calculator route builds its JSON itself). */
export function jsonTextResponse(text: string, status = 200): Response {
  return new Response(text, { status, headers: { "content-type": "application/json" } });
}

/** Raised by the route wrapper and handlers to answer with a JSON error. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string> = {},
    readonly headers?: HeadersInit,
  ) {
    super(message);
  }
}

/** The one mapping from the data layer's errors to HTTP statuses (docs/PRODUCT.md, DEVELOPERS.md "Errors"). */
const STATUS_OF: [new (...args: never[]) => DomainError, number][] = [
  [ValidationError, 400],
  [NotSignedInError, 401],
  [ForbiddenError, 403],
  [NotFoundError, 404],
  [ConflictError, 409],
  [GoneError, 410],
  [TooLargeError, 413],
  [UnsupportedTypeError, 415],
  [UpstreamError, 502],
  [NotConfiguredError, 503],
];

/** Known errors become their JSON answer; anything else a JSON 500, never an HTML page. */
export function errorResponse(err: unknown): Response {
  if (err instanceof HttpError) return apiError(err.status, err.message, err.fields, err.headers);
  if (err instanceof DomainError) {
    const status = STATUS_OF.find(([kind]) => err instanceof kind)?.[1];
    const details = "details" in err && typeof err.details === "object" ? (err.details as Record<string, unknown>) : undefined;
    if (status) return apiError(status, err.message, err.fields, undefined, details);
  }
  console.error("Unhandled route error", err);
  return apiError(500, "Something went wrong on our side; please try again.");
}
