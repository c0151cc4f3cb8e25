import { createHash, randomBytes } from "node:crypto";

/** Single-use link tokens: 32 random bytes in the e-mail, only their SHA-256 in the database. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
