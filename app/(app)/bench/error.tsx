"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function BenchError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="This calculator tripped" reset={reset} layout="centred" back={{ href: "/bench", label: "Back to the Bench" }}>
      Nothing you saved is affected. Try again, or go back to the Bench and open the calculator afresh.
    </RouteError>
  );
}
