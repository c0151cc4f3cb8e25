import { inject } from "vitest";

/** A tiny cookie-keeping client for the real server. */

export function baseUrl(): string {
  const url = inject("baseUrl");
  if (!url) throw new Error("No server: run `npm run build` first (npm test does), then the server tests start it.");
  return url;
}

/**
 * Each client is its own machine: the test server trusts X-Forwarded-For (GLOWBENCH_TRUST_PROXY=1), so
 * a client gets an address of its own from 198.18.0.0/15 (RFC 2544's benchmarking range) unless the test
 * names one. Without it every test would share one per-client throttle bucket.
 */
function testAddress(): string {
  const n = Math.floor(Math.random() * 2 ** 17);
  return `198.${18 + (n >> 16)}.${(n >> 8) & 255}.${n & 255}`;
}

export class Client {
  private cookie = "";
  private readonly headers: Record<string, string>;
  constructor(headers: Record<string, string> = {}) {
    this.headers = { "x-forwarded-for": testAddress(), ...headers };
  }

  async request(method: string, path: string, body?: unknown, extra: Record<string, string> = {}): Promise<Response> {
    const headers: Record<string, string> = { ...this.headers, ...extra };
    if (this.cookie) headers.cookie = this.cookie;
    let payload: BodyInit | undefined;
    if (body !== undefined) {
      if (typeof body === "string" || body instanceof FormData || body instanceof Uint8Array) payload = body as BodyInit;
      else {
        payload = JSON.stringify(body);
        headers["content-type"] ??= "application/json";
      }
    }
    const res = await fetch(`${baseUrl()}${path}`, { method, headers, body: payload, redirect: "manual" });
    const set = res.headers.getSetCookie();
    for (const c of set) {
      const [pair] = c.split(";");
      const [name] = pair.split("=");
      const rest = this.cookie.split("; ").filter((p) => p && !p.startsWith(`${name}=`));
      // A cleared cookie (empty value or Max-Age=0) is dropped.
      if (/Max-Age=0/i.test(c) || pair.endsWith("=")) this.cookie = rest.join("; ");
      else this.cookie = [...rest, pair].join("; ");
    }
    return res;
  }

  get(path: string, extra?: Record<string, string>) {
    return this.request("GET", path, undefined, extra);
  }
  post(path: string, body?: unknown, extra?: Record<string, string>) {
    return this.request("POST", path, body ?? {}, extra);
  }
  patch(path: string, body?: unknown, extra?: Record<string, string>) {
    return this.request("PATCH", path, body ?? {}, extra);
  }
  delete(path: string, extra?: Record<string, string>) {
    return this.request("DELETE", path, undefined, extra);
  }
  get cookies() {
    return this.cookie;
  }
}

export const DEMO_PASSWORD = "glowbench-demo";

export async function signedIn(email: string, password = DEMO_PASSWORD): Promise<Client> {
  const client = new Client();
  const res = await client.post("/api/auth/sign-in", { email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${await res.text()}`);
  return client;
}
