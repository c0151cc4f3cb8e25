import type { Metadata } from "next";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { NoteForm, PowerUpForm } from "@/components/jobs/log-forms";
import { Card, EmptyState } from "@/components/ui/card";
import { listLog } from "@/db/queries/log";
import { formatQuantity } from "@/lib/calc/format";
import { formatDateTime } from "@/lib/jobs/dates";
import { LOG_KIND_LABELS, type LogKind } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Log" };

const TONE: Record<LogKind, string> = {
  note: "bg-sunk text-ink",
  "power-up": "bg-glow-bg text-glow",
  tube: "bg-sunk text-ink",
  fault: "bg-sunk text-ink",
  part: "bg-sunk text-ink",
  status: "bg-sunk text-muted",
  estimate: "bg-ok-bg text-ink",
  invoice: "bg-ok-bg text-ink",
  mail: "bg-sunk text-muted",
};

export default async function LogPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "log");
  const entries = listLog(member, job.id);
  return (
    <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
      <section aria-labelledby="log-h">
        <h2 id="log-h" className="mb-3 text-lead font-bold">
          Bench log
        </h2>
        {entries.length === 0 ? (
          <EmptyState title="Nothing logged yet">Write what you find as you go; the next person at the bench will thank you.</EmptyState>
        ) : (
          <ol className="flex flex-col gap-3" data-testid="log-entries">
            {entries.map((e) => {
              const data = e.data as { supplyVoltage?: number; currentDrawn?: number } | null;
              return (
                <li key={e.id} className="rounded-card border border-rule bg-panel p-4">
                  <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-note">
                    <span className={`rounded-full px-2 py-0.5 font-bold ${TONE[e.kind]}`}>{LOG_KIND_LABELS[e.kind]}</span>
                    <time dateTime={e.createdAt.toISOString()} className="font-mono">
                      {formatDateTime(e.createdAt)}
                    </time>
                    <span className="text-muted">
                      {e.author?.name ?? (e.kind === "estimate" ? "The customer" : e.kind === "invoice" ? "Payment service" : "A former member")}
                    </span>
                  </div>
                  {e.kind === "power-up" && data?.supplyVoltage !== undefined ? (
                    <p className="mt-2 flex gap-6 font-mono">
                      <span>
                        <span className="text-muted">Supply </span>
                        {formatQuantity(data.supplyVoltage, "V")}
                      </span>
                      <span>
                        <span className="text-muted">Drawn </span>
                        {formatQuantity(data.currentDrawn ?? 0, "A")}
                      </span>
                    </p>
                  ) : null}
                  <p className="mt-1 whitespace-pre-line">{e.text}</p>
                </li>
              );
            })}
          </ol>
        )}
      </section>
      <div className="flex flex-col gap-6">
        <Card>
          <h2 className="mb-3 text-lead font-bold">Write in the log</h2>
          <NoteForm jobId={job.id} />
        </Card>
        <Card>
          <h2 className="mb-1 text-lead font-bold">Power-up</h2>
          <p className="mb-3 text-note text-muted">For each step of a slow start on a current-limited supply or a series lamp.</p>
          <PowerUpForm jobId={job.id} />
        </Card>
      </div>
    </div>
  );
}
