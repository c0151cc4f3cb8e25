"use client";

import { Line, ReferenceDot, ReferenceLine } from "recharts";
import { formatQuantity } from "@/lib/calc/format";
import { bleederDischarge, timeConstantDischarge } from "@/lib/bench/chart-data";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, fmt } from "./chart-frame";
import { LinePlot } from "./line-plot";

/** Capacitor voltage falling through the resistor, with the limit or target level (and the bleeder's deadline) marked. */
export default function DischargeChart({ kind, inputs, outputs }: ChartProps) {
  const d = kind === "bleeder-discharge" ? bleederDischarge(inputs, outputs) : timeConstantDischarge(inputs, outputs);
  if (!d) return null;
  const late = d.deadline !== undefined && d.tLimit > d.deadline;
  return (
    <ChartFrame
      title="Discharge curve"
      caption={
        <>
          From {formatQuantity(d.points[0].v, "V")} the voltage falls below the {d.limitLabel.toLowerCase()} of {formatQuantity(d.limit, "V")} after{" "}
          <strong className="text-ink">{formatQuantity(d.tLimit, "s")}</strong>
          {d.deadline !== undefined ? `; the time allowed is ${formatQuantity(d.deadline, "s")}` : ""}. Always verify with a meter.
        </>
      }
    >
      <LinePlot
        data={d.points}
        x={{ dataKey: "t", tickFormatter: fmt("s") }}
        y={{ tickFormatter: fmt("V") }}
        tip={{ formatter: (v) => formatQuantity(Number(v), "V"), labelFormatter: (t) => formatQuantity(Number(t), "s") }}
      >
        {/* A reference line in the neutral signal colour: green would read as "safe below here", which no limit is. */}
        <ReferenceLine
          y={d.limit}
          stroke={C.signal}
          strokeDasharray="6 4"
          strokeWidth={2}
          label={{ value: `${d.limitLabel} (${formatQuantity(d.limit, "V")})`, fill: C.signal, position: "insideTopRight", fontSize: 13 }}
        />
        {d.deadline !== undefined ? (
          <ReferenceLine
            x={d.deadline}
            stroke={C.hazard}
            strokeDasharray="4 4"
            label={{ value: "Time allowed", fill: C.hazard, position: "insideTopLeft", fontSize: 13 }}
          />
        ) : null}
        <Line type="monotone" dataKey="v" stroke={C.glow} strokeWidth={3} dot={false} isAnimationActive={false} name="Voltage" />
        <ReferenceDot x={d.tLimit} y={d.limit} r={6} fill={late ? C.hazard : C.signal} stroke={C.panel} strokeWidth={2} />
      </LinePlot>
    </ChartFrame>
  );
}
