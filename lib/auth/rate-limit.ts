/**
 * Throttles for everything that leads to a password hash, checked before any hashing. In memory, so they
 * apply per server process: enough for a workshop's single instance (SQLite allows one writer anyway); a
 * cluster would move them to shared storage. We keep these ~100 lines rather than take a limiter library:
 * sliding windows and the account's growing delay are all we need, and each step is tested here
 * (tests/unit/rate-limit.test.ts). Expired keys are swept as new ones arrive, so made-up keys cannot pile up.
 */

export interface Limit {
  max: number;
  windowMs: number;
}

const MINUTE = 60 * 1000;

/** At most `max` events per key in any `windowMs`. */
export class RateLimiter {
  private readonly hits = new Map<string, number[]>();
  private lastSweep = 0;

  constructor(readonly limit: Limit) {}

  private live(key: string, now: number): number[] {
    const kept = (this.hits.get(key) ?? []).filter((t) => now - t < this.limit.windowMs);
    if (kept.length) this.hits.set(key, kept);
    else this.hits.delete(key);
    return kept;
  }

  /** Seconds until another event is allowed, or 0 when allowed now. */
  retryAfter(key: string, now = Date.now()): number {
    const hits = this.live(key, now);
    if (hits.length < this.limit.max) return 0;
    return Math.max(1, Math.ceil((hits[hits.length - this.limit.max] + this.limit.windowMs - now) / 1000));
  }

  record(key: string, now = Date.now()): void {
    this.sweep(now);
    // Only the newest `max` matter for the window, so a key never holds more.
    const hits = [...this.live(key, now), now].slice(-this.limit.max);
    this.hits.set(key, hits);
  }

  clear(key: string): void {
    this.hits.delete(key);
  }

  get size(): number {
    return this.hits.size;
  }

  private sweep(now: number): void {
    if (now - this.lastSweep < this.limit.windowMs) return;
    this.lastSweep = now;
    for (const [key, hits] of this.hits) if (now - hits[hits.length - 1] >= this.limit.windowMs) this.hits.delete(key);
  }
}

export interface DelayPolicy {
  /** Failures allowed with no wait. */
  free: number;
  /** The wait after the last free failure; it doubles with each failure after that… */
  baseMs: number;
  /** …up to this, so nobody can stretch it into a lock-out of a colleague. */
  maxMs: number;
  /** Failures are forgotten this long after the last one. */
  forgetMs: number;
}

/** Per account: five tries, then 1 s, 2 s, 4 s … at most a minute between tries; never a 15-minute lock. */
export const ACCOUNT_DELAY: DelayPolicy = { free: 5, baseMs: 1000, maxMs: MINUTE, forgetMs: 15 * MINUTE };

/** A growing delay after repeated failures, in place of a lock-out. */
export class GrowingDelay {
  private readonly entries = new Map<string, { failures: number; last: number }>();
  private lastSweep = 0;

  constructor(readonly policy: DelayPolicy = ACCOUNT_DELAY) {}

  private entry(key: string, now: number) {
    const e = this.entries.get(key);
    if (e && now - e.last >= this.policy.forgetMs) {
      this.entries.delete(key);
      return undefined;
    }
    return e;
  }

  /** The wait after `failures` failures, in milliseconds. */
  delayMs(failures: number): number {
    if (failures < this.policy.free) return 0;
    return Math.min(this.policy.baseMs * 2 ** (failures - this.policy.free), this.policy.maxMs);
  }

  /** Seconds to wait before the next try, or 0. Refused tries are not failures: they never lengthen it. */
  retryAfter(key: string, now = Date.now()): number {
    const e = this.entry(key, now);
    if (!e) return 0;
    const left = this.delayMs(e.failures) - (now - e.last);
    return left > 0 ? Math.ceil(left / 1000) : 0;
  }

  /** Counts a failure; returns the count, so the caller can note the moment the delay begins. */
  recordFailure(key: string, now = Date.now()): number {
    this.sweep(now);
    const failures = (this.entry(key, now)?.failures ?? 0) + 1;
    this.entries.set(key, { failures, last: now });
    return failures;
  }

  clear(key: string): void {
    this.entries.delete(key);
  }

  private sweep(now: number): void {
    if (now - this.lastSweep < this.policy.forgetMs) return;
    this.lastSweep = now;
    for (const [key, e] of this.entries) if (now - e.last >= this.policy.forgetMs) this.entries.delete(key);
  }
}

/** Who is asking, as far as the server can know. */
export interface ClientId {
  key: string;
  /** True when clients cannot be told apart, so every direct client shares this key. */
  shared: boolean;
}

/**
 * With GLOWBENCH_TRUST_PROXY=1, the right-most X-Forwarded-For hop: the address our own proxy saw and
 * appended; anything to its left is whatever the client sent. Without it there is no trustworthy address:
 * Next.js gives route handlers no socket address (it copies the socket's into X-Forwarded-For only when
 * the client sent none, so the header stays the client's to write). Every direct client then shares one
 * key, with limits sized for that, and changing a header changes nothing.
 */
export function clientId(request: Request, env: { GLOWBENCH_TRUST_PROXY?: string }): ClientId {
  if (env.GLOWBENCH_TRUST_PROXY === "1") {
    const hops = (request.headers.get("x-forwarded-for") ?? "")
      .split(",")
      .map((s) => s.trim())
      .filter(Boolean);
    const last = hops.at(-1);
    if (last) return { key: `ip:${last.replace(/^::ffff:/, "")}`, shared: false };
  }
  return { key: "direct", shared: true };
}

/** A per-client window with a separate, larger one for the shared key of direct clients. */
export class ClientThrottle {
  private readonly perClient: RateLimiter;
  private readonly shared: RateLimiter;

  constructor(perClient: Limit, shared: Limit) {
    this.perClient = new RateLimiter(perClient);
    this.shared = new RateLimiter(shared);
  }

  private pick(client: ClientId) {
    return client.shared ? this.shared : this.perClient;
  }

  retryAfter(client: ClientId, now = Date.now()): number {
    return this.pick(client).retryAfter(client.key, now);
  }

  record(client: ClientId, now = Date.now()): void {
    this.pick(client).record(client.key, now);
  }
}
