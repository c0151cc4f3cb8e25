import { expect, test } from "vitest";
import { RateLimiter } from "@/lib/auth/rate-limit";

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
