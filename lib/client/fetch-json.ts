/** Browser-side JSON calls to our route handlers, returning docs/PRODUCT.md's error shape as data. */

export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; message: string; fields: Record<string, string> };

export async function sendJson<T>(url: string, body: unknown, method = "POST"): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  } catch {
    return { ok: false, status: 0, message: "Could not reach Glowbench. Check the connection and try again.", fields: {} };
  }
  const json = await res.json().catch(() => null);
  if (res.ok) return { ok: true, data: json as T };
  const error = json?.error ?? {};
  return { ok: false, status: res.status, message: error.message ?? `Request failed (${res.status}).`, fields: error.fields ?? {} };
}

export async function getJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const json = await res.json().catch(() => null);
  if (!res.ok) throw new Error(json?.error?.message ?? `Request failed (${res.status}).`);
  return json as T;
}
