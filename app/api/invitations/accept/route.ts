import { NextResponse } from "next/server";
import { findCredentials } from "@/db/queries/auth";
import { INVITATION_GONE, acceptInvitation, findInvitation } from "@/db/queries/invitations";
import { notSignedIn } from "@/lib/errors";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { clientAddress, signInLimits } from "@/lib/auth/rate-limit";
import { startSession } from "@/server/auth/session";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { acceptInvitationSchema } from "@/lib/workshop/schemas";

/** Joins a workshop from an invitation link: as a new account, with an existing account's password, or as the signed-in invitee. */
export const POST = route({ auth: "optional", body: acceptInvitationSchema }, async ({ request, member, body: input }) => {
  const invitation = findInvitation(input.token);
  if (!invitation) throw new HttpError(404, "That invitation link is not valid. Check you opened the whole link from the e-mail.");
  if (invitation.state !== "pending") throw new HttpError(410, INVITATION_GONE[invitation.state]);

  let joined;
  if (input.mode === "sign-up") {
    if (invitation.accountExists) throw new HttpError(409, "That e-mail already has an account; join with its password instead.");
    joined = acceptInvitation(input.token, { name: input.name, passwordHash: await hashPassword(input.password) });
  } else if (input.mode === "sign-in") {
    // The same throttle as the sign-in page, so an invitation link is no side door for guessing.
    const address = clientAddress(request);
    const wait = Math.max(signInLimits.account.retryAfter(invitation.email), signInLimits.address.retryAfter(address));
    if (wait > 0) throw new HttpError(429, `Too many attempts. Try again in ${Math.ceil(wait / 60)} minute(s).`, {}, { "Retry-After": String(wait) });
    const credentials = findCredentials(invitation.email);
    if (!credentials || !(await verifyPassword(input.password, credentials.passwordHash))) {
      signInLimits.account.record(invitation.email);
      signInLimits.address.record(address);
      throw new HttpError(401, "That password is wrong.", { password: "That password is wrong for this address." });
    }
    signInLimits.account.clear(invitation.email);
    joined = acceptInvitation(input.token, { userId: credentials.id });
  } else {
    if (!member) throw notSignedIn();
    joined = acceptInvitation(input.token, { userId: member.userId });
  }
  await startSession(joined.userId, joined.sessionVersion, joined.workshopId);
  return NextResponse.json({ workshop: { id: joined.workshopId, name: invitation.workshopName }, role: joined.role });
});
