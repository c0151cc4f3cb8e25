/** Browser-side JSON calls to our route handlers, returning docs/PRODUCT.md's error shape as data. */
import { OFFLINE_MESSAGE, readFailure, type Failure } from "./submit-errors";

export type ApiResult<T> = { ok: true; data: T } | Failure;

/** Sends JSON, or a FormData as multipart (uploads), and reads the answer without throwing. */
export async function sendJson<T>(url: string, body: unknown, method = "POST"): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res =
      body instanceof FormData
        ? await fetch(url, { method, body })
        : await fetch(url, { method, headers: { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
  } catch {
    return { ok: false, status: 0, message: OFFLINE_MESSAGE, fields: {}, details: {} };
  }
  const json = await res.json().catch(() => null);
  if (res.ok) return { ok: true, data: json as T };
  return readFailure(res.status, json);
}

export async function getJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const json = await res.json().catch(() => null);
  if (!res.ok) throw new Error(json?.error?.message ?? `Request failed (${res.status}).`);
  return json as T;
}
