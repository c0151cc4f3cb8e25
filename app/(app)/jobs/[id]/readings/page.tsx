import type { Metadata } from "next";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { ReadingAddForm } from "@/components/jobs/reading-add-form";
import { ResistorSurvey, VoltageTable } from "@/components/jobs/readings-tables";
import { Card, EmptyState } from "@/components/ui/card";
import { listReadings } from "@/db/queries/readings";
import { can } from "@/lib/auth/can";

export const metadata: Metadata = { title: "Readings" };

export default async function ReadingsPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "readings");
  const readings = listReadings(member, job.id);
  const resistors = readings.filter((r) => r.kind === "resistor");
  const voltages = readings.filter((r) => r.kind === "voltage");
  const canEdit = can.editJobs(member);
  const drifted = resistors.filter((r) => r.verdict !== "within").length;
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="survey-h">
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="survey-h" className="text-lead font-bold">
            Resistor survey
          </h2>
          {resistors.length ? (
            <p className="text-muted">
              {drifted} of {resistors.length} out of tolerance — verdicts from the resistor-drift calculator.
            </p>
          ) : null}
        </div>
        {resistors.length ? (
          <div className="overflow-x-auto rounded-card border border-rule bg-panel shadow-card">
            <ResistorSurvey jobId={job.id} rows={resistors} canEdit={canEdit} />
          </div>
        ) : (
          <EmptyState title="No resistors measured yet">
            With the set unplugged and the filters discharged, lift one lead and measure; add each reading below.
          </EmptyState>
        )}
      </section>
      <section aria-labelledby="volts-h">
        <h2 id="volts-h" className="mb-3 text-lead font-bold">
          Voltages against expected
        </h2>
        {voltages.length ? (
          <div className="overflow-x-auto rounded-card border border-rule bg-panel shadow-card">
            <VoltageTable jobId={job.id} rows={voltages} canEdit={canEdit} />
          </div>
        ) : (
          <EmptyState title="No voltages recorded yet">
            Once the set is up on a current-limited supply, note B+ and the other test points against the schematic&apos;s figures.
          </EmptyState>
        )}
      </section>
      <Card>
        <h2 className="mb-3 text-lead font-bold">Add a reading</h2>
        <ReadingAddForm jobId={job.id} />
      </Card>
    </div>
  );
}
