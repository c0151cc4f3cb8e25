"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { InvitationRow } from "@/db/queries/invitations";
import { useAction } from "@/components/ui/use-submit";
import { ROLE_LABELS } from "./role-labels";

const day = (date: Date) => date.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

export function InvitationList({ invitations }: { invitations: InvitationRow[] }) {
  const router = useRouter();
  // A refused withdrawal still reads the list again: the invitation may have gone meanwhile.
  const { run, error } = useAction({ method: "DELETE", onFail: () => router.refresh() });
  const [busy, setBusy] = useState<number | null>(null);
  if (invitations.length === 0) {
    return <p className="text-muted">No invitations waiting. Invite a technician or apprentice above; they get an e-mail with a link to join.</p>;
  }
  return (
    <>
      <ul className="divide-y divide-rule" aria-label="Invitations waiting">
        {invitations.map((i) => (
          <li key={i.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 py-3" data-testid="invitation-row">
            <div className="min-w-0 flex-1">
              <p className="truncate font-bold">{i.email}</p>
              <p className="text-note text-muted">
                {ROLE_LABELS[i.role]} ·{" "}
                {i.state === "expired" ? (
                  <span className="font-bold text-caution">expired {day(i.expiresAt)}; invite again</span>
                ) : (
                  <>link works until {day(i.expiresAt)}</>
                )}
                {i.invitedBy ? ` · from ${i.invitedBy}` : ""}
              </p>
            </div>
            <Button
              variant="secondary"
              disabled={busy === i.id}
              aria-label={`Withdraw the invitation to ${i.email}`}
              onClick={async () => {
                setBusy(i.id);
                await run(undefined, { url: `/api/workshop/invitations/${i.id}` });
                setBusy(null);
              }}
            >
              Withdraw
            </Button>
          </li>
        ))}
      </ul>
      <p role="alert" className="min-h-5 text-note font-bold text-flag">
        {error ?? ""}
      </p>
    </>
  );
}
