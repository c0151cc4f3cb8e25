import { NextResponse } from "next/server";
import { createInvitation, listInvitations, revokeInvitation } from "@/db/queries/invitations";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { appUrl } from "@/server/mail/config";
import { invitationMail } from "@/lib/mail/messages";
import { sendMail } from "@/server/mail/send";
import { invitationSchema } from "@/lib/workshop/schemas";

export const GET = route({ role: "manageMembers" }, ({ member }) => NextResponse.json({ invitations: listInvitations(member) }));

export const POST = route({ role: "manageMembers", body: invitationSchema }, async ({ request, member, body: input }) => {
  // The link's address first: a server that cannot make one refuses before an invitation exists.
  const base = appUrl(request);
  const invitation = createInvitation(member, input);
  const link = `${base}/invite/${invitation.token}`;
  try {
    await sendMail({
      to: invitation.email,
      ...invitationMail({ workshopName: member.workshopName, inviterName: member.name, role: invitation.role, link, expiresAt: invitation.expiresAt }),
      workshopId: member.workshopId,
    });
  } catch (err) {
    // A link nobody received must not stay valid.
    console.error("Invitation e-mail failed", err);
    revokeInvitation(member, invitation.id, "undeliverable");
    throw new HttpError(502, "The invitation e-mail could not be sent, so no invitation was made. Check the mail settings and try again.");
  }
  const { token: _token, ...shown } = invitation;
  return NextResponse.json({ invitation: { ...shown, state: "pending" } }, { status: 201 });
});
