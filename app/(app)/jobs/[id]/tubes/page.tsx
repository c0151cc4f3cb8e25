import type { Metadata } from "next";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { HeaterStringLink } from "@/components/jobs/tubes/heater-string-link";
import { TubeAddForm } from "@/components/jobs/tubes/tube-add-form";
import { TubeCard } from "@/components/jobs/tubes/tube-card";
import { TubeTypeOptions } from "@/components/jobs/tubes/tube-fields";
import { TubeLineupForm } from "@/components/jobs/tubes/tube-lineup-form";
import { Card, EmptyState } from "@/components/ui/card";
import { listTubes } from "@/db/queries/tubes";
import { can } from "@/lib/auth/can";
import { TUBE_NAMES } from "@/lib/calc/tables/heaters";
import { PICTURE_TUBES, RECEIVING_TUBES, TUBE_TYPES } from "@/lib/calc/tables/tubes";
import { TUBE_VERDICTS, TUBE_VERDICT_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Tubes" };

const sorted = (list: Iterable<string>) => [...new Set(list)].sort((a, b) => a.localeCompare(b, "en", { numeric: true }));

/** The pick list: the tube table's receiving and picture tubes, then the types only the heater table knows (rectifiers and others). */
const GROUPS = [
  { label: "Receiving tubes", types: sorted(RECEIVING_TUBES.map((t) => t.type)) },
  { label: "Picture tubes", types: sorted(PICTURE_TUBES.map((t) => t.type)) },
  { label: "Rectifiers and others (heater data only)", types: sorted(TUBE_NAMES.filter((n) => !TUBE_TYPES.includes(n))) },
];
const ALL_TYPES = sorted([...TUBE_TYPES, ...TUBE_NAMES]);

export default async function TubesPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "tubes");
  const { tubes, seriesString } = listTubes(member, job.id);
  const counts = TUBE_VERDICTS.map((v) => [v, tubes.filter((t) => t.verdict === v).length] as const).filter(([, n]) => n > 0);
  return (
    <div className="flex flex-col gap-6">
      <TubeTypeOptions types={ALL_TYPES} />
      <section aria-labelledby="tubes-h">
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="tubes-h" className="text-lead font-bold">
            Sockets
          </h2>
          {tubes.length ? (
            <p className="text-muted" data-testid="tubes-summary">
              {tubes.length} {tubes.length === 1 ? "tube" : "tubes"}
              {counts.map(([v, n]) => ` · ${n} ${TUBE_VERDICT_LABELS[v].toLowerCase()}`).join("")}
            </p>
          ) : null}
        </div>
        {tubes.length ? (
          <ul className="grid items-start gap-3 md:grid-cols-2 xl:grid-cols-3" data-testid="tubes">
            {tubes.map((t) => (
              <TubeCard key={t.id} jobId={job.id} tube={t} canDelete={can.editJobs(member)} />
            ))}
          </ul>
        ) : (
          <EmptyState title="No tubes listed yet">
            Paste the set&rsquo;s line-up from its tube chart below, then test each tube and record the result against the tester&rsquo;s minimum.
          </EmptyState>
        )}
      </section>
      {tubes.length ? <HeaterStringLink tubes={tubes} seriesString={seriesString} /> : null}
      <div className="grid gap-6 lg:grid-cols-2">
        <Card>
          <h2 className="mb-1 text-lead font-bold">Add the line-up</h2>
          <p className="mb-3 text-note text-muted">A minute for a whole set: the types as the tube chart lists them.</p>
          <TubeLineupForm jobId={job.id} groups={GROUPS} />
        </Card>
        <Card>
          <h2 className="mb-3 text-lead font-bold">Add one tube</h2>
          <TubeAddForm jobId={job.id} />
        </Card>
      </div>
    </div>
  );
}
