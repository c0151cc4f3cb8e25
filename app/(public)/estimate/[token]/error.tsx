"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function AnswerError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="The estimate could not be shown" reset={reset}>
      Your answer has not been recorded yet. Try again in a moment, or reply to the workshop&apos;s e-mail.
    </RouteError>
  );
}
