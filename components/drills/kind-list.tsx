import { GROUPS } from "@/lib/bench/groups";
import { describeCalculators } from "@/lib/calc/registry";
import { describeDrillKinds, levelFor } from "@/lib/drills";
import type { KindProgress } from "@/lib/drills/progress";
import { MasteryBadge } from "./mastery-badge";
import { StartDrillButton } from "./start-drill-button";

/** Every drill kind, grouped by bench task like the Bench index, each with the member's level and a start button. */
export function KindList({ progress, openFirst = true }: { progress: readonly KindProgress[]; openFirst?: boolean }) {
  const mine = new Map(progress.map((p) => [p.kind, p]));
  const kinds = describeDrillKinds();
  const calcs = new Map<string, { title: string; group: string }>(describeCalculators().map((c) => [c.slug, c]));
  return (
    <div className="flex flex-col gap-3" data-testid="drill-kinds">
      {GROUPS.map((g, gi) => {
        const slugs = [...new Set(kinds.map((k) => k.slug))].filter((s) => calcs.get(s)?.group === g.id);
        if (slugs.length === 0) return null;
        const count = kinds.filter((k) => slugs.includes(k.slug)).length;
        return (
          <details key={g.id} open={openFirst && gi === 0} className="group rounded-card border border-rule bg-panel shadow-card">
            <summary className="flex min-h-11 cursor-pointer list-none flex-wrap items-baseline gap-x-3 rounded-card px-4 py-3 hover:bg-sunk sm:px-5 [&::-webkit-details-marker]:hidden">
              <span aria-hidden="true" className="font-mono text-glow transition group-open:rotate-90">
                ▸
              </span>
              <span className="text-lead font-bold">{g.title}</span>
              <span className="text-note text-muted">{count} kinds of drill</span>
            </summary>
            <div className="border-t border-rule px-4 pb-4 sm:px-5">
              {slugs.map((slug) => (
                <section key={slug} className="mt-4" aria-label={calcs.get(slug)?.title}>
                  <h3 className="font-bold text-muted">{calcs.get(slug)?.title}</h3>
                  <ul className="mt-1 divide-y divide-rule">
                    {kinds
                      .filter((k) => k.slug === slug)
                      .map((k) => {
                        const p = mine.get(k.id);
                        const level = p ?? { mastery: 0, ...levelFor(0, 0) };
                        return (
                          <li key={k.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2 py-2" data-kind={k.id}>
                            <span className="min-w-0 flex-1 basis-48">
                              <span className="block">{k.title}</span>
                              <MasteryBadge mastery={level.mastery} level={level.level} levelId={level.levelId} />
                            </span>
                            <StartDrillButton body={{ kind: k.id }} label="Start a drill" ariaLabel={`Start a drill: ${k.title}`} />
                          </li>
                        );
                      })}
                  </ul>
                </section>
              ))}
            </div>
          </details>
        );
      })}
    </div>
  );
}
