import type { ReactNode } from "react";
import { Card } from "@/components/ui/card";

/** A customer link's page when there is nothing to act on: why (not valid, expired, answered, paid) and what to do next. */
export function Notice({ title, children, testId }: { title: string; children: ReactNode; testId?: string }) {
  return (
    <Card>
      <h1 className="text-title font-bold" data-testid={testId}>
        {title}
      </h1>
      <p className="mt-2 text-muted">{children}</p>
    </Card>
  );
}
