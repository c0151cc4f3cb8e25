import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { redirect } from "next/navigation";
import { Card } from "@/components/ui/card";
import { AuditList } from "@/components/workshop/audit-list";
import { InvitationList } from "@/components/workshop/invitation-list";
import { InviteForm } from "@/components/workshop/invite-form";
import { MemberList } from "@/components/workshop/member-list";
import { ChargesCard } from "@/components/workshop/charges-card";
import { ContactDetails } from "@/components/workshop/contact-details";
import { SettingsForm } from "@/components/workshop/settings-form";
import { listAuditEvents } from "@/db/queries/audit";
import { listInvitations } from "@/db/queries/invitations";
import { listMembers } from "@/db/queries/members";
import { getCharges, getWorkshopSettings } from "@/db/queries/workshop";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";
import { localMailEnabled } from "@/server/mail/config";

export const metadata: Metadata = { title: "Workshop" };

export default async function WorkshopPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/workshop");
  const owner = can.manageMembers(member);
  const settings = getWorkshopSettings(member);
  // Apprentices never see prices: the card is not rendered for them at all.
  const charges = can.prepareEstimates(member) ? getCharges(member) : null;
  const members = listMembers(member);
  const invitations = owner ? listInvitations(member) : [];

  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-title font-bold">{settings.name}</h1>
          <p className="mt-1 text-muted">
            {owner ? "Your team, their roles, and how customers reach you." : "Who works here. Only an owner can change members and settings."}
          </p>
        </div>
        {owner && localMailEnabled() ? (
          <Link href="/workshop/outbox" className="font-bold text-signal underline underline-offset-4">
            Outbox (local mail)
          </Link>
        ) : null}
      </div>

      <div className="mt-6 grid gap-6 lg:grid-cols-[3fr_2fr] lg:items-start">
        <div className="flex flex-col gap-6">
          <Card>
            <h2 className="text-lead font-bold">
              Members <span className="font-mono text-muted">{members.length}</span>
            </h2>
            <MemberList members={members} manage={owner} selfUserId={member.userId} />
          </Card>
          {owner ? (
            <Card>
              <h2 className="mb-3 text-lead font-bold">Invite someone</h2>
              <InviteForm />
              <h3 className="mt-2 font-bold">Waiting to join</h3>
              <InvitationList invitations={invitations} />
            </Card>
          ) : null}
        </div>
        <div className="flex flex-col gap-6">
          {charges ? <ChargesCard charges={charges} owner={owner} /> : null}
          <Card>
            <h2 className="mb-3 text-lead font-bold">{owner ? "Settings" : "Contact details"}</h2>
            {owner ? (
              <SettingsForm
                initial={{
                  name: settings.name,
                  contactEmail: settings.contactEmail ?? "",
                  contactPhone: settings.contactPhone ?? "",
                  address: settings.address ?? "",
                  readyMessageTemplate: settings.readyMessageTemplate ?? "",
                }}
              />
            ) : (
              <ContactDetails settings={settings} />
            )}
          </Card>
        </div>
      </div>

      {owner ? (
        <Card className="mt-6">
          <h2 className="mb-2 text-lead font-bold">Audit trail</h2>
          <p className="mb-3 text-note text-muted">
            Membership, invitations, roles, password resets and changes to settings and charges, newest first. Only owners see this.
          </p>
          <AuditList events={listAuditEvents(member)} />
        </Card>
      ) : null}
    </>
  );
}
