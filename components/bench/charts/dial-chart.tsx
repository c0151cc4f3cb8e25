"use client";

import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { formatQuantity } from "@/lib/calc/format";
import { superhetDial, type DialMark } from "@/lib/bench/chart-data-signal";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, tick } from "./chart-frame";
import { halo, lineLabel } from "./end-label";

const hz = (v: number) => formatQuantity(v, "Hz", 4);
const db = (v: number) => `${Number(v.toFixed(0))} dB`;
const COLOUR: Record<DialMark["name"], string> = { Signal: C.glow, Oscillator: C.signal, Image: C.ink };
const FLOOR = -60;

/** About five round frequencies across the scale (1, 2 or 5 times a power of ten apart). */
function dialTicks([lo, hi]: [number, number]): number[] {
  const raw = (hi - lo) / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * p).find((s) => s >= raw)!;
  const out: number[] = [];
  for (let f = Math.ceil(lo / step) * step; f <= hi; f += step) out.push(f);
  return out;
}

/**
 * The dial: signal, oscillator and image on one frequency scale, one IF apart, and with a loaded Q the
 * front end's response across it, showing how far down the image comes.
 */
export default function DialChart({ inputs, outputs }: ChartProps) {
  const d = superhetDial(inputs, outputs);
  if (!d) return null;
  const image = d.marks.find((m) => m.name === "Image")!;
  const signal = d.marks.find((m) => m.name === "Signal")!;
  const imageDb = d.response?.find((p) => p.f === image.f)?.db;
  // Without a Q there is no curve: a flat, unlabelled path only sets the scale, and is not drawn.
  const data = d.response ?? [
    { f: d.span[0], db: 0 },
    { f: d.span[1], db: 0 },
  ];
  const [a, b] = signal.f < image.f ? [signal.f, image.f] : [image.f, signal.f];
  return (
    <ChartFrame
      title="The dial: signal, oscillator and image"
      caption={
        <>
          The station at {hz(signal.f)}, the oscillator one IF ({hz(d.intermediate)}) away at {hz(d.marks[1].f)}, and the image one IF beyond the oscillator at{" "}
          <strong className="text-ink">{hz(image.f)}</strong>, {hz(Math.abs(image.f - signal.f))} from the station (shaded). Both mix down to the IF; only the
          tuned circuits ahead of the mixer can keep the image out.{" "}
          {d.response && imageDb !== undefined ? (
            <>
              The curve is one tuned circuit of Q {d.q} tuned to the station: it passes the image{" "}
              <strong className="text-ink">{Number((-imageDb).toFixed(1))} dB</strong> down.
            </>
          ) : (
            <>Enter the front end&apos;s loaded Q to draw its response across the dial.</>
          )}
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 22, right: 16, bottom: 4, left: 8 }}>
          <CartesianGrid stroke={C.rule} strokeDasharray="3 4" />
          <XAxis
            dataKey="f"
            type="number"
            domain={d.span}
            ticks={dialTicks(d.span)}
            tickFormatter={(v) => formatQuantity(v, "Hz", 3)}
            tick={tick}
            stroke={C.muted}
          />
          <YAxis
            type="number"
            domain={[FLOOR, 5]}
            ticks={[-60, -40, -20, 0]}
            tickFormatter={db}
            tick={tick}
            stroke={C.muted}
            width={56}
            hide={!d.response}
            allowDataOverflow
          />
          <ReferenceArea x1={a} x2={b} fill={C.rule} fillOpacity={0.35} />
          {d.marks.map((m) => (
            <ReferenceLine
              key={m.name}
              x={m.f}
              stroke={COLOUR[m.name]}
              strokeWidth={2}
              strokeDasharray={m.name === "Image" ? "6 4" : undefined}
              label={{ value: m.name, fill: COLOUR[m.name], position: "top", fontSize: 13, fontWeight: 700, ...halo }}
            />
          ))}
          {d.response ? (
            <>
              <Tooltip
                formatter={(v) => [db(Number(v)), "Front end passes"]}
                labelFormatter={(f) => hz(Number(f))}
                contentStyle={{ background: C.panel, border: `1px solid ${C.rule}`, color: C.ink }}
              />
              <Line
                type="monotone"
                dataKey="db"
                name="Front end's response"
                stroke={C.glow}
                strokeWidth={3}
                dot={false}
                isAnimationActive={false}
                label={lineLabel(`One tuned circuit, Q ${d.q}`, C.glow, d.response.length - 1)}
              />
              {imageDb !== undefined ? <ReferenceDot x={image.f} y={Math.max(imageDb, FLOOR)} r={6} fill={C.ink} stroke={C.panel} strokeWidth={2} /> : null}
            </>
          ) : (
            <Line type="linear" dataKey="db" stroke="none" dot={false} isAnimationActive={false} />
          )}
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
