import type { DrillProgress } from "@/db/queries/drill-progress";
import { levelFor } from "@/lib/drills";
import { formatDate } from "@/lib/jobs/dates";
import { MasteryBadge } from "./mastery-badge";
import { ProgressChartSlot } from "./progress-chart-slot";

/** One member's progress: totals, the plot over time, and each kind tried with attempts, correct answers and mastery. */
export function ProgressPanel({ progress, own }: { progress: DrillProgress; own: boolean }) {
  const { totals, kinds, timeline } = progress;
  const overall = levelFor(totals.mastery, totals.attempts);
  return (
    <div className="flex min-w-0 flex-col gap-4" data-testid="progress">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {[
          ["Answered", String(totals.attempts)],
          ["Correct", String(totals.correct)],
          ["Kinds tried", String(totals.kindsTried)],
          ["Overall", overall.level],
        ].map(([label, value], i) => (
          <div key={label} className="rounded-card border border-rule bg-panel p-3">
            <dt className="text-note text-muted">{label}</dt>
            <dd className={`text-lead font-bold ${i < 3 ? "font-mono" : ""}`}>{value}</dd>
          </div>
        ))}
      </dl>
      <ProgressChartSlot points={timeline} own={own} />
      {kinds.length ? (
        <ul className="divide-y divide-rule rounded-card border border-rule bg-panel" aria-label="Progress by kind of drill">
          {kinds.map((k) => (
            <li key={k.kind} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 px-4 py-2.5" data-kind={k.kind}>
              <span className="min-w-0 flex-1 basis-56">
                <span className="block font-bold">{k.title}</span>
                <span className="text-note text-muted">
                  {k.correct} of {k.attempts} right · on {k.daysWithCorrect} {k.daysWithCorrect === 1 ? "day" : "days"} · last {formatDate(k.lastAnsweredAt)}
                </span>
              </span>
              <MasteryBadge mastery={k.mastery} level={k.level} levelId={k.levelId} />
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-muted">{own ? "No drills answered yet. Start one below, or open a set your mentor gave you." : "No drills answered yet."}</p>
      )}
    </div>
  );
}
