"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { RoleBadge } from "@/components/ui/card";
import { Button } from "@/components/ui/button";
import type { MemberRow } from "@/db/queries/members";
import { useAction } from "@/components/ui/use-submit";
import { ROLE_OPTIONS } from "./role-labels";

/** The workshop's people. Owners change roles and remove members here; everyone else reads. */
export function MemberList({ members, manage, selfUserId }: { members: MemberRow[]; manage: boolean; selfUserId: number }) {
  const router = useRouter();
  const [busy, setBusy] = useState<number | null>(null);
  const [confirming, setConfirming] = useState<number | null>(null);
  const [errorId, setErrorId] = useState<number | null>(null);
  // A refused change still reads the list again, so the select shows the role that stands.
  const { run, error: message } = useAction({ onFail: () => router.refresh() });
  const error = message && errorId !== null ? { id: errorId, message } : null;

  async function act(id: number, url: string, body: unknown, method: "PATCH" | "DELETE") {
    setBusy(id);
    setErrorId(id);
    await run(body, { url, method });
    setBusy(null);
    setConfirming(null);
  }

  return (
    <ul className="divide-y divide-rule" aria-label="Members">
      {members.map((m) => (
        <li key={m.id} className="flex flex-wrap items-center gap-x-4 gap-y-2 py-3" data-testid="member-row">
          <div className="min-w-0 flex-1">
            <p className="font-bold">
              {m.name}
              {m.userId === selfUserId ? <span className="ml-2 text-note font-normal text-muted">(you)</span> : null}
            </p>
            <p className="truncate text-note text-muted">{m.email}</p>
          </div>
          {manage ? (
            <div className="flex items-center gap-2">
              <label htmlFor={`role-${m.id}`} className="sr-only">
                Role of {m.name}
              </label>
              <select
                id={`role-${m.id}`}
                value={m.role}
                disabled={busy === m.id}
                aria-describedby={error?.id === m.id ? `member-${m.id}-error` : undefined}
                onChange={(e) => act(m.id, `/api/workshop/members/${m.id}`, { role: e.target.value }, "PATCH")}
                className="min-h-11 rounded-chip border border-edge bg-panel px-3 py-2 text-body"
              >
                {ROLE_OPTIONS.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
              {confirming === m.id ? (
                <>
                  <Button variant="destructive" disabled={busy === m.id} onClick={() => act(m.id, `/api/workshop/members/${m.id}`, undefined, "DELETE")}>
                    {m.userId === selfUserId ? "Leave" : `Remove ${m.name.split(" ")[0]}`}
                  </Button>
                  <Button variant="quiet" onClick={() => setConfirming(null)}>
                    Keep
                  </Button>
                </>
              ) : (
                <Button variant="secondary" onClick={() => setConfirming(m.id)} aria-label={`Remove ${m.name}`}>
                  Remove
                </Button>
              )}
            </div>
          ) : (
            <RoleBadge role={m.role} />
          )}
          {error?.id === m.id ? (
            <p id={`member-${m.id}-error`} role="alert" className="w-full text-note font-bold text-flag">
              {error.message}
            </p>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
