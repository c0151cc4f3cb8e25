"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { answerEstimate } from "@/db/queries/estimates";
import { useAction } from "@/components/ui/use-submit";
import type { AnswerInput } from "@/lib/estimates/schemas";

type Answered = ReturnType<typeof answerEstimate>["status"];

/** Approve or decline, once. The server re-checks the token; this only shows what it said. */
export function AnswerButtons({ token }: { token: string }) {
  const [note, setNote] = useState("");
  const [done, setDone] = useState<Answered | null>(null);
  // The note is the only field here, so its message stands in for the form's.
  const {
    run,
    error,
    setError,
    pending: busy,
  } = useAction<{ status: Answered }>({
    url: "/api/estimates/answer",
    refresh: false,
    onDone: (data) => setDone(data.status),
    onFail: (f) => f.fields.note && setError(f.fields.note),
  });

  const answer = (decision: AnswerInput["decision"]) => run({ token, decision, note: note || undefined });

  if (done) {
    return (
      <div role="status" className="rounded-card border border-ok bg-ok-bg p-4">
        <p className="font-bold">
          {done === "approved" ? "Thank you: the workshop will go ahead with the work." : "Thank you: the workshop will not do this work."}
        </p>
        <p className="mt-1 text-muted">Your answer is with the workshop. You can close this page.</p>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <label htmlFor="note" className="font-bold">
        A note for the workshop <span className="font-normal text-muted">(optional)</span>
      </label>
      <textarea
        id="note"
        value={note}
        onChange={(e) => setNote(e.target.value)}
        maxLength={1000}
        rows={3}
        aria-describedby="answer-error"
        className="rounded-chip border border-edge bg-panel px-3 py-2 text-body"
      />
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => answer("approve")} disabled={busy}>
          Approve the estimate
        </Button>
        <Button variant="secondary" onClick={() => answer("decline")} disabled={busy}>
          Decline
        </Button>
      </div>
      <p id="answer-error" role="alert" className="min-h-6 font-bold text-flag">
        {error ?? ""}
      </p>
    </div>
  );
}
