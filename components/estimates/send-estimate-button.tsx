"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";

/** E-mails the customer a fresh single-use approval link; any older link stops working. */
export function SendEstimateButton({ jobId, again }: { jobId: number; again: boolean }) {
  const [sent, setSent] = useState<string | null>(null);
  const {
    run,
    error,
    pending: busy,
  } = useAction<{ sentTo: string }>({
    url: `/api/jobs/${jobId}/estimate/send`,
    onDone: (data) => setSent(`Sent to ${data.sentTo}.`),
    onFail: () => setSent(null),
  });
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button type="button" disabled={busy} onClick={() => run({})}>
        {busy ? "Sending…" : again ? "Send again to the customer" : "Send to the customer for approval"}
      </Button>
      <p role="status" aria-live="polite" className={error ? "font-bold text-flag" : sent ? "text-ok" : "font-bold text-flag"}>
        {error ?? sent ?? ""}
      </p>
    </div>
  );
}
