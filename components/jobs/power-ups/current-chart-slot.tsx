"use client";

import dynamic from "next/dynamic";
import { formatQuantity } from "@/lib/calc/format";
import { isOverStop } from "@/lib/jobs/power-up-steps";
import type { CurrentChartProps } from "./current-chart";

/** recharts is loaded only when a session has steps to draw. */
const CurrentChart = dynamic(() => import("./current-chart"), { ssr: false, loading: () => <div className="h-full animate-pulse rounded-card bg-sunk" /> });

export function CurrentChartSlot({ steps, stopCurrent }: CurrentChartProps) {
  if (!steps.length) return null;
  const over = steps.filter((s) => isOverStop(s.currentDrawn, stopCurrent)).length;
  const top = steps.reduce((a, s) => (s.currentDrawn > a.currentDrawn ? s : a), steps[0]);
  return (
    <figure className="rounded-card border border-rule bg-panel p-4" data-testid="power-up-chart">
      <h4 className="mb-2 font-bold">Current against supply voltage</h4>
      <div className="h-64 w-full" aria-hidden="true">
        <CurrentChart steps={steps} stopCurrent={stopCurrent} />
      </div>
      <figcaption className="mt-2 text-note text-muted">
        {steps.length} {steps.length === 1 ? "step" : "steps"} in the order taken; the most drawn was {formatQuantity(top.currentDrawn, "A")} at{" "}
        {formatQuantity(top.supplyVoltage, "V")}.{" "}
        {stopCurrent !== null ? (
          <>
            The dashed line is the stop current of {formatQuantity(stopCurrent, "A")}, where this session is switched off;{" "}
            {over ? <strong className="text-hazard">{over === 1 ? "one step went" : `${over} steps went`} above it.</strong> : "no step went above it."} Staying
            under it says only that the set drew less than you chose to allow.
          </>
        ) : null}
      </figcaption>
    </figure>
  );
}
