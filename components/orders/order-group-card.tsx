import { Link } from "@/components/ui/link";
import { formatMoney } from "@/lib/money";
import type { OrderGroup } from "@/lib/jobs/order-list";
import { MarkOrderedButton } from "./mark-ordered-button";

const linkButton = "inline-flex min-h-11 items-center justify-center rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk";

/**
 * One supplier's parts as stacked cards (they read the same at 390 px as at 1280), with the group's total.
 * Prices only when `currency` is given; the order buttons only for those who may mark parts ordered.
 */
export function OrderGroupCard({ group, currency, canMark }: { group: OrderGroup; currency: string | null; canMark: boolean }) {
  const money = (minor: number) => formatMoney(minor, currency!);
  const name = group.supplier ?? "No supplier chosen yet";
  const csv = `/api/orders/csv?supplier=${encodeURIComponent(group.supplier ?? "")}`;
  return (
    <section aria-label={name} className="rounded-card border border-rule bg-panel shadow-card" data-testid={`order-group-${group.key || "none"}`}>
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-rule p-4">
        <div className="min-w-0">
          <h2 className="text-lead font-bold break-words">{name}</h2>
          <p className="text-muted">
            {group.lines.length} part{group.lines.length === 1 ? "" : "s"} for {group.jobCount} job{group.jobCount === 1 ? "" : "s"}
          </p>
        </div>
        {currency && group.totalMinor !== null ? (
          <p className="text-right">
            <span className="block font-mono text-reading" data-testid="group-total">
              {money(group.totalMinor)}
            </span>
            {group.unpriced ? <span className="block text-note text-caution">{group.unpriced} without a unit cost, not counted</span> : null}
          </p>
        ) : null}
      </header>
      <ul className="divide-y divide-rule">
        {group.lines.map((l) => (
          <li key={l.id} className="grid gap-x-4 gap-y-1 p-4 sm:grid-cols-[1fr_auto]" data-testid={`order-line-${l.id}`}>
            <div className="min-w-0">
              <p>
                <span className="font-mono font-bold">{l.designator}</span> <span>{l.description}</span>
              </p>
              <p className="text-note text-muted">
                <Link href={`/jobs/${l.jobId}/parts`} className="font-bold text-signal underline-offset-4 hover:underline">
                  Job {l.jobNumber}
                </Link>{" "}
                · {l.jobTitle}
                {l.supplierPartNumber ? (
                  <>
                    {" "}
                    · their no. <span className="font-mono">{l.supplierPartNumber}</span>
                  </>
                ) : null}
              </p>
            </div>
            <p className="flex items-baseline gap-3 sm:justify-end">
              <span className="font-mono">×{l.quantity}</span>
              {currency ? (
                <span className="font-mono">
                  {l.unitCostMinor == null ? (
                    <span className="text-caution">no price</span>
                  ) : (
                    <>
                      {money(l.unitCostMinor)} each · {money(l.lineMinor!)}
                    </>
                  )}
                </span>
              ) : null}
            </p>
          </li>
        ))}
      </ul>
      <footer className="flex flex-wrap items-start gap-3 border-t border-rule p-4">
        {group.supplier ? (
          <a href={csv} download className={linkButton}>
            Order form (CSV)
          </a>
        ) : null}
        {canMark && group.supplier ? <MarkOrderedButton supplier={group.supplier} partIds={group.lines.map((l) => l.id)} /> : null}
        {!group.supplier ? (
          <p className="text-note text-muted">Choose a supplier for these on each job&rsquo;s Parts tab; then they join that supplier&rsquo;s order.</p>
        ) : null}
      </footer>
    </section>
  );
}
