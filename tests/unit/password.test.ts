import { describe, expect, test } from "vitest";
import { readFileSync } from "node:fs";
import { SCRYPT_PARAMS, hashPassword, scryptParams, verifyPassword } from "@/lib/auth/password";

describe("password hashing", () => {
  test("uses the OWASP Password Storage Cheat Sheet's scrypt parameters (N=2^17, r=8, p=1)", async () => {
    const stored = await hashPassword("correct horse battery");
    const [scheme, N, r, p, salt, key] = stored.split("$");
    expect(scheme).toBe("scrypt");
    expect(Number(N)).toBe(2 ** 17);
    expect(Number(r)).toBe(8);
    expect(Number(p)).toBe(1);
    expect(SCRYPT_PARAMS).toEqual({ N: 2 ** 17, r: 8, p: 1 });
    expect(Buffer.from(salt, "base64")).toHaveLength(16);
    expect(Buffer.from(key, "base64")).toHaveLength(32);
  });

  test("verifies the right password and rejects a wrong one", async () => {
    const stored = await hashPassword("glowbench-demo");
    expect(await verifyPassword("glowbench-demo", stored)).toBe(true);
    expect(await verifyPassword("glowbench-demO", stored)).toBe(false);
  });

  test("salts randomly: the same password hashes differently", async () => {
    expect(await hashPassword("same password")).not.toBe(await hashPassword("same password"));
  });

  test("accepts long passphrases (64+ characters)", async () => {
    const long = "a long passphrase typed at the bench with a hot iron in the other hand ".repeat(1);
    expect(long.length).toBeGreaterThan(64);
    expect(await verifyPassword(long, await hashPassword(long))).toBe(true);
  });

  test("refuses malformed stored hashes without throwing", async () => {
    expect(await verifyPassword("x", "plain-text")).toBe(false);
    expect(await verifyPassword("x", "scrypt$abc$8$1$c2FsdA==$a2V5")).toBe(false);
  });

  test("hashes with the asynchronous crypto.scrypt, never scryptSync (the event loop stays free)", async () => {
    const source = readFileSync("lib/auth/password.ts", "utf8");
    expect(source).not.toMatch(/scryptSync/);
    // While a full-cost hash runs, timers still fire: the loop is not blocked for the hash's duration.
    let ticks = 0;
    const timer = setInterval(() => ticks++, 5);
    const started = Date.now();
    await hashPassword("event loop stays free");
    clearInterval(timer);
    const elapsed = Date.now() - started;
    expect(elapsed).toBeGreaterThan(20);
    expect(ticks).toBeGreaterThan(1);
  });

  test("GLOWBENCH_SCRYPT_COST lowers the cost for the test suite only and is refused in production", () => {
    expect(scryptParams({} as unknown as NodeJS.ProcessEnv)).toEqual(SCRYPT_PARAMS);
    expect(scryptParams({ GLOWBENCH_SCRYPT_COST: "12", NODE_ENV: "test" } as unknown as NodeJS.ProcessEnv)).toEqual({ N: 2 ** 12, r: 8, p: 1 });
    // The test server is a production build started by vitest (VITEST=true is inherited).
    expect(scryptParams({ GLOWBENCH_SCRYPT_COST: "12", NODE_ENV: "production", VITEST: "true" } as unknown as NodeJS.ProcessEnv).N).toBe(2 ** 12);
    expect(() => scryptParams({ GLOWBENCH_SCRYPT_COST: "12", NODE_ENV: "production" } as unknown as NodeJS.ProcessEnv)).toThrow(/refused in production/);
    expect(() => scryptParams({ GLOWBENCH_SCRYPT_COST: "4", NODE_ENV: "test" } as unknown as NodeJS.ProcessEnv)).toThrow(/10 to 17/);
  });
});
