"use client";

import { CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { breakdownData } from "@/lib/bench/chart-data";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, tick } from "./chart-frame";

const mm = (v: number) => `${Number(v.toPrecision(3))} mm`;
const kv = (v: number) => `${Number(v.toPrecision(3))} kV`;

/** Uniform-field breakdown voltage against gap, with the working point: above the curve it arcs. */
export default function BreakdownChart({ inputs, outputs }: ChartProps) {
  const d = breakdownData(inputs, outputs);
  if (!d) return null;
  const arcs = outputs.willArc === true;
  return (
    <ChartFrame
      title="Breakdown voltage against gap"
      caption={
        <>
          The curve is where clean air between flat electrodes breaks down. Your working point ({kv(d.working.kv)} across {mm(d.working.gap)}) sits{" "}
          <strong className={arcs ? "text-hazard" : "text-ink"}>{arcs ? "above the curve: it will arc" : "below the curve"}</strong>. Real layouts arc well below it.
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={d.points} margin={{ top: 10, right: 16, bottom: 4, left: 8 }}>
          <CartesianGrid stroke={C.rule} strokeDasharray="3 4" />
          <XAxis dataKey="gap" type="number" domain={[0, "dataMax"]} tickFormatter={mm} tick={tick} stroke={C.muted} />
          <YAxis tickFormatter={kv} tick={tick} stroke={C.muted} width={64} />
          <Tooltip formatter={(v) => kv(Number(v))} labelFormatter={(g) => mm(Number(g))} contentStyle={{ background: C.panel, border: `1px solid ${C.rule}`, color: C.ink }} />
          <ReferenceLine x={d.minimum} stroke={C.hazard} strokeDasharray="4 4" label={{ value: "Minimum gap", fill: C.hazard, position: "insideTopLeft", fontSize: 13 }} />
          {d.recommended !== undefined ? (
            <ReferenceLine x={d.recommended} stroke={C.ok} strokeDasharray="6 4" label={{ value: "Recommended", fill: C.ok, position: "insideBottomRight", fontSize: 13 }} />
          ) : null}
          <Line type="monotone" dataKey="kv" stroke={C.glow} strokeWidth={3} dot={false} isAnimationActive={false} name="Breakdown" />
          <ReferenceDot x={d.working.gap} y={d.working.kv} r={7} fill={arcs ? C.hazard : C.signal} stroke={C.panel} strokeWidth={2} />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
