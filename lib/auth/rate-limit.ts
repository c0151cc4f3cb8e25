/**
 * Sign-in throttling, checked before any password hashing: failures are counted per account and
 * per client address in a sliding window. In-memory, so it applies per server process — enough for
 * a workshop's single instance; a cluster would move this to the database.
 */

interface Window {
  hits: number[];
}

export interface Limit {
  max: number;
  windowMs: number;
}

export const ACCOUNT_LIMIT: Limit = { max: 5, windowMs: 15 * 60 * 1000 };
export const ADDRESS_LIMIT: Limit = { max: 20, windowMs: 15 * 60 * 1000 };

export class RateLimiter {
  private readonly windows = new Map<string, Window>();

  constructor(private readonly limit: Limit) {}

  private prune(key: string, now: number): Window {
    const w = this.windows.get(key) ?? { hits: [] };
    w.hits = w.hits.filter((t) => now - t < this.limit.windowMs);
    if (w.hits.length === 0) this.windows.delete(key);
    else this.windows.set(key, w);
    return w;
  }

  /** Seconds until another attempt is allowed, or 0 when allowed now. */
  retryAfter(key: string, now = Date.now()): number {
    const w = this.prune(key, now);
    if (w.hits.length < this.limit.max) return 0;
    return Math.max(1, Math.ceil((w.hits[0] + this.limit.windowMs - now) / 1000));
  }

  record(key: string, now = Date.now()): void {
    const w = this.prune(key, now);
    w.hits.push(now);
    this.windows.set(key, w);
  }

  clear(key: string): void {
    this.windows.delete(key);
  }
}

const globalLimits = globalThis as unknown as { __glowbenchLimits?: { account: RateLimiter; address: RateLimiter } };
export const signInLimits = (globalLimits.__glowbenchLimits ??= {
  account: new RateLimiter(ACCOUNT_LIMIT),
  address: new RateLimiter(ADDRESS_LIMIT),
});

/** The client's address: the proxy's X-Forwarded-For only when GLOWBENCH_TRUST_PROXY=1. */
export function clientAddress(request: Request): string {
  const forwarded = (request.headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  if (process.env.GLOWBENCH_TRUST_PROXY === "1" && forwarded.length) return forwarded[0];
  return forwarded.at(-1) ?? request.headers.get("x-real-ip") ?? "local";
}
