"use client";

import { Link } from "@/components/ui/link";
import { useId, useState } from "react";
import type { CalculatorGroup } from "@/lib/calc/types";
import { GROUPS } from "@/lib/bench/groups";
import { HighVoltageNote } from "./danger-banner";

export interface IndexEntry {
  slug: string;
  title: string;
  purpose: string;
  group: CalculatorGroup;
  /** Input labels, so "ripple" or "heater" finds the calculator that asks for it. */
  words: string;
}

/** A group's colour along the top of its cards (hazard red stays for danger alone). */
const ACCENT: Record<CalculatorGroup, string> = {
  "first-power": "border-t-caution",
  supplies: "border-t-signal",
  stages: "border-t-glow",
  radio: "border-t-edge",
  parts: "border-t-muted",
};

function matches(e: IndexEntry, q: string): boolean {
  const hay = `${e.title} ${e.purpose} ${e.words} ${e.slug}`.toLowerCase();
  return q
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((w) => hay.includes(w));
}

/** Every calculator under the bench task a restorer knows it by, with a filter that narrows as you type. */
export function BenchIndex({ entries }: { entries: IndexEntry[] }) {
  const [q, setQ] = useState("");
  const id = useId();
  const shown = entries.filter((e) => matches(e, q));
  return (
    <>
      <div className="mb-8 max-w-3xl">
        <HighVoltageNote />
      </div>
      <div className="gb-no-print mb-10 max-w-xl">
        <label htmlFor={id} className="font-bold">
          Find a calculator
        </label>
        <input
          id={id}
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          placeholder="bias, ripple, bleeder, colour…"
          aria-describedby={`${id}-count`}
          autoComplete="off"
          className="mt-1 min-h-11 w-full rounded-chip border border-edge bg-panel px-3 py-2 text-body text-ink placeholder:text-muted"
        />
        <p id={`${id}-count`} className="mt-1 text-note text-muted" aria-live="polite">
          {q ? `${shown.length} of ${entries.length} calculators match.` : `${entries.length} calculators.`}
        </p>
      </div>
      {q ? null : (
        <nav aria-label="Bench sections" className="gb-no-print -mt-6 mb-10">
          <ul className="flex flex-wrap gap-2">
            {GROUPS.map((g) => (
              <li key={g.id}>
                <a
                  href={`#group-${g.id}`}
                  className="inline-flex min-h-11 items-center rounded-chip border border-rule bg-panel px-3 py-2 font-bold text-signal hover:border-glow"
                >
                  {g.title}
                  <span className="ml-2 font-normal text-muted">{entries.filter((e) => e.group === g.id).length}</span>
                </a>
              </li>
            ))}
          </ul>
        </nav>
      )}
      {shown.length === 0 ? (
        <div className="rounded-card border-2 border-dashed border-rule bg-panel/60 p-10 text-center">
          <h2 className="text-lead font-bold">Nothing matches “{q}”</h2>
          <p className="mx-auto mt-2 max-w-prose text-muted">
            Try a bench word such as “bias”, “hum”, “heater” or “arc”, or{" "}
            <button type="button" className="font-bold text-signal underline underline-offset-4" onClick={() => setQ("")}>
              show every calculator
            </button>
            .
          </p>
        </div>
      ) : (
        GROUPS.map((g) => {
          const list = shown.filter((e) => e.group === g.id);
          if (list.length === 0) return null;
          return (
            <section key={g.id} aria-labelledby={`group-${g.id}`} className="mb-12">
              <div className="mb-4 flex flex-wrap items-baseline gap-x-4 border-b border-rule pb-2">
                <h2 id={`group-${g.id}`} className="scroll-mt-4 text-lead font-bold">
                  {g.title}
                </h2>
                <p className="max-w-3xl text-muted">{g.blurb}</p>
              </div>
              <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
                {list.map((e) => (
                  <li key={e.slug}>
                    <Link
                      href={`/bench/${e.slug}`}
                      className={`group flex h-full flex-col rounded-card border border-rule border-t-4 ${ACCENT[e.group]} bg-panel p-5 shadow-card transition hover:-translate-y-0.5 hover:border-x-glow hover:border-b-glow`}
                    >
                      <span className="text-lead font-bold text-ink group-hover:underline group-hover:underline-offset-4">{e.title}</span>
                      <span className="mt-1 flex-1 text-muted">{e.purpose}</span>
                      <span className="mt-4 text-note font-bold text-signal" aria-hidden="true">
                        Open calculator →
                      </span>
                    </Link>
                  </li>
                ))}
              </ul>
            </section>
          );
        })
      )}
    </>
  );
}
