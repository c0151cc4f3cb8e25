"use client";

import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { plateFamily } from "@/lib/bench/chart-data";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, tick } from "./chart-frame";

const volts = (v: number) => `${Math.round(v)} V`;
const ma = (v: number) => `${Number(v.toPrecision(2))} mA`;

/** The triode's plate curves, one per grid voltage, with the DC load line and the operating point. */
export default function PlateChart({ inputs, outputs }: ChartProps) {
  const d = plateFamily(inputs, outputs);
  if (!d) return null;
  return (
    <ChartFrame
      title="Plate curves and load line"
      caption={
        <>
          Plate current against plate voltage for grid voltages {d.curves.map((c) => `${c.eg} V`).join(", ")} (thin lines), the load line from{" "}
          {volts(d.loadLine[1].ep)} to {ma(d.loadLine[0].ip)} (thick), and{" "}
          {d.operating ? (
            <strong className="text-ink">
              the operating point at {volts(d.operating.ep)}, {ma(d.operating.ip)}
            </strong>
          ) : (
            "no operating point"
          )}
          .
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart margin={{ top: 10, right: 16, bottom: 4, left: 8 }}>
          <CartesianGrid stroke={C.rule} strokeDasharray="3 4" />
          <XAxis dataKey="ep" type="number" domain={[0, Math.ceil(d.maxEp)]} tickFormatter={volts} tick={tick} stroke={C.muted} allowDataOverflow />
          <YAxis
            dataKey="ip"
            type="number"
            domain={[0, Number(d.maxIpMa.toPrecision(2))]}
            tickFormatter={ma}
            tick={tick}
            stroke={C.muted}
            width={64}
            allowDataOverflow
          />
          {d.curves.map((c, i) => (
            <Line
              key={c.eg}
              data={c.points}
              dataKey="ip"
              type="monotone"
              stroke={i === 0 ? C.signal : C.muted}
              strokeWidth={1.5}
              dot={false}
              isAnimationActive={false}
              name={`${c.eg} V`}
              label={false}
            />
          ))}
          <Line data={d.loadLine} dataKey="ip" stroke={C.glow} strokeWidth={3} dot={false} isAnimationActive={false} name="Load line" />
          {d.operating ? <ReferenceDot x={d.operating.ep} y={d.operating.ip} r={7} fill={C.ink} stroke={C.panel} strokeWidth={2} /> : null}
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
