import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { notFound, redirect } from "next/navigation";
import { cache } from "react";
import { CustomerDetails } from "@/components/customers/customer-details";
import { StatusBadge } from "@/components/jobs/status-badge";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { getCustomer } from "@/db/queries/customers";
import { can } from "@/lib/auth/can";
import { NotFoundError } from "@/lib/errors";
import { parseId } from "@/lib/ids";
import { EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";
import { formatDate } from "@/lib/jobs/dates";
import { getMember } from "@/server/auth/member";

type Props = { params: Promise<{ id: string }> };

const load = cache(async (idText: string) => {
  const member = await getMember();
  if (!member) redirect(`/sign-in?next=${encodeURIComponent(`/customers/${idText}`)}`);
  const id = parseId(idText);
  if (id === null) notFound();
  try {
    return { member, customer: getCustomer(member, id) };
  } catch (err) {
    if (err instanceof NotFoundError) notFound();
    throw err;
  }
});

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  return { title: (await load((await params).id)).customer.name };
}

/** A customer's record and every job of theirs, newest first. */
export default async function CustomerPage({ params }: Props) {
  const { member, customer } = await load((await params).id);
  return (
    <div className="flex flex-col gap-5">
      <div>
        <Link href="/customers" className="text-note font-bold text-signal underline-offset-4 hover:underline">
          ← All customers
        </Link>
        <h1 className="mt-2 text-title font-bold break-words" data-testid="customer-name">
          {customer.name}
        </h1>
        <p className="mt-1 text-muted">On file since {formatDate(customer.createdAt)}</p>
      </div>
      <div className="grid gap-5 lg:grid-cols-[1fr_2fr]">
        <Card>
          <h2 className="mb-4 text-lead font-bold">Contact</h2>
          <CustomerDetails customer={customer} canEdit={can.editJobs(member)} canDelete={can.deleteJobs(member) && customer.jobs.length === 0} />
        </Card>
        <section aria-labelledby="their-jobs" className="flex flex-col gap-3">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="their-jobs" className="text-lead font-bold">
              Their sets <span className="font-mono text-muted">({customer.jobs.length})</span>
            </h2>
            {can.editJobs(member) ? (
              <ButtonLink href={`/jobs?customer=${customer.id}`} variant="secondary">
                Book in a set for them
              </ButtonLink>
            ) : null}
          </div>
          {customer.jobs.length === 0 ? (
            <EmptyState title="No sets yet">Their sets show here once one is booked in for them.</EmptyState>
          ) : (
            <ul className="flex flex-col gap-3" data-testid="customer-jobs">
              {customer.jobs.map((j) => (
                <li key={j.id}>
                  <Link
                    href={`/jobs/${j.id}`}
                    className="flex min-h-11 flex-col gap-1 rounded-card border border-rule bg-panel p-4 shadow-card hover:bg-sunk/40"
                  >
                    <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
                      <span className="font-mono text-note">Job {j.number}</span>
                      <StatusBadge status={j.status} />
                    </span>
                    <span className="font-bold break-words">{j.title}</span>
                    <span className="text-note text-muted">
                      {EQUIPMENT_KIND_LABELS[j.equipmentKind]} · came in {formatDate(j.createdAt)}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
    </div>
  );
}
