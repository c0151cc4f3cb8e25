import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { notFound, redirect } from "next/navigation";
import { Card, EmptyState } from "@/components/ui/card";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";
import { readOutbox } from "@/server/mail/outbox";

export const metadata: Metadata = { title: "Outbox" };
export const dynamic = "force-dynamic";

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", second: "2-digit" });
const size = (bytes: number) => (bytes < 1024 ? `${bytes} B` : `${(bytes / 1024).toFixed(1)} KiB`);

/** Mail the local sink caught for this workshop. Development and demo only: a real deployment answers 404. */
export default async function OutboxPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/workshop/outbox");
  const mail = readOutbox(member.workshopId);
  if (mail === null) notFound();
  if (!can.manageMembers(member)) {
    return (
      <EmptyState
        title="The outbox is for owners"
        action={
          <Link href="/workshop" className="font-bold text-signal underline underline-offset-4">
            Back to the workshop
          </Link>
        }
      >
        Ask your workshop owner if you need to see a message Glowbench sent.
      </EmptyState>
    );
  }
  return (
    <>
      <p className="text-note">
        <Link href="/workshop" className="font-bold text-signal underline underline-offset-4">
          Workshop
        </Link>{" "}
        / Outbox
      </p>
      <h1 className="mt-1 text-title font-bold">Outbox</h1>
      <p className="mb-6 mt-1 max-w-prose text-muted">
        In development and the demo, Glowbench delivers e-mail to a local mail sink instead of the internet. Here is what it sent for {member.workshopName},
        newest first. Nothing on this page left this computer.
      </p>
      {mail.length === 0 ? (
        <EmptyState title="No mail sent yet">Invite someone from the workshop page, or send a customer their collection message from a job.</EmptyState>
      ) : (
        <ul className="flex flex-col gap-4" aria-label="Sent mail">
          {mail.map((m) => (
            <li key={m.id}>
              <Card className="!p-0">
                <details>
                  <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-4 gap-y-1 px-6 py-4">
                    <span className="font-bold">{m.subject || "(no subject)"}</span>
                    <span className="text-muted">to {m.envelope.to.join(", ")}</span>
                    {m.attachments.length ? (
                      <span className="text-note font-bold text-signal">
                        {m.attachments.length} attachment{m.attachments.length > 1 ? "s" : ""}
                      </span>
                    ) : null}
                    <time className="ml-auto font-mono text-note text-muted" dateTime={m.receivedAt}>
                      {when(m.receivedAt)}
                    </time>
                  </summary>
                  <div className="border-t border-rule px-6 py-4">
                    <pre className="whitespace-pre-wrap break-words font-sans">{m.text}</pre>
                    {m.attachments.length ? (
                      <ul className="mt-4 flex flex-wrap gap-2">
                        {m.attachments.map((a) => (
                          <li key={a.filename} className="rounded-chip border border-rule bg-sunk px-3 py-1 text-note">
                            {a.filename}{" "}
                            <span className="font-mono text-muted">
                              ({a.contentType}, {size(a.size)})
                            </span>
                          </li>
                        ))}
                      </ul>
                    ) : null}
                  </div>
                </details>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
