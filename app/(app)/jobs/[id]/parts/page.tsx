import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { PartAddForm } from "@/components/jobs/part-add-form";
import { PartRow } from "@/components/jobs/part-row";
import { PartsCsvTools } from "@/components/jobs/parts-csv-tools";
import { Card, EmptyState } from "@/components/ui/card";
import { listSuppliers, priceCurrency } from "@/db/queries/orders";
import { listParts } from "@/db/queries/parts";
import { listReadings } from "@/db/queries/readings";
import { can } from "@/lib/auth/can";
import { capacitorChecks } from "@/lib/jobs/part-cautions";
import { PART_SORTS, partFlags, sortParts, type PartSort } from "@/lib/jobs/part-flags";

export const metadata: Metadata = { title: "Parts" };

const SORT_LABELS: Record<PartSort, string> = { ref: "Ref.", value: "Value", rating: "Rating", state: "State", supplier: "Supplier" };

/** The Parts table's columns, in PartRow's order (each cell repeats its heading as a card label on a phone). */
const PART_COLUMNS = ["Ref.", "Kind", "Original", "Replacement", "Order", "State"] as const;

export default async function PartsPage({ params, searchParams }: JobPageProps & { searchParams: Promise<{ sort?: string }> }) {
  const { member, job } = await loadJobPage((await params).id, "parts");
  const asked = (await searchParams).sort;
  const sort: PartSort = (PART_SORTS as readonly string[]).includes(asked ?? "") ? (asked as PartSort) : "ref";
  // Values and ratings were read into SI when typed (parts.*_si), so the list sorts by what the part is.
  const parts = sortParts(listParts(member, job.id), sort);
  const currency = priceCurrency(member);
  // Each capacitor is compared only with voltage readings linked to it, never with the set's highest.
  const { cautions, notes } = capacitorChecks(parts, listReadings(member, job.id));
  const flagged = new Set(cautions.map((c) => c.partId));
  const canEdit = can.editJobs(member);
  const count = (s: string) => parts.filter((p) => p.state === s).length;
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center gap-x-8 gap-y-2" data-testid="parts-summary">
        {[
          ["to order", count("to-order")],
          ["ordered", count("ordered")],
          ["fitted", count("fitted")],
          ["in all", parts.length],
        ].map(([label, n]) => (
          <p key={label} className="flex items-baseline gap-2">
            <span className="font-mono text-reading">{n}</span>
            <span className="text-muted">{label}</span>
          </p>
        ))}
        <Link href="/jobs/orders" className="inline-flex min-h-11 items-center font-bold text-signal underline-offset-4 hover:underline">
          The workshop&rsquo;s order list →
        </Link>
      </div>
      {cautions.length ? (
        <div role="note" className="rounded-card border border-caution/50 bg-caution-bg p-4" data-testid="part-cautions">
          <p className="font-bold text-caution">Check these voltage ratings</p>
          <ul className="mt-1 list-disc pl-5">
            {cautions.map((c) => (
              <li key={c.partId}>{c.message}</li>
            ))}
          </ul>
          <p className="mt-1 text-note text-muted">
            A capacitor run above its rating can fail short. Ratings here are read from what you typed; check them against the part itself.
          </p>
          <p className="mt-1 text-note text-muted">
            A reading is one moment: with the set cold or lightly loaded, B+ can rise above its working figure, which a rating must also stand (common
            practice).
          </p>
        </div>
      ) : null}
      {parts.length === 0 ? (
        <EmptyState title="No parts listed yet">
          {canEdit ? "Add each capacitor, resistor or tube to replace below, or import a CSV." : "A technician lists the parts to replace here."}
        </EmptyState>
      ) : (
        <>
          <nav aria-label="Sort the parts" className="flex flex-wrap items-center gap-2" data-testid="part-sort">
            <span className="text-note font-bold text-muted">Sort by</span>
            {PART_SORTS.map((s) => (
              <Link
                key={s}
                href={s === "ref" ? "?" : `?sort=${s}`}
                aria-current={s === sort ? "true" : undefined}
                className={`inline-flex min-h-11 items-center rounded-chip border px-3 font-bold ${s === sort ? "border-ink bg-ink text-paper" : "border-rule bg-panel hover:bg-sunk"}`}
              >
                {SORT_LABELS[s]}
              </Link>
            ))}
          </nav>
          <div className="relative overflow-x-auto rounded-card border border-rule bg-panel shadow-card">
            <table className="gb-stack w-full min-w-[48rem] border-collapse text-left">
              <thead className="border-b border-rule bg-sunk/60 text-note font-bold uppercase tracking-wide text-muted">
                <tr>
                  {PART_COLUMNS.map((heading) => (
                    <th key={heading} scope="col" className="px-3 py-2">
                      {heading}
                    </th>
                  ))}
                  <th scope="col" className="px-3 py-2">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-rule">
                {parts.map((p) => (
                  <PartRow
                    key={p.id}
                    jobId={job.id}
                    part={p}
                    canEdit={canEdit}
                    caution={flagged.has(p.id)}
                    readingNote={notes.get(p.id)}
                    currency={currency}
                    flags={partFlags(p)}
                  />
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      <datalist id="part-suppliers">
        {listSuppliers(member).map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      {notes.size ? (
        <p className="text-note text-muted" data-testid="rating-basis">
          A capacitor&rsquo;s rating is compared only with a voltage reading taken at it: on Readings, name the capacitor(s) a test point is across.
        </p>
      ) : null}
      <PartsCsvTools jobId={job.id} canEdit={canEdit} />
      {canEdit ? (
        <Card>
          <h2 className="mb-3 text-lead font-bold">Add a part</h2>
          <PartAddForm jobId={job.id} currency={currency} />
        </Card>
      ) : null}
    </div>
  );
}
