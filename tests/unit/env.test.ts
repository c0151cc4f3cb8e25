import { describe, expect, test } from "vitest";
import { storageEnv } from "@/db/env";
import { provideLocally, realProduction, serverEnv } from "@/server/env";

/** server/env.ts and db/env.ts: every variable checked in one place (README.md, "Environment"). */

function withEnv<T>(values: Record<string, string | undefined>, run: () => T): T {
  const saved = Object.fromEntries(Object.keys(values).map((k) => [k, process.env[k]]));
  const set = (entries: Record<string, string | undefined>) => {
    for (const [k, v] of Object.entries(entries)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  };
  set(values);
  try {
    return run();
  } finally {
    set(saved);
  }
}

describe("the environment, validated", () => {
  test("a value the server cannot use stops it with a message naming the variable", () => {
    expect(() => withEnv({ GLOWBENCH_PUBLIC_URL: "bench.example" }, serverEnv)).toThrow(/GLOWBENCH_PUBLIC_URL: .*full address/);
    expect(() => withEnv({ SESSION_SECRET: "too-short" }, serverEnv)).toThrow(/SESSION_SECRET: .*32 characters/);
    expect(() => withEnv({ GLOWBENCH_MAIL_PORT: "twenty-five" }, serverEnv)).toThrow(/GLOWBENCH_MAIL_PORT/);
    expect(() => withEnv({ GLOWBENCH_DEMO: "yes" }, serverEnv)).toThrow(/GLOWBENCH_DEMO is 1/);
  });

  test("an empty variable counts as unset, and defaults fill in", () => {
    const env = withEnv({ GLOWBENCH_UPLOADS: "", MAIL_FROM: "", GLOWBENCH_DB: "" }, serverEnv);
    expect(env.GLOWBENCH_UPLOADS).toBeUndefined();
    expect(env.MAIL_FROM).toBe("Glowbench <no-reply@glowbench.invalid>");
    expect(withEnv({ GLOWBENCH_DB: "" }, storageEnv).GLOWBENCH_DB).toMatch(/glowbench\.db$/);
    expect(withEnv({ GLOWBENCH_MAIL_PORT: "2525" }, serverEnv).GLOWBENCH_MAIL_PORT).toBe(2525);
  });

  test("a real production server is a production build that is not the demo", () => {
    expect(withEnv({ NODE_ENV: "production", GLOWBENCH_DEMO: undefined }, realProduction)).toBe(true);
    expect(withEnv({ NODE_ENV: "production", GLOWBENCH_DEMO: "1" }, realProduction)).toBe(false);
    expect(withEnv({ NODE_ENV: "development", GLOWBENCH_DEMO: undefined }, realProduction)).toBe(false);
  });

  test("what a local stand-in provides after start is read on the next call", () => {
    withEnv({ SMTP_URL: undefined }, () => {
      expect(serverEnv().SMTP_URL).toBeUndefined();
      provideLocally({ SMTP_URL: "smtp://127.0.0.1:2525" });
      expect(serverEnv().SMTP_URL).toBe("smtp://127.0.0.1:2525");
    });
  });
});
