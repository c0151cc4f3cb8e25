"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";

/** Marks exactly the parts shown in one supplier's group ordered; every job's Log says so. */
export function MarkOrderedButton({ supplier, partIds }: { supplier: string; partIds: number[] }) {
  const [done, setDone] = useState<string | null>(null);
  const {
    run,
    error,
    pending: busy,
  } = useAction<{ ordered: number; jobs: number[] }>({
    url: "/api/orders/mark-ordered",
    onDone: (data) => setDone(`${data.ordered} marked ordered on job${data.jobs.length === 1 ? "" : "s"} ${data.jobs.join(", ")}.`),
  });
  const message = error ? { ok: false, text: error } : done ? { ok: true, text: done } : null;
  async function mark() {
    if (!window.confirm(`Mark ${partIds.length} part${partIds.length === 1 ? "" : "s"} from ${supplier} as ordered? Each job's Log will say so.`)) return;
    setDone(null);
    await run({ supplier, partIds });
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
