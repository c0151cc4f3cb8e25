"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";

/** E-mails the customer a fresh single-use approval link; any older link stops working. */
export function SendEstimateButton({ jobId, again }: { jobId: number; again: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button
        type="button"
        disabled={busy}
        onClick={async () => {
          setBusy(true);
          const res = await sendJson<{ sentTo: string }>(`/api/jobs/${jobId}/estimate/send`, {});
          setBusy(false);
          setMessage(res.ok ? { ok: true, text: `Sent to ${res.data.sentTo}.` } : { ok: false, text: res.message });
          if (res.ok) router.refresh();
        }}
      >
        {busy ? "Sending…" : again ? "Send again to the customer" : "Send to the customer for approval"}
      </Button>
      <p role="status" aria-live="polite" className={message?.ok ? "text-ok" : "font-bold text-flag"}>
        {message?.text ?? ""}
      </p>
    </div>
  );
}
