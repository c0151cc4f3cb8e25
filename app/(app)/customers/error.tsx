"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function CustomersError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="The customer list did not load" reset={reset} layout="section">
      Nothing you saved is lost. Try again; if it keeps happening, tell your workshop owner.
    </RouteError>
  );
}
