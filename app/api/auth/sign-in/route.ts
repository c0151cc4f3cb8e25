import { NextResponse } from "next/server";
import { findCredentials, loadMember } from "@/db/queries/auth";
import { auditAccountEvent, userIdForEmail } from "@/db/queries/sessions";
import { signInSchema } from "@/lib/auth/schemas";
import { startSession } from "@/server/auth/session";
import { clientId, gatedBurn, gatedVerify, refuseIfWaiting, throttles } from "@/server/auth/throttles";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";

const WRONG = "E-mail or password is wrong.";

export const POST = route({ auth: "public", body: signInSchema }, async ({ request, body: { email, password } }) => {
  const client = clientId(request);

  // Throttle before any hashing, so a flood costs us nothing: the client's failures, then the account's delay.
  refuseIfWaiting(Math.max(throttles.signInFailures.retryAfter(client), throttles.account.retryAfter(email)), "sign-in attempts");

  const credentials = findCredentials(email);
  const ok = credentials ? await gatedVerify(password, credentials.passwordHash) : (await gatedBurn(password), false);
  const member = ok && credentials ? loadMember(credentials.id) : null;
  if (!credentials || !member) {
    throttles.signInFailures.record(client);
    const failures = throttles.account.recordFailure(email);
    // The moment the account's delay begins goes into its workshops' audit trail (once per run of failures).
    if (failures === throttles.account.policy.free) {
      const userId = userIdForEmail(email);
      if (userId) auditAccountEvent(userId, "sign-in.delayed", { failures });
    }
    throw new HttpError(401, WRONG);
  }
  throttles.account.clear(email);
  await startSession(member.userId, member.sessionVersion);
  auditAccountEvent(member.userId, "session.signed-in", {}, member.workshopId);
  return NextResponse.json({
    user: { id: member.userId, email: member.email, name: member.name },
    workshop: { id: member.workshopId, name: member.workshopName },
    role: member.role,
  });
});
