import { describe, expect, test } from "vitest";
import { NotConfiguredError } from "@/lib/errors";
import { HSTS_VALUE, addHsts, servedOverHttps } from "@/server/http/hsts";
import { publicOrigin } from "@/server/http/public-origin";

// What Next hands a route behind a proxy: request.url is built from the listening address (localhost),
// while the browser's host arrives in Host / X-Forwarded-Host and its scheme in X-Forwarded-Proto.
const behindProxy = () => new Request("http://localhost:3000/api/auth/password-reset", { headers: { host: "bench.example", "x-forwarded-proto": "https" } });

describe("links that leave the app (README: GLOWBENCH_PUBLIC_URL, else the request's own origin)", () => {
  test("GLOWBENCH_PUBLIC_URL wins, trailing slash or not", () => {
    const env = { NODE_ENV: "production", GLOWBENCH_PUBLIC_URL: "https://bench.example/" } as unknown as NodeJS.ProcessEnv;
    expect(publicOrigin(behindProxy(), env)).toBe("https://bench.example");
  });

  test("in development and the demo, the origin the browser used, not Next's localhost", () => {
    expect(publicOrigin(behindProxy(), { NODE_ENV: "development" } as unknown as NodeJS.ProcessEnv)).toBe("https://bench.example");
    expect(publicOrigin(behindProxy(), { NODE_ENV: "production", GLOWBENCH_DEMO: "1" } as unknown as NodeJS.ProcessEnv)).toBe("https://bench.example");
  });

  test("a production server without GLOWBENCH_PUBLIC_URL refuses loudly instead of trusting Host", () => {
    const errors: unknown[] = [];
    const original = console.error;
    console.error = (...args: unknown[]) => errors.push(args);
    try {
      expect(() => publicOrigin(behindProxy(), { NODE_ENV: "production" } as unknown as NodeJS.ProcessEnv)).toThrow(NotConfiguredError);
    } finally {
      console.error = original;
    }
    expect(String(errors[0])).toMatch(/GLOWBENCH_PUBLIC_URL/);
  });
});

describe("HSTS (RFC 6797) only where the browser came over HTTPS", () => {
  const headers = (proto?: string) => new Headers(proto ? { "x-forwarded-proto": proto } : {});

  test("an https public URL, or a trusted proxy's last X-Forwarded-Proto of https", () => {
    expect(servedOverHttps(headers(), { GLOWBENCH_PUBLIC_URL: "https://bench.example" } as unknown as NodeJS.ProcessEnv)).toBe(true);
    expect(servedOverHttps(headers("https"), { GLOWBENCH_TRUST_PROXY: "1" } as unknown as NodeJS.ProcessEnv)).toBe(true);
    expect(servedOverHttps(headers("http, https"), { GLOWBENCH_TRUST_PROXY: "1" } as unknown as NodeJS.ProcessEnv)).toBe(true);
  });

  test("never for plain HTTP, nor on a client's own say-so without a trusted proxy", () => {
    expect(servedOverHttps(headers("http"), { GLOWBENCH_TRUST_PROXY: "1" } as unknown as NodeJS.ProcessEnv)).toBe(false);
    expect(servedOverHttps(headers("https"), {} as unknown as NodeJS.ProcessEnv)).toBe(false);
    expect(servedOverHttps(headers(), { GLOWBENCH_PUBLIC_URL: "http://bench.lan" } as unknown as NodeJS.ProcessEnv)).toBe(false);
  });

  test("the header value asks for a year", () => {
    expect(HSTS_VALUE).toMatch(/max-age=31536000/);
    const saved = process.env.GLOWBENCH_PUBLIC_URL;
    process.env.GLOWBENCH_PUBLIC_URL = "https://bench.example";
    try {
      expect(addHsts(new Response("x"), new Headers()).headers.get("strict-transport-security")).toBe(HSTS_VALUE);
    } finally {
      if (saved === undefined) delete process.env.GLOWBENCH_PUBLIC_URL;
      else process.env.GLOWBENCH_PUBLIC_URL = saved;
    }
  });
});
