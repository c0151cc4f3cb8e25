import { NextResponse } from "next/server";
import { findCredentials } from "@/db/queries/auth";
import { loadMember } from "@/db/queries/auth";
import { burnPasswordCheck, verifyPassword } from "@/lib/auth/password";
import { clientAddress, signInLimits } from "@/lib/auth/rate-limit";
import { signInSchema } from "@/lib/auth/schemas";
import { startSession } from "@/server/auth/session";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";

const WRONG = "E-mail or password is wrong.";

export const POST = route({ auth: "public", body: signInSchema }, async ({ request, body: { email, password } }) => {
  const address = clientAddress(request);

  // Throttle before any hashing, so a flood costs us nothing.
  const wait = Math.max(signInLimits.account.retryAfter(email), signInLimits.address.retryAfter(address));
  if (wait > 0) {
    throw new HttpError(429, `Too many sign-in attempts. Try again in ${Math.ceil(wait / 60)} minute(s).`, {}, { "Retry-After": String(wait) });
  }

  const credentials = findCredentials(email);
  const ok = credentials ? await verifyPassword(password, credentials.passwordHash) : (await burnPasswordCheck(password), false);
  const member = ok && credentials ? loadMember(credentials.id) : null;
  if (!credentials || !member) {
    signInLimits.account.record(email);
    signInLimits.address.record(address);
    throw new HttpError(401, WRONG);
  }
  signInLimits.account.clear(email);
  await startSession(member.userId, member.sessionVersion);
  return NextResponse.json({
    user: { id: member.userId, email: member.email, name: member.name },
    workshop: { id: member.workshopId, name: member.workshopName },
    role: member.role,
  });
});
