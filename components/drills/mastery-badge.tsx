import type { MasteryLevelId } from "@/lib/drills";

/** A mastery level in words with a bar of its 0–1 value; the words carry it, the bar only shows it. */
export function MasteryBadge({ mastery, level, levelId }: { mastery: number; level: string; levelId: MasteryLevelId }) {
  const pct = Math.round(mastery * 100);
  return (
    <span className="inline-flex min-w-0 items-center gap-2" data-testid="mastery" data-level={levelId}>
      <span className="h-2 w-16 shrink-0 overflow-hidden rounded-full bg-sunk" aria-hidden="true">
        <span className="block h-full rounded-full bg-glow" style={{ width: `${pct}%` }} />
      </span>
      <span className="text-note font-bold">
        {level}
        {levelId === "not-tried" ? null : <span className="font-normal text-muted"> · {pct} %</span>}
      </span>
    </span>
  );
}
