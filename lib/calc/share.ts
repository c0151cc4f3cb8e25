/**
 * Calculator inputs in a URL, so a result can be sent to a colleague or reopened from a job:
 * scalars as plain text ("4.7k" or an SI number), lists and objects as JSON.
 */

export function encodeInputs(inputs: Record<string, unknown>): string {
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(inputs)) {
    if (value === undefined || value === null || value === "") continue;
    params.set(name, typeof value === "object" ? JSON.stringify(value) : String(value));
  }
  return params.toString();
}

export function decodeInputs(search: URLSearchParams | Record<string, string | string[] | undefined>): Record<string, unknown> {
  const entries =
    search instanceof URLSearchParams
      ? [...search.entries()]
      : Object.entries(search).flatMap(([k, v]) => (v === undefined ? [] : [[k, Array.isArray(v) ? v[0] : v] as [string, string]]));
  const out: Record<string, unknown> = {};
  for (const [name, text] of entries) {
    const t = text.trim();
    if ((t.startsWith("[") && t.endsWith("]")) || (t.startsWith("{") && t.endsWith("}"))) {
      try {
        out[name] = JSON.parse(t);
        continue;
      } catch {
        // not JSON after all: keep the text and let the schema explain
      }
    }
    out[name] = t === "true" ? true : t === "false" ? false : t;
  }
  return out;
}

/** The Bench URL that reopens a calculator with these inputs filled in. */
export function benchHref(slug: string, inputs: Record<string, unknown>): string {
  const q = encodeInputs(inputs);
  return q ? `/bench/${slug}?${q}` : `/bench/${slug}`;
}
