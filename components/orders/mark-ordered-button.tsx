"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";

/** Marks exactly the parts shown in one supplier's group ordered; every job's Log says so. */
export function MarkOrderedButton({ supplier, partIds }: { supplier: string; partIds: number[] }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  async function mark() {
    if (!window.confirm(`Mark ${partIds.length} part${partIds.length === 1 ? "" : "s"} from ${supplier} as ordered? Each job's Log will say so.`)) return;
    setBusy(true);
    setMessage(null);
    const res = await sendJson<{ ordered: number; jobs: number[] }>("/api/orders/mark-ordered", { supplier, partIds });
    setBusy(false);
    if (!res.ok) return setMessage({ ok: false, text: res.message });
    setMessage({ ok: true, text: `${res.data.ordered} marked ordered on job${res.data.jobs.length === 1 ? "" : "s"} ${res.data.jobs.join(", ")}.` });
    router.refresh();
  }
  return (
    <div className="flex flex-col gap-1">
      <Button onClick={mark} disabled={busy}>
        {busy ? "Marking…" : "Mark ordered"}
      </Button>
      <p role="status" aria-live="polite" className={`text-note font-bold ${message?.ok ? "text-ok" : "text-flag"}`}>
        {message?.text ?? ""}
      </p>
    </div>
  );
}
