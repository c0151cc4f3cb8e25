import { NextResponse } from "next/server";
import { findCredentials } from "@/db/queries/auth";
import { INVITATION_GONE, acceptInvitation, findInvitation } from "@/db/queries/invitations";
import { notSignedIn } from "@/lib/errors";
import { assertStrongPassword } from "@/lib/auth/strength";
import { startSession } from "@/server/auth/session";
import { clientId, gatedHash, gatedVerify, refuseIfWaiting, takeAttempt, throttles } from "@/server/auth/throttles";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { acceptInvitationSchema } from "@/lib/workshop/schemas";

/** Joins a workshop from an invitation link: as a new account, with an existing account's password, or as the signed-in invitee. */
export const POST = route({ auth: "optional", body: acceptInvitationSchema }, async ({ request, member, body: input }) => {
  const client = clientId(request);
  takeAttempt(throttles.invitationAccepts, client, "attempts");
  const invitation = findInvitation(input.token);
  if (!invitation) throw new HttpError(404, "That invitation link is not valid. Check you opened the whole link from the e-mail.");
  if (invitation.state !== "pending") throw new HttpError(410, INVITATION_GONE[invitation.state]);

  let joined;
  if (input.mode === "sign-up") {
    if (invitation.accountExists) throw new HttpError(409, "That e-mail already has an account; join with its password instead.");
    assertStrongPassword(input.password, [invitation.email, input.name, invitation.workshopName]);
    joined = acceptInvitation(input.token, { name: input.name, passwordHash: await gatedHash(input.password) });
  } else if (input.mode === "sign-in") {
    // The same throttles as the sign-in page, so an invitation link is no side door for guessing.
    refuseIfWaiting(Math.max(throttles.signInFailures.retryAfter(client), throttles.account.retryAfter(invitation.email)));
    const credentials = findCredentials(invitation.email);
    if (!credentials || !(await gatedVerify(input.password, credentials.passwordHash))) {
      throttles.signInFailures.record(client);
      throttles.account.recordFailure(invitation.email);
      throw new HttpError(401, "That password is wrong.", { password: "That password is wrong for this address." });
    }
    throttles.account.clear(invitation.email);
    joined = acceptInvitation(input.token, { userId: credentials.id });
  } else {
    if (!member) throw notSignedIn();
    joined = acceptInvitation(input.token, { userId: member.userId });
  }
  await startSession(joined.userId, joined.sessionVersion, joined.workshopId);
  return NextResponse.json({ workshop: { id: joined.workshopId, name: invitation.workshopName }, role: joined.role });
});
