import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { JoinExistingForm, JoinNewForm, JoinSignedIn } from "@/components/auth/join-forms";
import { ROLE_LABELS } from "@/components/workshop/role-labels";
import { INVITATION_GONE, findInvitation } from "@/db/queries/invitations";
import { getMember } from "@/server/auth/member";
import { tokenField } from "@/lib/workshop/schemas";

export const metadata: Metadata = { title: "Join a workshop", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

function Gone({ title, message }: { title: string; message: string }) {
  return (
    <>
      <h1 className="text-title font-bold">{title}</h1>
      <p className="mt-2 text-muted">{message}</p>
      <p className="mt-6">
        <Link href="/sign-in" className="font-bold text-signal underline underline-offset-4">
          Go to sign-in
        </Link>
      </p>
    </>
  );
}

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = tokenField.safeParse(token).success ? findInvitation(token) : null;
  if (!invitation)
    return (
      <Gone
        title="This invitation link does not work"
        message="Check that you opened the whole link from the e-mail, or ask the workshop owner to invite you again."
      />
    );
  if (invitation.state !== "pending") return <Gone title="This invitation cannot be used" message={INVITATION_GONE[invitation.state]} />;

  const member = await getMember();
  const signedInAsInvitee = member?.email === invitation.email;
  return (
    <>
      <p className="font-bold uppercase tracking-widest text-glow">Invitation</p>
      <h1 className="mt-1 text-title font-bold">{`Join ${invitation.workshopName}`}</h1>
      <p className="mb-6 mt-2 text-muted">
        {invitation.inviterName ?? "The owner"} invited <strong className="text-ink">{invitation.email}</strong> to work here as{" "}
        <strong className="text-ink">{ROLE_LABELS[invitation.role].toLowerCase()}</strong>.
      </p>
      {member && !signedInAsInvitee ? (
        <p className="mb-4 rounded-chip border border-caution bg-caution-bg px-4 py-3 text-note">
          You are signed in as {member.email}. Joining below signs you in as {invitation.email} instead.
        </p>
      ) : null}
      {signedInAsInvitee ? (
        <JoinSignedIn token={token} workshopName={invitation.workshopName} />
      ) : invitation.accountExists ? (
        <JoinExistingForm token={token} email={invitation.email} />
      ) : (
        <JoinNewForm token={token} email={invitation.email} />
      )}
    </>
  );
}
