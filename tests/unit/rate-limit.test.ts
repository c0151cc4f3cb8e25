import { describe, expect, test } from "vitest";
import { ACCOUNT_DELAY, ClientThrottle, GrowingDelay, RateLimiter, clientId } from "@/lib/auth/rate-limit";

describe("sliding window", () => {
  test("allows up to the limit, then asks the caller to wait until the oldest hit leaves the window", () => {
    const limiter = new RateLimiter({ max: 3, windowMs: 60_000 });
    const t0 = 1_000_000;
    for (let i = 0; i < 3; i++) {
      expect(limiter.retryAfter("a", t0 + i)).toBe(0);
      limiter.record("a", t0 + i);
    }
    expect(limiter.retryAfter("a", t0 + 10)).toBe(60);
    expect(limiter.retryAfter("b", t0 + 10)).toBe(0);
    expect(limiter.retryAfter("a", t0 + 60_001)).toBe(0);
  });

  test("clear forgets an account's failures", () => {
    const limiter = new RateLimiter({ max: 1, windowMs: 60_000 });
    limiter.record("a", 0);
    expect(limiter.retryAfter("a", 1)).toBeGreaterThan(0);
    limiter.clear("a");
    expect(limiter.retryAfter("a", 1)).toBe(0);
  });

  test("made-up keys do not pile up: expired ones are swept as new ones arrive", () => {
    const limiter = new RateLimiter({ max: 5, windowMs: 1000 });
    for (let i = 0; i < 1000; i++) limiter.record(`made-up-${i}`, 0);
    expect(limiter.size).toBe(1000);
    limiter.record("later", 5000);
    expect(limiter.size).toBe(1);
  });
});

describe("the account's growing delay (no lock-out)", () => {
  test("five free failures, then 1 s, 2 s, 4 s … never more than a minute", () => {
    const d = new GrowingDelay();
    expect(ACCOUNT_DELAY).toMatchObject({ free: 5, maxMs: 60_000 });
    let now = 0;
    for (let i = 1; i <= 4; i++) {
      d.recordFailure("acct", now);
      expect(d.retryAfter("acct", now)).toBe(0);
    }
    expect(d.recordFailure("acct", now)).toBe(5);
    expect(d.retryAfter("acct", now)).toBe(1);
    expect(d.retryAfter("acct", now + 1000)).toBe(0);
    now += 1000;
    d.recordFailure("acct", now);
    expect(d.retryAfter("acct", now)).toBe(2);
    now += 2000;
    d.recordFailure("acct", now);
    expect(d.retryAfter("acct", now)).toBe(4);
    for (let i = 0; i < 20; i++) {
      now += 60_000;
      d.recordFailure("acct", now);
    }
    // The old scheme locked the account for 15 minutes; this one never asks more than a minute.
    expect(d.retryAfter("acct", now)).toBe(60);
    expect(d.retryAfter("acct", now + 60_000)).toBe(0);
  });

  test("failures are forgotten after 15 quiet minutes, and cleared by a success", () => {
    const d = new GrowingDelay();
    for (let i = 0; i < 6; i++) d.recordFailure("a", 0);
    expect(d.retryAfter("a", 0)).toBeGreaterThan(0);
    expect(d.recordFailure("a", 15 * 60_000)).toBe(1);
    for (let i = 0; i < 6; i++) d.recordFailure("b", 0);
    d.clear("b");
    expect(d.retryAfter("b", 0)).toBe(0);
  });
});

describe("the client's address", () => {
  const req = (xff?: string) => new Request("http://localhost/api/auth/sign-in", { headers: xff ? { "x-forwarded-for": xff } : {} });

  test("without a trusted proxy, X-Forwarded-For is ignored: every direct client shares one key, whatever it sends", () => {
    const env = {};
    expect(clientId(req("203.0.113.5"), env)).toEqual({ key: "direct", shared: true });
    expect(clientId(req("198.51.100.1, 203.0.113.5"), env)).toEqual(clientId(req(), env));
  });

  test("behind a trusted proxy, the right-most hop (the one the proxy appended) is the client", () => {
    const env = { GLOWBENCH_TRUST_PROXY: "1" };
    expect(clientId(req("203.0.113.5"), env)).toEqual({ key: "ip:203.0.113.5", shared: false });
    // Whatever the client put in front of it changes nothing.
    expect(clientId(req("1.2.3.4, 203.0.113.5"), env).key).toBe("ip:203.0.113.5");
    expect(clientId(req("9.9.9.9, 8.8.8.8, 203.0.113.5"), env).key).toBe("ip:203.0.113.5");
    expect(clientId(req("::ffff:127.0.0.1"), env).key).toBe("ip:127.0.0.1");
  });

  test("the shared key of direct clients has its own, larger limit", () => {
    const t = new ClientThrottle({ max: 2, windowMs: 60_000 }, { max: 4, windowMs: 60_000 });
    const one = { key: "ip:203.0.113.5", shared: false };
    const all = { key: "direct", shared: true };
    for (let i = 0; i < 2; i++) t.record(one, 0);
    expect(t.retryAfter(one, 1)).toBeGreaterThan(0);
    for (let i = 0; i < 3; i++) t.record(all, 0);
    expect(t.retryAfter(all, 1)).toBe(0);
    t.record(all, 0);
    expect(t.retryAfter(all, 1)).toBeGreaterThan(0);
  });
});
