"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function JobsError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="This job record did not load" reset={reset} layout="section">
      Nothing you saved is lost. Try again; if it keeps happening, tell your workshop owner.
    </RouteError>
  );
}
