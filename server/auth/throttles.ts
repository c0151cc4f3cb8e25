import "server-only";
import { HashGateFullError, hashGate } from "@/lib/auth/hash-gate";
import { burnPasswordCheck, hashPassword, verifyPassword } from "@/lib/auth/password";
import { ClientThrottle, GrowingDelay, clientId as clientIdIn, type ClientId } from "@/lib/auth/rate-limit";
import { processSingleton } from "@/lib/singleton";
import { serverEnv } from "@/server/env";
import { HttpError } from "@/server/http/errors";

/**
 * The throttles in front of every password hash (sign-in, sign-up, reset, invitation, password change),
 * one set per process (processSingleton) so that every route bundle shares them. Each route checks its
 * throttle, then hashes through the gate, which answers 429 when too many hashes are already running.
 */

const MINUTE = 60 * 1000;

function create() {
  return {
    /** Wrong passwords per client (per proxy-reported address, or all direct clients together). */
    signInFailures: new ClientThrottle({ max: 20, windowMs: 15 * MINUTE }, { max: 200, windowMs: 15 * MINUTE }),
    /** Wrong passwords per account: a growing delay, never a lock. */
    account: new GrowingDelay(),
    signUps: new ClientThrottle({ max: 10, windowMs: 60 * MINUTE }, { max: 50, windowMs: 60 * MINUTE }),
    resetRequests: new ClientThrottle({ max: 10, windowMs: 15 * MINUTE }, { max: 60, windowMs: 15 * MINUTE }),
    resetCompletions: new ClientThrottle({ max: 10, windowMs: 15 * MINUTE }, { max: 50, windowMs: 15 * MINUTE }),
    invitationAccepts: new ClientThrottle({ max: 20, windowMs: 15 * MINUTE }, { max: 100, windowMs: 15 * MINUTE }),
  };
}

export const throttles = processSingleton("Throttles", create);

export type { ClientId };

/** The client as far as this server can know it (lib/auth/rate-limit.ts says how). */
export const clientId = (request: Request): ClientId => clientIdIn(request, serverEnv());

/** Answers 429 with Retry-After when `seconds` is above zero. */
export function refuseIfWaiting(seconds: number, what = "attempts"): void {
  if (seconds <= 0) return;
  const when = seconds < 60 ? `${seconds} second${seconds === 1 ? "" : "s"}` : `${Math.ceil(seconds / 60)} minute(s)`;
  throw new HttpError(429, `Too many ${what}. Try again in ${when}.`, {}, { "Retry-After": String(seconds) });
}

/** Counts one attempt against a per-client throttle, refusing first if the client is over it. */
export function takeAttempt(throttle: ClientThrottle, client: ClientId, what: string): void {
  refuseIfWaiting(throttle.retryAfter(client), what);
  throttle.record(client);
}

async function gated<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await hashGate.run(work);
  } catch (err) {
    if (err instanceof HashGateFullError) {
      throw new HttpError(429, "The server is busy checking passwords. Try again in a moment.", {}, { "Retry-After": String(err.retryAfterSeconds) });
    }
    throw err;
  }
}

/** Password hashing and checking for requests: bounded by the gate. The seed and tests call lib/auth/password directly. */
export const gatedHash = (password: string) => gated(() => hashPassword(password));
export const gatedVerify = (password: string, stored: string) => gated(() => verifyPassword(password, stored));
export const gatedBurn = (password: string) => gated(() => burnPasswordCheck(password));
