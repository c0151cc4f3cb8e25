"use client";

import { Line, ReferenceLine } from "recharts";
import { formatQuantity } from "@/lib/calc/format";
import { reformingSchedule } from "@/lib/bench/chart-data-power-up";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, fmt } from "./chart-frame";
import { LinePlot } from "./line-plot";
import { halo, lineLabel } from "./end-label";

/** 45 min, 1 h, 1 h 30: a bench clock's way of saying it. */
const minutes = (m: number) => {
  const r = Math.round(m);
  if (r < 60) return `${r} min`;
  const h = Math.floor(r / 60);
  return r % 60 ? `${h} h ${String(r % 60).padStart(2, "0")}` : `${h} h`;
};

/** Tick marks every 10, 15, 30 or 60 minutes, or whole hours, about six across. */
function timeTicks(total: number): number[] {
  const step = [10, 15, 30, 60, 120, 240, 480].find((s) => total / s <= 6) ?? Math.ceil(total / 6 / 60) * 60;
  return Array.from({ length: Math.floor(total / step) + 1 }, (_, i) => i * step);
}

/** The reforming schedule as a staircase: the voltage applied against time, each step held for its least time. */
export default function ReformingChart({ inputs, outputs }: ChartProps) {
  const d = reformingSchedule(inputs, outputs);
  if (!d) return null;
  const first = d.steps[0];
  const last = d.steps[d.steps.length - 1];
  return (
    <ChartFrame
      title="Reforming schedule: voltage against time"
      caption={
        <>
          The voltage applied through the series resistor, raised in {d.steps.length} steps from {formatQuantity(first.voltage, "V")} to the rated{" "}
          {formatQuantity(d.rated, "V")}. Each step is held at least the time drawn ({minutes(first.minutes)} for the first, {minutes(last.minutes)} at rated
          voltage) <strong className="text-ink">and until the leakage falls below that step&apos;s figure</strong> in the schedule above, so{" "}
          {minutes(d.totalMinutes)} is the shortest it can take, not a promise. A capacitor that warms, bulges or whose leakage keeps rising is replaced.
        </>
      }
    >
      <LinePlot
        data={d.points}
        x={{ dataKey: "t", ticks: timeTicks(d.totalMinutes), tickFormatter: minutes }}
        y={{ type: "number", domain: [0, Number((d.rated * 1.15).toPrecision(2))], tickFormatter: fmt("V") }}
        tip={{ formatter: (v) => [formatQuantity(Number(v), "V"), "Voltage applied"], labelFormatter: (t) => `From ${minutes(Number(t))}` }}
      >
        <ReferenceLine
          y={d.rated}
          stroke={C.ink}
          strokeDasharray="6 4"
          label={{ value: `Rated voltage (${formatQuantity(d.rated, "V")})`, fill: C.ink, position: "insideTopLeft", fontSize: 13, ...halo }}
        />
        <Line
          type="stepAfter"
          dataKey="v"
          name="Voltage applied"
          stroke={C.glow}
          strokeWidth={3}
          dot={false}
          isAnimationActive={false}
          label={lineLabel("Voltage applied", C.glow, 3, "start")}
        />
      </LinePlot>
    </ChartFrame>
  );
}
