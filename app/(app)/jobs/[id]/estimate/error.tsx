"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function EstimateError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="The estimate could not be shown" reset={reset}>
      Nothing was changed. Try again in a moment.
    </RouteError>
  );
}
