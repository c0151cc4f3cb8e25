import type { ReactNode } from "react";
import { formatQuantity } from "@/lib/calc/format";

/** Colours as CSS variables, so the pictures follow the day and night themes. */
export const C = {
  ink: "rgb(var(--gb-ink))",
  muted: "rgb(var(--gb-muted))",
  rule: "rgb(var(--gb-rule))",
  glow: "rgb(var(--gb-glow))",
  signal: "rgb(var(--gb-signal))",
  hazard: "rgb(var(--gb-hazard))",
  ok: "rgb(var(--gb-ok))",
  panel: "rgb(var(--gb-panel))",
};

export const tick = { fill: C.muted, fontSize: 13 };

export const fmt =
  (unit: string, sig = 2) =>
  (v: number) =>
    formatQuantity(v, unit, sig);

/** A picture with a caption that says in words what it shows (its text alternative). */
export function ChartFrame({ title, caption, children }: { title: string; caption: ReactNode; children: ReactNode }) {
  return (
    <figure className="rounded-card border border-rule bg-panel p-4 shadow-card" data-testid="chart">
      <h3 className="mb-2 font-bold">{title}</h3>
      <div className="h-72 w-full" aria-hidden="true">
        {children}
      </div>
      <figcaption className="mt-2 text-note text-muted">{caption}</figcaption>
    </figure>
  );
}
