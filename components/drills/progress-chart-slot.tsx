"use client";

import dynamic from "next/dynamic";
import type { ProgressPoint } from "@/lib/drills/progress";

/** recharts is loaded only where a progress plot is drawn, as the Bench does for its pictures. */
const Chart = dynamic(() => import("./progress-chart"), {
  ssr: false,
  loading: () => <div className="h-72 animate-pulse rounded-card bg-sunk" aria-hidden="true" />,
});

export function ProgressChartSlot({ points, own }: { points: readonly ProgressPoint[]; own: boolean }) {
  if (points.length === 0)
    return <p className="text-muted">{own ? "The plot of your progress appears after your first answer." : "The plot appears after their first answer."}</p>;
  return <Chart points={points} />;
}
