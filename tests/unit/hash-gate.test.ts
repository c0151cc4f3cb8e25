import { describe, expect, test } from "vitest";
import { HASH_GATE_LIMITS, HashGate, HashGateFullError } from "@/lib/auth/hash-gate";

/** A hash that finishes when the test says so. */
function held() {
  let release!: () => void;
  const done = new Promise<void>((r) => (release = r));
  return { work: () => done, release };
}

describe("the password-hash gate", () => {
  test("leaves libuv's pool (4 threads by default, Node docs) room for file I/O: at most 2 hashes run", () => {
    expect(HASH_GATE_LIMITS.running).toBeLessThan(4);
  });

  test("runs at most `running` at once, queues `waiting` more, refuses the rest at once", async () => {
    const gate = new HashGate({ running: 2, waiting: 1 });
    const jobs = [held(), held(), held()];
    const started: number[] = [];
    const runs = jobs.map((j, i) => gate.run(async () => (started.push(i), j.work())));
    await Promise.resolve();
    expect(started).toEqual([0, 1]);
    expect(gate.load).toEqual({ running: 2, waiting: 1 });
    await expect(gate.run(async () => "never")).rejects.toBeInstanceOf(HashGateFullError);
    jobs[0].release();
    await runs[0];
    await new Promise((r) => setTimeout(r, 0));
    expect(started).toEqual([0, 1, 2]);
    expect(gate.load).toEqual({ running: 2, waiting: 0 });
    jobs[1].release();
    jobs[2].release();
    await Promise.all(runs);
    expect(gate.load).toEqual({ running: 0, waiting: 0 });
  });

  test("a refusal says when to retry, and a failing hash frees its slot", async () => {
    const gate = new HashGate({ running: 1, waiting: 0 });
    const j = held();
    const first = gate.run(j.work);
    const refused = await gate.run(async () => 1).catch((e: HashGateFullError) => e);
    expect(refused).toBeInstanceOf(HashGateFullError);
    expect((refused as HashGateFullError).retryAfterSeconds).toBeGreaterThan(0);
    j.release();
    await first;
    await expect(gate.run(async () => Promise.reject(new Error("boom")))).rejects.toThrow("boom");
    expect(await gate.run(async () => 42)).toBe(42);
  });
});
