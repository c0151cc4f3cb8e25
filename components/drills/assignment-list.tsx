import { Link } from "@/components/ui/link";
import type { DrillAssignmentView } from "@/db/queries/drill-assignments";
import { formatDate } from "@/lib/jobs/dates";

const STATE: Record<DrillAssignmentView["state"], { label: string; tone: string }> = {
  open: { label: "Open", tone: "border-rule bg-sunk text-ink" },
  overdue: { label: "Past its due date", tone: "border-caution bg-caution-bg text-caution" },
  done: { label: "All answered", tone: "border-ok bg-ok-bg text-ok" },
};

/** Sets of drills with their due dates; each drill links to its page (the apprentice answers there, mentors read it). */
export function AssignmentList({ assignments, showApprentice }: { assignments: readonly DrillAssignmentView[]; showApprentice: boolean }) {
  if (assignments.length === 0) return <p className="text-muted">{showApprentice ? "No drills set yet." : "No drills set for you yet."}</p>;
  return (
    <ul className="flex flex-col gap-3" data-testid="assignments">
      {assignments.map((a) => (
        <li key={a.id} className="rounded-card border border-rule bg-panel p-4" data-assignment={a.id}>
          <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
            <p className="font-bold">
              Due {formatDate(`${a.dueDate}T12:00:00Z`)}
              {showApprentice ? <span className="font-normal text-muted"> · for {a.apprentice.name}</span> : null}
            </p>
            <span className={`rounded-full border px-2.5 py-0.5 text-note font-bold ${STATE[a.state].tone}`}>{STATE[a.state].label}</span>
          </div>
          <p className="text-note text-muted">
            {a.answered} of {a.drills.length} answered, {a.correct} right{a.assignedBy ? ` · set by ${a.assignedBy}` : ""}
          </p>
          {a.note ? <p className="mt-1 border-l-4 border-glow pl-3 italic">{a.note}</p> : null}
          <ol className="mt-2 flex flex-wrap gap-2">
            {a.drills.map((d, i) => (
              <li key={d.id}>
                <Link
                  href={`/drills/${d.id}`}
                  className={`inline-flex min-h-11 items-center gap-1 rounded-chip border px-3 py-1 text-note font-bold ${d.answered ? "border-rule bg-sunk text-muted" : "border-glow text-ink hover:bg-glow-bg"}`}
                  aria-label={`Drill ${i + 1}: ${d.title}${d.answered ? (d.correct ? ", answered right" : ", answered wrong") : ", not answered yet"}`}
                >
                  <span className="font-mono">{i + 1}</span> {d.title}
                  {d.answered ? <span aria-hidden="true">{d.correct ? " ✓" : " ✗"}</span> : null}
                </Link>
              </li>
            ))}
          </ol>
        </li>
      ))}
    </ul>
  );
}
