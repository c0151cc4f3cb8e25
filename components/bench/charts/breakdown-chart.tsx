"use client";

import { Line, ReferenceDot, ReferenceLine } from "recharts";
import { breakdownData } from "@/lib/bench/chart-data";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame } from "./chart-frame";
import { LinePlot } from "./line-plot";

const mm = (v: number) => `${Number(v.toPrecision(3))} mm`;
const kv = (v: number) => `${Number(v.toPrecision(3))} kV`;

/**
 * Uniform-field breakdown voltage against gap, with the working point and the gaps it is compared
 * with: the uniform-field minimum, IEC 60664-1's clearance and the recommendation. Every line is
 * named for what it is; none is called safe.
 */
export default function BreakdownChart({ inputs, outputs }: ChartProps) {
  const d = breakdownData(inputs, outputs);
  if (!d) return null;
  const arcs = outputs.willArc === true;
  const hasGap = typeof inputs.gap === "number";
  return (
    <ChartFrame
      title="Breakdown voltage against gap"
      caption={
        <>
          The curve is where clean air between flat electrodes breaks down (a uniform field). Your working point ({kv(d.working.kv)} across {mm(d.working.gap)}
          {hasGap ? "" : ", the uniform-field minimum gap"}) is{" "}
          <strong className={arcs ? "text-hazard" : "text-ink"}>
            {arcs
              ? "at or above the uniform-field breakdown voltage for this gap: it is expected to arc"
              : "on or below the uniform-field breakdown voltage for this gap"}
          </strong>
          ; points, edges and dirt break down well below the curve.{" "}
          {d.standard !== undefined ? (
            <>
              The dashed line at {mm(d.standard)} is {d.standardLabel}, corrected for altitude: the standard&apos;s figure for this voltage.{" "}
            </>
          ) : (
            <>IEC 60664-1&apos;s table ends below this voltage, so no standard clearance is drawn. </>
          )}
          {d.recommended !== undefined ? (
            <>
              The recommended clearance, {mm(d.recommended)}, is the larger of the safety factor times the minimum gap and IEC 60664-1&apos;s figure for a
              non-uniform field (above 50 kV, its top figure: a lower bound).
            </>
          ) : null}
        </>
      }
    >
      <LinePlot
        data={d.points}
        x={{ dataKey: "gap", tickFormatter: mm }}
        y={{ tickFormatter: kv }}
        tip={{ formatter: (v) => kv(Number(v)), labelFormatter: (g) => mm(Number(g)) }}
      >
        <ReferenceLine
          x={d.minimum}
          stroke={C.hazard}
          strokeDasharray="4 4"
          label={{ value: "Uniform-field minimum gap", fill: C.hazard, position: "insideTopLeft", fontSize: 13 }}
        />
        {d.standard !== undefined ? (
          <ReferenceLine
            x={d.standard}
            stroke={C.signal}
            strokeDasharray="8 3"
            label={{ value: "IEC 60664-1 clearance", fill: C.signal, position: "insideTopRight", fontSize: 13 }}
          />
        ) : null}
        {d.recommended !== undefined && d.recommended !== d.standard ? (
          <ReferenceLine
            x={d.recommended}
            stroke={C.ink}
            strokeDasharray="6 4"
            label={{ value: "Recommended clearance", fill: C.ink, position: "insideBottomRight", fontSize: 13 }}
          />
        ) : null}
        <Line type="monotone" dataKey="kv" stroke={C.glow} strokeWidth={3} dot={false} isAnimationActive={false} name="Uniform-field breakdown" />
        <ReferenceDot x={d.working.gap} y={d.working.kv} r={7} fill={arcs ? C.hazard : C.signal} stroke={C.panel} strokeWidth={2} />
      </LinePlot>
    </ChartFrame>
  );
}
