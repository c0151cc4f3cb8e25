import { processSingleton } from "@/lib/singleton";

/**
 * A bound on password hashing running at once. scrypt at N = 2^17 takes 128 MiB and a libuv pool thread
 * (four by default, shared with file reads, DNS and zlib) for a few hundred milliseconds; 32 at once
 * filled the pool and starved every file download. At most `running` hashes run, `waiting` more queue
 * for a slot, and anything past that is refused at once, so the pool always keeps threads for file I/O
 * and a flood is answered (429) instead of being queued for half a minute.
 */

export class HashGateFullError extends Error {
  constructor(readonly retryAfterSeconds: number) {
    super("Too many password checks at once.");
  }
}

export interface HashGateLimits {
  running: number;
  waiting: number;
}

export const HASH_GATE_LIMITS: HashGateLimits = { running: 2, waiting: 6 };

export class HashGate {
  private active = 0;
  private readonly queue: (() => void)[] = [];

  constructor(private readonly limits: HashGateLimits = HASH_GATE_LIMITS) {}

  get load(): { running: number; waiting: number } {
    return { running: this.active, waiting: this.queue.length };
  }

  /** Runs `work` when a slot is free; throws HashGateFullError without waiting when the queue is full too. */
  async run<T>(work: () => Promise<T>): Promise<T> {
    if (this.active >= this.limits.running) {
      if (this.queue.length >= this.limits.waiting) throw new HashGateFullError(1);
      await new Promise<void>((resolve) => this.queue.push(resolve));
    } else {
      this.active++;
    }
    try {
      return await work();
    } finally {
      // Hand the slot straight to the next in line (active stays the same), or free it.
      const next = this.queue.shift();
      if (next) next();
      else this.active--;
    }
  }
}

/** The process's one gate: every password hash and check of the server goes through it. */
export const hashGate = processSingleton("HashGate", () => new HashGate());
