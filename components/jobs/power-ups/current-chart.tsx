"use client";

import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { C, fmt, tick } from "@/components/bench/charts/chart-frame";
import { formatQuantity } from "@/lib/calc/format";
import { plotData, type PlotPoint, type StepFigures } from "@/lib/jobs/power-up-steps";

export interface CurrentChartProps {
  steps: readonly StepFigures[];
  stopCurrent: number | null;
}

/** A step's dot: hazard red above the stop current, the primary colour otherwise. */
function StepDot(props: { cx?: number; cy?: number; payload?: PlotPoint; index?: number }) {
  const { cx, cy, payload, index } = props;
  if (cx === undefined || cy === undefined || !payload) return null;
  const over = payload.overStop;
  return <circle key={index} cx={cx} cy={cy} r={over ? 7 : 5} fill={over ? C.hazard : C.glow} stroke={C.panel} strokeWidth={2} />;
}

/**
 * Current drawn against supply voltage, one point per step in the order taken. The stop current is a
 * dashed line named for what it is: the current at which this session is switched off. The band above it
 * is tinted; nothing below it is called safe.
 */
export default function CurrentChart({ steps, stopCurrent }: CurrentChartProps) {
  const d = plotData(steps, stopCurrent);
  return (
    <ResponsiveContainer width="100%" height="100%">
      <LineChart data={d.points} margin={{ top: 16, right: 12, bottom: 4, left: 4 }}>
        <CartesianGrid stroke={C.rule} strokeDasharray="3 4" />
        <XAxis dataKey="supplyVoltage" type="number" domain={[0, d.maxVoltage]} tickFormatter={fmt("V")} tick={tick} stroke={C.muted} />
        <YAxis dataKey="currentDrawn" type="number" domain={[0, d.maxCurrent]} tickFormatter={fmt("A")} tick={tick} stroke={C.muted} width={72} />
        <Tooltip
          formatter={(v) => [formatQuantity(Number(v), "A"), "Drawn"]}
          labelFormatter={(v) => `Supply ${formatQuantity(Number(v), "V")}`}
          contentStyle={{ background: C.panel, border: `1px solid ${C.rule}`, color: C.ink }}
        />
        {stopCurrent !== null ? (
          <>
            <ReferenceArea y1={stopCurrent} y2={d.maxCurrent} fill={C.hazard} fillOpacity={0.08} stroke="none" />
            <ReferenceLine
              y={stopCurrent}
              stroke={C.hazard}
              strokeDasharray="6 4"
              strokeWidth={2}
              label={{ value: `Stop current ${formatQuantity(stopCurrent, "A")}`, fill: C.hazard, position: "insideTopLeft", fontSize: 13 }}
            />
          </>
        ) : null}
        <Line
          dataKey="currentDrawn"
          type="linear"
          stroke={C.glow}
          strokeWidth={2}
          dot={<StepDot />}
          activeDot={false}
          isAnimationActive={false}
          name="Current drawn"
        />
      </LineChart>
    </ResponsiveContainer>
  );
}
