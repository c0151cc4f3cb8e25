import "server-only";
import type { NextRequest } from "next/server";
import type { z } from "zod";
import { assertCan, type Action, type Member } from "@/lib/auth/can";
import { notSignedIn } from "@/lib/errors";
import { fieldErrors } from "@/lib/field-errors";
import { getMember } from "@/server/auth/member";
import { HttpError, errorResponse } from "./errors";
import { MAX_JSON_BYTES, assertContentType, assertSameOrigin, readBounded } from "./body";
import { addHsts } from "./hsts";
import { idParam } from "./ids";

/**
 * The one wrapper every route handler goes through. In order, before the handler runs:
 * Origin (every state-changing method) → session → role → ids → query → content type → body, read
 * with a byte limit → zod. Errors become docs/PRODUCT.md's JSON shape; nothing but a public read is cached.
 */

type Auth = "public" | "optional" | "member";
/** A zod schema: a JSON body. "form": multipart (uploads). "raw": text the handler verifies itself (webhooks). */
type BodySpec = z.ZodType | "form" | "raw";

export interface RouteOptions<A extends Auth, B extends BodySpec | undefined, Q extends z.ZodType | undefined, I extends string, P extends string> {
  /** "member" (the default) answers 401 without a session; "optional" loads one if there is one; "public" never looks. */
  auth?: A;
  /** A rule of `can`, checked right after the session and before anything else is read. */
  role?: Action;
  /** Numeric id segments and what each one names in a 404: `{ id: "That job" }`. */
  ids?: Record<I, string>;
  /** Other segments, passed through as text: `["slug"]`. */
  params?: readonly P[];
  query?: Q;
  body?: B;
  /** The body's byte limit and the 413 that answers it; JSON bodies default to 64 KiB. */
  limit?: { bytes: number; message: string; fields?: Record<string, string> };
}

type MemberFor<A extends Auth> = A extends "public" ? null : A extends "optional" ? Member | null : Member;
type BodyFor<B> = B extends z.ZodType ? z.output<B> : B extends "form" ? FormData : B extends "raw" ? string : undefined;
type QueryFor<Q> = Q extends z.ZodType ? z.output<Q> : undefined;

export interface RouteCall<A extends Auth, B, Q, I extends string, P extends string> {
  request: NextRequest;
  member: MemberFor<A>;
  ids: Record<I, number>;
  params: Record<P, string>;
  query: QueryFor<Q>;
  body: BodyFor<B>;
}

/**
 * The context Next passes. Its params are exactly the segments the route declares in `ids` and `params`;
 * Next's generated route types (RouteContext / RouteHandlerConfig in `.next/types`) check at build time
 * that these are the segments of the folder the route lives in.
 */
export type RouteHandler<I extends string, P extends string> = (request: NextRequest, context: { params: Promise<Record<I | P, string>> }) => Promise<Response>;

const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

export function route<
  A extends Auth = "member",
  B extends BodySpec | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  I extends string = never,
  P extends string = never,
>(options: RouteOptions<A, B, Q, I, P>, handler: (call: RouteCall<A, B, Q, I, P>) => Response | Promise<Response>): RouteHandler<I, P> {
  const auth: Auth = options.role ? "member" : (options.auth ?? "member");
  return async (request, context) => {
    const writes = STATE_CHANGING.has(request.method);
    // Only a public read (the calculator list) may be cached; everything else is someone's own answer.
    const personal = auth !== "public" || writes;
    let member: Member | null = null;
    try {
      if (writes) assertSameOrigin(request);
      if (auth !== "public") {
        member = await getMember();
        if (!member && auth === "member") throw notSignedIn();
      }
      if (options.role) assertCan(member!, options.role);
      const segments = ((await context.params) ?? {}) as Record<string, string>;
      const ids = {} as Record<string, number>;
      for (const [name, what] of Object.entries<string>(options.ids ?? {})) ids[name] = idParam(segments[name], what);
      const params = {} as Record<string, string>;
      for (const name of options.params ?? []) params[name] = segments[name];
      const query = options.query ? parseQuery(request, options.query) : undefined;
      const body = options.body === undefined ? undefined : await readBody(request, options.body, options.limit);
      const call = { request, member, ids, params, query, body } as unknown as RouteCall<A, B, Q, I, P>;
      return addHsts(noStore(await handler(call), personal), request.headers);
    } catch (err) {
      return addHsts(noStore(errorResponse(err), personal), request.headers);
    }
  };
}

function parseQuery(request: Request, schema: z.ZodType): unknown {
  const result = schema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!result.success) throw new HttpError(400, "Some query parameters need attention.", fieldErrors(result.error));
  return result.data;
}

async function readBody(request: Request, spec: BodySpec, limit: RouteOptions<Auth, BodySpec, undefined, never, never>["limit"]): Promise<unknown> {
  if (spec !== "raw") assertContentType(request, spec === "form" ? "form" : "json");
  const { bytes, message, fields } = limit ?? { bytes: MAX_JSON_BYTES, message: "The request body is over 64 KiB." };
  const raw = await readBounded(request, bytes, () => new HttpError(413, message, fields));
  if (spec === "raw") return raw.toString("utf8");
  if (spec === "form") {
    try {
      return await new Response(new Uint8Array(raw), { headers: { "content-type": request.headers.get("content-type")! } }).formData();
    } catch {
      throw new HttpError(400, "The upload could not be read.", { file: "Choose the file again and retry." });
    }
  }
  let json: unknown;
  try {
    json = JSON.parse(raw.toString("utf8"));
  } catch {
    throw new HttpError(400, "The body is not valid JSON.");
  }
  const result = spec.safeParse(json);
  if (!result.success) throw new HttpError(400, "Some fields need attention.", fieldErrors(result.error));
  return result.data;
}

/** A member's answers (and sign-in's) are theirs alone: no shared or browser cache keeps them, unless the route says otherwise. */
function noStore(response: Response, personal: boolean): Response {
  if (personal && !response.headers.has("cache-control")) response.headers.set("cache-control", "no-store");
  return response;
}
