import type { Metadata } from "next";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { PowerUpSession } from "@/components/jobs/power-ups/power-up-session";
import { PowerUpStartForm } from "@/components/jobs/power-ups/power-up-start-form";
import { Card, EmptyState } from "@/components/ui/card";
import { listPowerUps } from "@/db/queries/power-ups";
import { can } from "@/lib/auth/can";

export const metadata: Metadata = { title: "Power-ups" };

export default async function PowerUpsPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "power-ups");
  const sessions = listPowerUps(member, job.id);
  const canAdd = can.addNotes(member);
  // The job layout carries the high-voltage note above every tab, this one included.
  // Newest first: the session under way is the one at the bench now.
  const shown = sessions.map((s, i) => ({ s, n: i + 1 })).reverse();
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="pu-h" className="flex flex-col gap-4">
        <h2 id="pu-h" className="text-lead font-bold">
          Bring-ups
        </h2>
        {shown.length ? (
          shown.map(({ s, n }) => <PowerUpSession key={s.id} jobId={job.id} session={s} number={n} canAdd={canAdd} />)
        ) : (
          <EmptyState title="No power-up yet">
            Bring the set up slowly on a variable transformer, a series lamp or a current-limited supply, and record each step: what the supply was, what the
            set drew, what you saw.
          </EmptyState>
        )}
      </section>
      {canAdd ? (
        <Card>
          <h2 className="mb-1 text-lead font-bold">Start a power-up</h2>
          <p className="mb-3 text-note text-muted">Choose the limiter and the current at which you will switch off, and go through the checks first.</p>
          <PowerUpStartForm jobId={job.id} />
        </Card>
      ) : null}
    </div>
  );
}
