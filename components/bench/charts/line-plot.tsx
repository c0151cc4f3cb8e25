"use client";

import type { ComponentProps, ReactNode } from "react";
import { CartesianGrid, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { C, tick } from "./chart-frame";

type Tip = Pick<ComponentProps<typeof Tooltip>, "formatter" | "labelFormatter">;

/**
 * The plot most Bench charts draw inside their ChartFrame: the grid, a numeric x axis from 0 to the last
 * point and a y axis (`x` and `y` name the data and may change the rest), and, given `tip`, a tooltip in
 * the panel's colours. The lines and marks are the children, drawn over those in the order given.
 */
export function LinePlot({
  data,
  x,
  y,
  tip,
  children,
}: {
  data: ComponentProps<typeof LineChart>["data"];
  x: ComponentProps<typeof XAxis>;
  y: ComponentProps<typeof YAxis>;
  tip?: Tip;
  children: ReactNode;
}) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <LineChart data={data} margin={{ top: 10, right: 16, bottom: 4, left: 8 }}>
        <CartesianGrid stroke={C.rule} strokeDasharray="3 4" />
        <XAxis type="number" domain={[0, "dataMax"]} tick={tick} stroke={C.muted} {...x} />
        <YAxis tick={tick} stroke={C.muted} width={64} {...y} />
        {tip ? <Tooltip {...tip} contentStyle={{ background: C.panel, border: `1px solid ${C.rule}`, color: C.ink }} /> : null}
        {children}
      </LineChart>
    </ResponsiveContainer>
  );
}
