"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function InvoiceError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="This invoice could not be shown" reset={reset}>
      Nothing was changed: an invoice turns paid only when the payment service confirms it. Try again in a moment.
    </RouteError>
  );
}
