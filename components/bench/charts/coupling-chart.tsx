"use client";

import { Line, ReferenceDot, ReferenceLine } from "recharts";
import { formatQuantity } from "@/lib/calc/format";
import { couplingResponse } from "@/lib/bench/chart-data-signal";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, fmt } from "./chart-frame";
import { LinePlot } from "./line-plot";
import { endLabel, halo } from "./end-label";

const db = (v: number) => `${Number(v.toFixed(1))} dB`;
const hz = fmt("Hz");

/** The share of the signal reaching the next grid against frequency, around the coupling network's corner. */
export default function CouplingChart({ outputs, inputs }: ChartProps) {
  const d = couplingResponse(inputs, outputs);
  if (!d) return null;
  const lo = d.points[0].f;
  const hi = d.points[d.points.length - 1].f;
  const ticks = [lo, d.corner, d.corner * 10, hi];
  return (
    <ChartFrame
      title="Response around the corner"
      caption={
        <>
          How much of the driving stage&apos;s signal reaches the next grid, from a tenth of the corner frequency to a hundred times it (frequency on a log
          scale). At the corner, <strong className="text-ink">{formatQuantity(d.corner, "Hz", 3)}</strong>, the capacitor&apos;s reactance equals the resistance
          in series with it and the grid gets 71 % of the signal (−3 dB); below it the response falls 6 dB for every halving of frequency. This network alone:
          other coupling and bypass capacitors and the output transformer roll off the bass too.
        </>
      }
    >
      <LinePlot
        data={d.points}
        x={{ dataKey: "f", scale: "log", domain: [lo, hi], ticks, tickFormatter: hz }}
        y={{ type: "number", domain: [-21, 3], ticks: [-20, -15, -10, -6, -3, 0], tickFormatter: db }}
        tip={{ formatter: (v) => [db(Number(v)), "Reaching the grid"], labelFormatter: (f) => hz(Number(f)) }}
      >
        <ReferenceLine
          x={d.corner}
          stroke={C.signal}
          strokeDasharray="6 4"
          label={{ value: "Corner (−3 dB)", fill: C.signal, position: "insideBottomLeft", fontSize: 13, ...halo }}
        />
        <ReferenceLine
          y={-3}
          stroke={C.muted}
          strokeDasharray="2 4"
          label={{ value: "−3 dB (71 %)", fill: C.muted, position: "insideBottomRight", fontSize: 13, ...halo }}
        />
        <Line
          type="monotone"
          dataKey="db"
          name="Signal reaching the next grid"
          stroke={C.glow}
          strokeWidth={3}
          dot={false}
          isAnimationActive={false}
          label={endLabel(
            "Signal reaching the next grid",
            C.glow,
            d.points.map((p) => p.db),
            3,
          )}
        />
        <ReferenceDot x={d.corner} y={-10 * Math.log10(2)} r={6} fill={C.signal} stroke={C.panel} strokeWidth={2} />
      </LinePlot>
    </ChartFrame>
  );
}
