"use client";

import { useEffect, useRef, useState, type ReactNode } from "react";
import type { RunResult } from "@/lib/calc/run";
import type { BenchDescriptor, OutputMeta } from "@/lib/calc/types";
import { formatOutput, outputLabel } from "@/lib/bench/display";
import { Tex, useKatex } from "./tex";

interface Props {
  /** The descriptor's headline figures and how they read. */
  view: Pick<BenchDescriptor, "headlines" | "format" | "words">;
  /** Load KaTeX for live steps (true once the person has started working with the form). */
  live: boolean;
  open: boolean;
  run: RunResult;
  outputs: readonly OutputMeta[];
  serverHtml: Record<string, string>;
  formulas: ReactNode;
  sources: ReactNode;
  why: ReactNode;
}

/** The working: formulas, each step with the values substituted, the result, its source and why it matters. */
export function Working({ view, live, open, run, outputs, serverHtml, formulas, sources, why }: Props) {
  const [isOpen, setIsOpen] = useState(open);
  const katex = useKatex(live || isOpen);
  const ref = useRef<HTMLDetailsElement>(null);
  useEffect(() => {
    // A printed sheet always carries the working.
    const show = () => ref.current?.setAttribute("open", "");
    window.addEventListener("beforeprint", show);
    return () => window.removeEventListener("beforeprint", show);
  }, []);
  const headline: readonly string[] = view.headlines;
  return (
    <details
      ref={ref}
      open={open}
      onToggle={(e) => setIsOpen(e.currentTarget.open)}
      data-testid="working"
      className="gb-working group rounded-card border border-rule bg-panel shadow-card"
    >
      <summary className="flex min-h-11 cursor-pointer list-none items-center gap-3 rounded-card px-6 py-4 text-lead font-bold hover:bg-sunk [&::-webkit-details-marker]:hidden">
        <span aria-hidden="true" className="inline-block font-mono text-glow transition group-open:rotate-90">
          ▸
        </span>
        Show the working
        <span className="ml-auto text-note font-normal text-muted group-open:hidden">formula, your values, source</span>
      </summary>
      {/* minmax(0, 1fr) columns and min-w-0 sections: a wide formula scrolls in its own box instead of widening the page. */}
      <div className="grid grid-cols-1 gap-8 border-t border-rule px-4 py-6 sm:px-6 lg:grid-cols-2">
        <section className="min-w-0" aria-labelledby="w-formula">
          <h3 id="w-formula" className="mb-3 font-bold uppercase tracking-wider text-muted text-note">
            1 · The formula
          </h3>
          {formulas}
        </section>
        <section className="min-w-0" aria-labelledby="w-steps">
          <h3 id="w-steps" className="mb-3 font-bold uppercase tracking-wider text-muted text-note">
            2 · With your values
          </h3>
          {run.ok ? (
            <ol className="flex flex-col gap-3" data-testid="steps">
              {run.result.steps.map((s, i) => (
                <li key={`${i}-${s.label}`} className="min-w-0 rounded-chip bg-sunk/60 px-3 py-3 sm:px-4">
                  <p className="text-note font-bold text-muted">{s.label}</p>
                  <div className="gb-formula mt-1 text-body">
                    <Tex latex={s.latex} katex={katex} serverHtml={serverHtml} />
                  </div>
                </li>
              ))}
            </ol>
          ) : (
            <p className="text-muted">The steps appear once every field reads as a value.</p>
          )}
          <h3 className="mb-2 mt-6 font-bold uppercase tracking-wider text-muted text-note">3 · The result</h3>
          {run.ok ? (
            <ul className="font-mono">
              {outputs
                .filter((o) => headline.includes(o.name))
                .map((o) => (
                  <li key={o.name}>
                    <span className="font-sans text-muted">{outputLabel(view, o)}: </span>
                    <strong>{formatOutput(view, o, run.result.outputs[o.name])}</strong>
                  </li>
                ))}
            </ul>
          ) : (
            <p className="text-muted">—</p>
          )}
        </section>
        <section className="min-w-0" aria-labelledby="w-source">
          <h3 id="w-source" className="mb-3 font-bold uppercase tracking-wider text-muted text-note">
            4 · Where it comes from
          </h3>
          {sources}
        </section>
        <section className="min-w-0" aria-labelledby="w-why">
          <h3 id="w-why" className="mb-3 font-bold uppercase tracking-wider text-muted text-note">
            5 · Why it matters at the bench
          </h3>
          {why}
        </section>
      </div>
    </details>
  );
}
