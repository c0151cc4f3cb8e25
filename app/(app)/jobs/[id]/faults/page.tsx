import type { Metadata } from "next";
import { FaultAddForm } from "@/components/jobs/faults/fault-add-form";
import { FaultCard } from "@/components/jobs/faults/fault-card";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { Card, EmptyState } from "@/components/ui/card";
import { listFaults } from "@/db/queries/faults";
import { listReadings } from "@/db/queries/readings";
import { can } from "@/lib/auth/can";
import { formatQuantity } from "@/lib/calc/format";

export const metadata: Metadata = { title: "Faults" };

export default async function FaultsPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "faults");
  const faults = listFaults(member, job.id);
  // The job's readings as evidence to pick: "R4: 655 kΩ", "B+ at C5a: 240 V".
  const readings = listReadings(member, job.id).map((r) => {
    const unit = r.kind === "resistor" ? "Ω" : "V";
    return { id: r.id, label: `${r.designator}: ${r.measured === null ? "open" : formatQuantity(r.measured, unit)}` };
  });
  const canAdd = can.addNotes(member);
  const open = faults.filter((f) => f.state !== "fixed").length;
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="faults-h" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="faults-h" className="text-lead font-bold">
            Fault hunt
          </h2>
          {faults.length ? <p className="text-muted">{open ? `${open} of ${faults.length} not fixed` : `All ${faults.length} fixed`}</p> : null}
        </div>
        {faults.length ? (
          faults.map((f) => <FaultCard key={f.id} jobId={job.id} fault={f} readings={readings} canAdd={canAdd} />)
        ) : (
          <EmptyState title="No faults noted">Write the symptom as the set shows it, then the candidates in the order you will test them.</EmptyState>
        )}
      </section>
      {canAdd ? (
        <Card>
          <h2 className="mb-3 text-lead font-bold">Note a fault</h2>
          <FaultAddForm jobId={job.id} />
        </Card>
      ) : null}
    </div>
  );
}
