import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { redirect } from "next/navigation";
import { AddCustomer } from "@/components/customers/add-customer";
import { EmptyState } from "@/components/ui/card";
import { listCustomers } from "@/db/queries/customers";
import { can } from "@/lib/auth/can";
import { customerListQuerySchema } from "@/lib/customers/schemas";
import { formatDate } from "@/lib/jobs/dates";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Customers" };

type Props = { searchParams: Promise<{ q?: string }> };

/** The workshop's customers, most recently seen first, as stacked cards; a plain GET search that needs no script. */
export default async function CustomersPage({ searchParams }: Props) {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/customers");
  const parsed = customerListQuerySchema.safeParse(await searchParams);
  const q = parsed.success ? parsed.data.q : undefined;
  const customers = listCustomers(member, q);
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-title font-bold">Customers</h1>
          <p className="mt-1 max-w-prose text-muted">Everyone who has brought a set to {member.workshopName}, with every job of theirs.</p>
        </div>
        {can.editJobs(member) ? <AddCustomer /> : null}
      </div>
      <form role="search" method="get" className="flex flex-wrap items-end gap-3">
        <label className="flex min-w-0 flex-1 flex-col gap-1">
          <span className="font-bold">Find a customer</span>
          <input
            type="search"
            name="q"
            defaultValue={q ?? ""}
            placeholder="Name, e-mail or phone"
            className="min-h-11 w-full rounded-chip border border-edge bg-panel px-3 py-2"
          />
        </label>
        <button type="submit" className="min-h-11 rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk">
          Search
        </button>
        {!parsed.success ? (
          <p role="alert" className="w-full font-bold text-flag">
            {parsed.error.issues[0].message}
          </p>
        ) : null}
      </form>
      {customers.length === 0 ? (
        q ? (
          <EmptyState title="Nobody matches">Try part of the name, the e-mail or the phone number.</EmptyState>
        ) : (
          <EmptyState title="No customers yet">Book in a set for a customer, or add one here; their jobs gather on their page.</EmptyState>
        )
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" data-testid="customer-list">
          {customers.map((c) => (
            <li key={c.id}>
              <Link
                href={`/customers/${c.id}`}
                className="flex h-full min-h-11 flex-col gap-1 rounded-card border border-rule bg-panel p-4 shadow-card hover:bg-sunk/40"
              >
                <span className="font-bold break-words">{c.name}</span>
                {c.email || c.phone ? <span className="text-note text-muted break-all">{[c.email, c.phone].filter(Boolean).join(" · ")}</span> : null}
                <span className="mt-auto text-note">
                  <span className="font-mono">{c.jobCount}</span> job{c.jobCount === 1 ? "" : "s"}
                  {c.lastJobAt ? <span className="text-muted"> · last in {formatDate(c.lastJobAt)}</span> : null}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
