import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, test } from "vitest";

// instrumentation.ts's register() with the local mail sink wanted (no SMTP_URL, not production) on a fixed
// port, and the payment stand-in not (a key is set). The upload sweep it starts needs a database.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-startup-"));
const saved = { ...process.env };
Object.assign(process.env, {
  NEXT_RUNTIME: "nodejs",
  GLOWBENCH_DB: path.join(dir, "t.db"),
  GLOWBENCH_MAIL_DIR: path.join(dir, "mail"),
  STRIPE_SECRET_KEY: "sk_test_startup",
});
delete process.env.SMTP_URL;
afterAll(() => {
  process.env = saved;
  fs.rmSync(dir, { recursive: true, force: true });
});

const { register } = await import("@/instrumentation");
const { startStandIn } = await import("@/server/startup");

function occupy(): Promise<net.Server> {
  return new Promise((resolve) => {
    const s = net.createServer();
    s.listen(0, "127.0.0.1", () => resolve(s));
  });
}

describe("starting the local stand-ins", () => {
  test("a port still held by the previous process is waited out, not turned into a server that answers only 500", async () => {
    const old = await occupy();
    const port = (old.address() as net.AddressInfo).port;
    process.env.GLOWBENCH_MAIL_PORT = String(port);
    // The "previous process" lets go of the port a moment after the new one starts.
    setTimeout(() => old.close(), 600);
    await expect(register()).resolves.toBeUndefined();
    expect(process.env.SMTP_URL).toBe(`smtp://127.0.0.1:${port}`);
  });

  test("any other failure is logged and the server carries on without that stand-in", async () => {
    const logged: string[] = [];
    const original = console.error;
    console.error = (m: string) => logged.push(m);
    let calls = 0;
    try {
      const ok = await startStandIn("test service", "TestStandIn", async () => {
        calls++;
        throw Object.assign(new Error("permission denied"), { code: "EACCES" });
      });
      expect(ok).toBe(false);
    } finally {
      console.error = original;
    }
    expect(calls).toBe(1);
    expect(logged[0]).toMatch(/test service did not start/);
  });

  test("a port that stays busy is given up on after the last try, without throwing", async () => {
    let calls = 0;
    const busy = () => Promise.reject(Object.assign(new Error("listen EADDRINUSE"), { code: "EADDRINUSE" }));
    const original = console.error;
    console.error = () => {};
    try {
      expect(await startStandIn("busy service", "BusyStandIn", () => (calls++, busy()), { tries: 3, waitMs: 1 })).toBe(false);
    } finally {
      console.error = original;
    }
    expect(calls).toBe(3);
  });
});
