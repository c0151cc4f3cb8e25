"use client";

import { Line } from "recharts";
import { formatQuantity } from "@/lib/calc/format";
import { rippleData } from "@/lib/bench/chart-data";
import type { ChartProps } from "../chart-slot";
import { C, ChartFrame, fmt } from "./chart-frame";
import { LinePlot } from "./line-plot";

/** The reservoir's sawtooth ripple, then the rms ripple left after each filter stage (on a log scale). */
export default function RippleChart({ inputs, outputs }: ChartProps) {
  const d = rippleData(inputs, outputs);
  if (!d) return null;
  const max = Math.max(...d.levels.map((l) => l.rms));
  const min = Math.min(...d.levels.map((l) => l.rms));
  const decades = Math.max(1, Math.ceil(Math.log10(max / Math.max(min, 1e-12))) + 1);
  const width = (v: number) => Math.max(2, 100 * (1 - Math.log10(max / Math.max(v, 1e-12)) / decades));
  return (
    <div className="flex flex-col gap-4">
      <ChartFrame
        title="Ripple on the reservoir capacitor"
        caption={
          <>
            The reservoir charges near each peak and sags as the load draws on it: a sawtooth of{" "}
            <strong className="text-ink">{formatQuantity(d.vpp, "V")} peak to peak</strong> repeating every {formatQuantity(d.period, "s")}.
          </>
        }
      >
        <LinePlot data={d.wave} x={{ dataKey: "t", tickFormatter: fmt("s") }} y={{ tickFormatter: fmt("V") }}>
          <Line type="linear" dataKey="v" stroke={C.glow} strokeWidth={3} dot={false} isAnimationActive={false} />
        </LinePlot>
      </ChartFrame>
      <figure className="rounded-card border border-rule bg-panel p-4 shadow-card" data-testid="ripple-stages">
        <h3 className="mb-3 font-bold">Ripple after each stage (rms, log scale)</h3>
        <ul className="flex flex-col gap-2">
          {d.levels.map((l) => (
            <li key={l.name} className="grid grid-cols-[8.5rem_1fr_auto] items-center gap-3">
              <span className="text-note">{l.name}</span>
              <span className="h-4 rounded-sm bg-sunk">
                <span className="block h-4 rounded-sm bg-glow" style={{ width: `${width(l.rms)}%` }} />
              </span>
              <span className="font-mono text-note font-bold">{formatQuantity(l.rms, "V")}</span>
            </li>
          ))}
        </ul>
        <figcaption className="mt-2 text-note text-muted">
          The bars use a log scale: every tenfold drop in ripple shortens a bar by the same length. Add a stage to see what it removes.
        </figcaption>
      </figure>
    </div>
  );
}
