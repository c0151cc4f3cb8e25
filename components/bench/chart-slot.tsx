"use client";

import dynamic from "next/dynamic";
import type { ComponentType } from "react";

/** The picture for a calculator, with recharts loaded only on the pages that draw one. */

export interface ChartProps {
  slug: string;
  inputs: Record<string, unknown>;
  outputs: Record<string, unknown>;
}

const placeholder = () => <div className="h-72 animate-pulse rounded-card bg-sunk" aria-hidden="true" />;

const Discharge = dynamic(() => import("./charts/discharge-chart"), { ssr: false, loading: placeholder });
const Ripple = dynamic(() => import("./charts/ripple-chart"), { ssr: false, loading: placeholder });
const Breakdown = dynamic(() => import("./charts/breakdown-chart"), { ssr: false, loading: placeholder });
const Plate = dynamic(() => import("./charts/plate-chart"), { ssr: false, loading: placeholder });

const BY_SLUG: Record<string, ComponentType<ChartProps>> = {
  "time-constant": Discharge,
  bleeder: Discharge,
  "supply-ripple": Ripple,
  "arc-clearance": Breakdown,
  "triode-stage": Plate,
};

export function hasChart(slug: string): boolean {
  return slug in BY_SLUG;
}

export function ChartSlot(props: ChartProps) {
  const Chart = BY_SLUG[props.slug];
  return Chart ? <Chart {...props} /> : null;
}
