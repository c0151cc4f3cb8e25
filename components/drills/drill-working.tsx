"use client";

import type { DrillResult } from "@/db/queries/drills";
import { Tex, useKatex } from "@/components/bench/tex";

/**
 * The working of a drill, step by step, typeset like the Bench's: the step where the answer went wrong (a
 * typical mistake it matches) or, failing that, where this kind usually goes wrong, is pointed out.
 */
export function DrillWorking({ result, serverHtml }: { result: DrillResult; serverHtml?: Record<string, string> }) {
  const katex = useKatex(true);
  const marked = result.mistake ?? result.pitfall;
  const why = result.mistake ? "Your answer went wrong here" : "Where this one usually goes wrong";
  return (
    <section aria-labelledby="drill-working-title" className="gb-working min-w-0" data-testid="drill-working">
      <h2 id="drill-working-title" className="text-lead font-bold">
        The working
      </h2>
      <ol className="mt-3 flex flex-col gap-3" data-testid="steps">
        {result.steps.map((s, i) => {
          const here = marked?.stepIndex === i;
          return (
            <li
              key={`${i}-${s.label}`}
              data-testid={here ? "marked-step" : undefined}
              aria-current={here ? "step" : undefined}
              className={`min-w-0 rounded-chip px-3 py-3 sm:px-4 ${here ? "border-2 border-caution bg-caution-bg" : "bg-sunk/60"}`}
            >
              <p className="text-note font-bold text-muted">
                <span className="font-mono">{i + 1}.</span> {s.label}
              </p>
              <div className="gb-formula mt-1 text-body">
                <Tex latex={s.latex} katex={katex} serverHtml={serverHtml} />
              </div>
              {here && marked ? (
                <p className="mt-2 text-note">
                  <strong className="text-caution">{why}:</strong> {marked.hint}
                </p>
              ) : null}
            </li>
          );
        })}
      </ol>
    </section>
  );
}
