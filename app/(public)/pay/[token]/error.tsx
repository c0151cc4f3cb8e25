"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function PayError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="The invoice could not be shown" reset={reset}>
      Nothing has been charged. Try again in a moment, or reply to the workshop&apos;s e-mail.
    </RouteError>
  );
}
