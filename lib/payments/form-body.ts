/**
 * Reads the payment API's form encoding (`line_items[0][price_data][currency]=gbp`, the qs "indices"
 * format the Stripe SDK sends) into nested objects and arrays. Used only by the local fake service.
 */

type Value = string | Value[] | { [key: string]: Value };

function keyPath(key: string): string[] {
  const first = key.indexOf("[");
  if (first < 0) return [key];
  const parts = [key.slice(0, first)];
  for (const m of key.slice(first).matchAll(/\[([^\]]*)\]/g)) parts.push(m[1]);
  return parts;
}

export function parseFormBody(body: string): Record<string, Value> {
  const root: Record<string, Value> = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = keyPath(key);
    let node: Record<string, Value> | Value[] = root;
    path.forEach((part, i) => {
      const last = i === path.length - 1;
      const container = node as Record<string, Value>;
      if (last) {
        container[part] = value;
        return;
      }
      const nextIsIndex = /^\d+$/.test(path[i + 1]);
      container[part] ??= nextIsIndex ? [] : {};
      node = container[part] as Record<string, Value>;
    });
  }
  return root;
}
