import { NextResponse } from "next/server";
import { changePassword } from "@/db/queries/account";
import { findCredentials } from "@/db/queries/auth";
import { changePasswordSchema } from "@/lib/auth/schemas";
import { assertStrongPassword } from "@/lib/auth/strength";
import { startSession } from "@/server/auth/session";
import { clientId, gatedHash, gatedVerify, refuseIfWaiting, throttles } from "@/server/auth/throttles";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";

/**
 * Changes the signed-in person's password. The current password is asked for (and throttled like a
 * sign-in), so an unlocked screen is not enough; every other session ends and this browser gets a fresh one.
 */
export const POST = route({ body: changePasswordSchema }, async ({ request, member, body: { currentPassword, newPassword } }) => {
  const client = clientId(request);
  refuseIfWaiting(Math.max(throttles.signInFailures.retryAfter(client), throttles.account.retryAfter(member.email)));
  const credentials = findCredentials(member.email);
  if (!credentials || !(await gatedVerify(currentPassword, credentials.passwordHash))) {
    throttles.signInFailures.record(client);
    throttles.account.recordFailure(member.email);
    throw new HttpError(400, "Your current password is not right.", { currentPassword: "That is not your current password." });
  }
  if (newPassword === currentPassword)
    throw new HttpError(400, "Choose a new password.", { newPassword: "That is the password you have now; choose a different one." });
  assertStrongPassword(newPassword, [member.email, member.name, member.workshopName], "newPassword");
  const { sessionVersion } = changePassword(member.userId, await gatedHash(newPassword));
  await startSession(member.userId, sessionVersion, member.workshopId);
  return NextResponse.json({ ok: true });
});
