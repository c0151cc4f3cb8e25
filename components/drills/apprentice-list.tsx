import { Link } from "@/components/ui/link";
import type { ApprenticeProgress } from "@/db/queries/drill-progress";
import { levelFor } from "@/lib/drills";
import { formatDate } from "@/lib/jobs/dates";
import { MasteryBadge } from "./mastery-badge";

/** For owners and technicians: every apprentice of the workshop with their totals and a way into their progress. */
export function ApprenticeList({ apprentices, current }: { apprentices: readonly ApprenticeProgress[]; current: number | null }) {
  if (apprentices.length === 0) return <p className="text-muted">No apprentices in this workshop yet. Invite one from the Workshop page.</p>;
  return (
    <ul className="divide-y divide-rule" data-testid="apprentices">
      {apprentices.map((a) => {
        const level = levelFor(a.mastery, a.attempts);
        return (
          <li key={a.userId} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 py-3">
            <span className="min-w-0 flex-1 basis-52">
              <Link
                href={`/drills?member=${a.userId}`}
                aria-current={current === a.userId ? "page" : undefined}
                className="font-bold text-signal underline underline-offset-4"
              >
                {a.name}
              </Link>
              <span className="block text-note text-muted">
                {a.correct} of {a.attempts} right over {a.kindsTried} {a.kindsTried === 1 ? "kind" : "kinds"}
                {a.lastAnsweredAt ? ` · last ${formatDate(a.lastAnsweredAt)}` : ""}
              </span>
            </span>
            <MasteryBadge mastery={a.mastery} level={level.level} levelId={level.levelId} />
          </li>
        );
      })}
    </ul>
  );
}
