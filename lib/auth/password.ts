import { randomBytes, scrypt as scryptCb, timingSafeEqual, type ScryptOptions } from "node:crypto";

/**
 * Password hashing with scrypt at the OWASP Password Storage Cheat Sheet's parameters
 * (N = 2^17, r = 8, p = 1). Stored as `scrypt$N$r$p$salt$hash` (base64), so parameters can rise later.
 * Always the asynchronous crypto.scrypt: the work runs on libuv's pool, never on the event loop.
 */

export const SCRYPT_PARAMS = { N: 2 ** 17, r: 8, p: 1 } as const;
const KEY_LENGTH = 32;
const SALT_BYTES = 16;

/**
 * The cost new hashes get. GLOWBENCH_SCRYPT_COST (log2 N, 10–17) lowers it for the test suite only: it is
 * honoured outside production or under the test runner (VITEST, which the test server inherits), and a
 * production server that has it set refuses to hash at all rather than store weak hashes.
 */
export function scryptParams(env: NodeJS.ProcessEnv = process.env): { N: number; r: number; p: number } {
  const cost = env.GLOWBENCH_SCRYPT_COST;
  if (!cost) return SCRYPT_PARAMS;
  if (env.NODE_ENV === "production" && env.VITEST !== "true") {
    throw new Error("GLOWBENCH_SCRYPT_COST is a test-only setting and is refused in production; unset it.");
  }
  const log2 = Number(cost);
  if (!Number.isInteger(log2) || log2 < 10 || log2 > 17) throw new Error("GLOWBENCH_SCRYPT_COST must be a whole number from 10 to 17 (log2 of N).");
  return { ...SCRYPT_PARAMS, N: 2 ** log2 };
}

function scrypt(password: string, salt: Buffer, N: number, r: number, p: number): Promise<Buffer> {
  // scrypt needs about 128·N·r bytes; Node's default maxmem (32 MiB) is too small for N = 2^17.
  const options: ScryptOptions = { N, r, p, maxmem: 256 * N * r + 1024 * 1024 };
  return new Promise((resolve, reject) => scryptCb(password.normalize("NFKC"), salt, KEY_LENGTH, options, (err, key) => (err ? reject(err) : resolve(key))));
}

export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const { N, r, p } = scryptParams();
  const key = await scrypt(password, salt, N, r, p);
  return ["scrypt", N, r, p, salt.toString("base64"), key.toString("base64")].join("$");
}

export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const parts = stored.split("$");
  if (parts.length !== 6 || parts[0] !== "scrypt") return false;
  const [N, r, p] = parts.slice(1, 4).map(Number);
  if (![N, r, p].every((n) => Number.isInteger(n) && n > 0) || N > 2 ** 20) return false;
  const salt = Buffer.from(parts[4], "base64");
  const expected = Buffer.from(parts[5], "base64");
  const actual = await scrypt(password, salt, N, r, p);
  return actual.length === expected.length && timingSafeEqual(actual, expected);
}

let dummyHash: Promise<string> | undefined;
/** Spend the same time on an unknown e-mail as on a known one, so timing does not reveal accounts. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword("not-a-real-password");
  await verifyPassword(password, await dummyHash);
}
