import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { redirect } from "next/navigation";
import { OrderGroupCard } from "@/components/orders/order-group-card";
import { EmptyState } from "@/components/ui/card";
import { getOrderList } from "@/db/queries/orders";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Order list" };

/** Every part still to order across the workshop's jobs, by supplier. Apprentices see it without prices. */
export default async function OrderListPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/jobs/orders");
  const { currency, groups } = getOrderList(member);
  const count = groups.reduce((n, g) => n + g.lines.length, 0);
  return (
    <div className="flex flex-col gap-5">
      <div>
        <Link href="/jobs" className="text-note font-bold text-signal underline-offset-4 hover:underline">
          ← All jobs
        </Link>
        <h1 className="mt-2 text-title font-bold">Order list</h1>
        <p className="mt-1 max-w-prose text-muted">
          Every part still to order on {member.workshopName}&rsquo;s jobs, by supplier. Download a supplier&rsquo;s order form, place the order, then mark the
          group ordered: each job&rsquo;s parts and Log follow.
        </p>
      </div>
      {count === 0 ? (
        <EmptyState title="Nothing to order">Parts marked &ldquo;To order&rdquo; on any job&rsquo;s Parts tab gather here.</EmptyState>
      ) : (
        <>
          <div className="flex flex-wrap items-center gap-3">
            <p className="text-muted">
              <span className="font-mono text-ink">{count}</span> part{count === 1 ? "" : "s"} from{" "}
              <span className="font-mono text-ink">{groups.filter((g) => g.supplier).length}</span> supplier
              {groups.filter((g) => g.supplier).length === 1 ? "" : "s"}
            </p>
            <a
              href="/api/orders/csv"
              download
              className="inline-flex min-h-11 items-center rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk"
            >
              Whole list (CSV)
            </a>
          </div>
          {groups.map((g) => (
            <OrderGroupCard key={g.key || "none"} group={g} currency={currency} canMark={can.editJobs(member)} />
          ))}
        </>
      )}
    </div>
  );
}
