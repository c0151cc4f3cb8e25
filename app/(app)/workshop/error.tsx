"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function WorkshopError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="The workshop page did not load" reset={reset} layout="section">
      Members and settings are untouched. Try again; if it keeps happening, restart Glowbench.
    </RouteError>
  );
}
