"use client";

import { Bar, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { ProgressPoint } from "@/lib/drills/progress";
import { C, ChartFrame, tick } from "@/components/bench/charts/chart-frame";

const day = (iso: string) => new Date(`${iso}T12:00:00Z`).toLocaleDateString("en-GB", { day: "numeric", month: "short" });

/** Answers per day (bars) and mean mastery over the kinds tried (line), from the first drill to the latest. */
export default function ProgressChart({ points }: { points: readonly ProgressPoint[] }) {
  const data = points.map((p) => ({ ...p, label: day(p.date), missed: p.answered - p.correct, masteryPct: Math.round(p.mastery * 100) }));
  const last = data[data.length - 1];
  return (
    <ChartFrame
      title="Progress over time"
      caption={
        <>
          {data.length} {data.length === 1 ? "day" : "days"} with drills; {last.totalCorrect} correct answers so far. Mean mastery over the kinds tried stands
          at <strong className="text-ink">{last.masteryPct} %</strong>: it rises with correct answers spread over days and falls with misses.
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={data} margin={{ top: 10, right: 4, bottom: 4, left: 0 }}>
          <CartesianGrid stroke={C.rule} strokeDasharray="3 4" />
          <XAxis dataKey="label" tick={tick} stroke={C.muted} />
          <YAxis yAxisId="n" allowDecimals={false} tick={tick} stroke={C.muted} width={32} />
          {/* A no-break space keeps "100 %" on one line in the axis. */}
          <YAxis yAxisId="m" orientation="right" domain={[0, 100]} tickFormatter={(v) => `${v}\u00a0%`} tick={tick} stroke={C.muted} width={56} />
          <Tooltip contentStyle={{ background: C.panel, border: `1px solid ${C.rule}`, color: C.ink }} />
          <Legend wrapperStyle={{ fontSize: 13 }} />
          <Bar yAxisId="n" dataKey="correct" stackId="a" name="Correct" fill={C.glow} isAnimationActive={false} />
          <Bar yAxisId="n" dataKey="missed" stackId="a" name="Missed" fill={C.muted} isAnimationActive={false} />
          <Line yAxisId="m" type="monotone" dataKey="masteryPct" name="Mastery %" stroke={C.signal} strokeWidth={3} dot isAnimationActive={false} />
        </ComposedChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
