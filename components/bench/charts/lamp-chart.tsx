"use client";

import { Line, ReferenceDot, ReferenceLine } from "recharts";
import { formatQuantity } from "@/lib/calc/format";
import { lampCurves } from "@/lib/bench/chart-data-power-up";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, fmt } from "./chart-frame";
import { LinePlot } from "./line-plot";
import { endLabel, halo } from "./end-label";

const watts = (v: number) => `${Math.round(v)} W`;

/**
 * Current drawn through a series lamp against the set's power, one line per common lamp size and the
 * typed one, beside the set alone on the line. Each line is labelled with what it is.
 */
export default function LampChart({ inputs, outputs }: ChartProps) {
  const d = lampCurves(inputs, outputs);
  if (!d) return null;
  const biggest = Math.max(...d.lines.map((l) => (l.lampPower ?? 0) / d.lineVoltage));
  const yMax = Number((biggest * 1.3).toPrecision(2));
  const yours = d.lines.find((l) => l.yours)!;
  return (
    <ChartFrame
      title="Current through the lamp, by the set's power"
      caption={
        <>
          What a set of each power draws from {formatQuantity(d.lineVoltage, "V")} mains through lamps of common sizes (thin lines), through your {yours.label}{" "}
          (thick line), and with no lamp at all (dashed). Once its filament is hot, a lamp passes no more than its rated current however much the set draws:
          your lamp&apos;s <strong className="text-ink">{formatQuantity(d.maxCurrent, "A")}</strong> with a dead short in the set (the dotted line).{" "}
          {d.set ? (
            <>
              The dot is your {watts(d.set.power)} set: about <strong className="text-ink">{formatQuantity(d.set.current, "A")}</strong>, an estimate with the
              set taken as a fixed resistance.
            </>
          ) : (
            <>Enter the set&apos;s power to mark it.</>
          )}{" "}
          The lamp limits current, not voltage: the set stays connected to the mains.
        </>
      }
    >
      <LinePlot
        data={d.points}
        x={{ dataKey: "setPower", tickFormatter: watts }}
        y={{ type: "number", domain: [0, yMax], tickFormatter: fmt("A"), allowDataOverflow: true }}
        tip={{ formatter: (v, name) => [formatQuantity(Number(v), "A"), name], labelFormatter: (p) => `Set of ${watts(Number(p))}` }}
      >
        <ReferenceLine
          y={d.maxCurrent}
          stroke={C.ink}
          strokeDasharray="2 4"
          label={{ value: `Dead short, ${yours.label}`, fill: C.ink, position: "insideBottomLeft", fontSize: 13, ...halo }}
        />
        {d.lines.map((l) => {
          const alone = l.lampPower === null;
          const color = alone ? C.signal : l.yours ? C.glow : C.muted;
          return (
            <Line
              key={l.key}
              dataKey={l.key}
              name={l.label}
              type="monotone"
              stroke={color}
              strokeWidth={l.yours ? 3 : 1.5}
              strokeDasharray={alone ? "6 4" : undefined}
              dot={false}
              isAnimationActive={false}
              label={endLabel(
                l.label,
                color,
                d.points.map((p) => p[l.key]),
                yMax,
              )}
            />
          );
        })}
        {d.set ? <ReferenceDot x={d.set.power} y={d.set.current} r={7} fill={C.glow} stroke={C.panel} strokeWidth={2} /> : null}
      </LinePlot>
    </ChartFrame>
  );
}
