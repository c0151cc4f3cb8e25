import { NextResponse } from "next/server";
import type { z } from "zod";
import { AuthError } from "@/lib/auth/errors";

/** JSON in and out for every route handler, in PRODUCT.md's error shape. */

export const MAX_JSON_BYTES = 64 * 1024;

export interface ApiErrorBody {
  error: { message: string; fields: Record<string, string> };
}

export function apiError(status: number, message: string, fields: Record<string, string> = {}, headers?: HeadersInit) {
  return NextResponse.json<ApiErrorBody>({ error: { message, fields } }, { status, headers });
}

/** A JSON response from text already serialised (the calculator route builds its JSON itself). */
export function jsonTextResponse(text: string, status = 200): Response {
  return new Response(text, { status, headers: { "content-type": "application/json" } });
}

/** Raised inside a handler to answer with a JSON error; caught by `handle`. */
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

/** Zod issues → `{ fieldName: message }`, first message per field, all fields. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function sameOrigin(request: Request): boolean {
  const origin = request.headers.get("origin");
  if (!origin) return true; // non-browser clients send none; browsers always do on cross-site POSTs
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  try {
    return new URL(origin).host === host;
  } catch {
    return false;
  }
}

/** For state-changing requests without a body (DELETE): refuse a foreign Origin. */
export function assertSameOrigin(request: Request): void {
  if (!sameOrigin(request)) throw new HttpError(403, "Cross-site requests are not accepted.");
}

/** Checks a state-changing request: same origin, JSON, size; returns the raw parsed body. */
export async function readJsonBody(request: Request): Promise<unknown> {
  if (!sameOrigin(request)) throw new HttpError(403, "Cross-site requests are not accepted.");
  const type = request.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) throw new HttpError(415, "Send the body as application/json.");
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > MAX_JSON_BYTES) throw new HttpError(413, "The request body is over 64 KiB.");
  const text = await request.text();
  if (Buffer.byteLength(text) > MAX_JSON_BYTES) throw new HttpError(413, "The request body is over 64 KiB.");
  try {
    return JSON.parse(text);
  } catch {
    throw new HttpError(400, "The body is not valid JSON.");
  }
}

/** Read and validate a JSON body with a zod schema; a 400 names every bad field. */
export async function parseJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.output<S>> {
  const raw = await readJsonBody(request);
  const result = schema.safeParse(raw);
  if (!result.success) throw new HttpError(400, "Some fields need attention.", fieldErrors(result.error));
  return result.data;
}

/** Validate query parameters with a zod schema. */
export function parseQuery<S extends z.ZodType>(request: Request, schema: S): z.output<S> {
  const params = Object.fromEntries(new URL(request.url).searchParams);
  const result = schema.safeParse(params);
  if (!result.success) throw new HttpError(400, "Some query parameters need attention.", fieldErrors(result.error));
  return result.data;
}

type Handler<C> = (request: Request, context: C) => Promise<Response> | Response;

/** Wraps a route handler: known errors become JSON; anything else a JSON 500, never an HTML page. */
export function handle<C>(fn: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await fn(request, context);
    } catch (err) {
      if (err instanceof HttpError) return apiError(err.status, err.message, err.fields, err.headers);
      if (err instanceof AuthError) return apiError(err.status, err.message);
      console.error("Unhandled route error", err);
      return apiError(500, "Something went wrong on our side; please try again.");
    }
  };
}
