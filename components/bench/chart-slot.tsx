"use client";

import dynamic from "next/dynamic";
import type { ComponentType } from "react";
import type { ChartKind } from "@/lib/calc/bench-descriptor";

/**
 * The picture a calculator's descriptor names (`bench.chart`), with recharts loaded only on the pages
 * that draw one: each kind is its own chunk.
 */

export interface ChartProps {
  kind: ChartKind;
  inputs: Record<string, unknown>;
  outputs: Record<string, unknown>;
}

const placeholder = () => <div className="h-72 animate-pulse rounded-card bg-sunk" aria-hidden="true" />;

const Discharge = dynamic(() => import("./charts/discharge-chart"), { ssr: false, loading: placeholder });
const Ripple = dynamic(() => import("./charts/ripple-chart"), { ssr: false, loading: placeholder });
const Breakdown = dynamic(() => import("./charts/breakdown-chart"), { ssr: false, loading: placeholder });
const Plate = dynamic(() => import("./charts/plate-chart"), { ssr: false, loading: placeholder });
const Lamp = dynamic(() => import("./charts/lamp-chart"), { ssr: false, loading: placeholder });
const Reforming = dynamic(() => import("./charts/reforming-chart"), { ssr: false, loading: placeholder });
const Coupling = dynamic(() => import("./charts/coupling-chart"), { ssr: false, loading: placeholder });
const Dial = dynamic(() => import("./charts/dial-chart"), { ssr: false, loading: placeholder });

const BY_KIND: Record<ChartKind, ComponentType<ChartProps>> = {
  "rc-discharge": Discharge,
  "bleeder-discharge": Discharge,
  ripple: Ripple,
  breakdown: Breakdown,
  "plate-curves": Plate,
  "lamp-current": Lamp,
  "reforming-schedule": Reforming,
  "coupling-response": Coupling,
  "superhet-dial": Dial,
};

export function ChartSlot({ kind, ...rest }: Omit<ChartProps, "kind"> & { kind: ChartKind | null }) {
  if (!kind) return null;
  const Chart = BY_KIND[kind];
  return <Chart kind={kind} {...rest} />;
}
