"use client";

import { RouteError, type ErrorPageProps } from "@/components/ui/route-error";

export default function DrillsError({ reset }: ErrorPageProps) {
  return (
    <RouteError title="This drill tripped" reset={reset} layout="centred" back={{ href: "/drills", label: "Back to the drills" }}>
      Your answers so far are kept. Try again, or go back to the drills and start another.
    </RouteError>
  );
}
