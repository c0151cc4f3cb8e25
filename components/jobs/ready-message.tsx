"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useRef, useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSubmit } from "@/components/ui/use-submit";
import type { ReadyDraft } from "@/db/queries/ready-message";
import { getJson } from "@/lib/client/fetch-json";
import { messageFor, readyChecksOf } from "@/lib/client/submit-errors";
import type { ReadyIssue } from "@/lib/jobs/ready-checks";
import { readyMessageSchema, type ReadyMessageForm } from "@/lib/mail/ready-schemas";
import { ReadyChecksPanel } from "./ready-checks";

/**
 * "Tell the customer it's ready": a self-contained panel for the job Overview. It loads the draft
 * from the workshop's template, lets a technician or owner edit it, and sends it with the bench sheet.
 * `status` is only a cue to reload the draft when the job's status changes on the page.
 */
export function ReadyMessage({ jobId, status }: { jobId: number; status?: string }) {
  const [draft, setDraft] = useState<ReadyDraft | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  // A refused send: the checks before "ready", and the message as it was to go.
  const [held, setHeld] = useState<{ values: ReadyMessageForm; checks: ReadyIssue[] } | null>(null);
  // The checks before "ready" still open when the draft loaded: shown ahead, asked about on sending.
  const [open, setOpen] = useState<ReadyIssue[]>([]);
  const form = useForm<ReadyMessageForm>({
    resolver: zodResolver(readyMessageSchema),
    defaultValues: { subject: "", text: "" },
  });
  const {
    register,
    reset,
    formState: { errors, isSubmitting },
  } = form;

  useEffect(() => {
    let live = true;
    getJson<{ draft: ReadyDraft; checks?: ReadyIssue[] }>(`/api/jobs/${jobId}/ready-message`)
      .then(({ draft, checks }) => {
        if (!live) return;
        setDraft(draft);
        setOpen(checks ?? []);
        reset({ subject: draft.subject, text: draft.text });
      })
      .catch((err: Error) => live && setLoadError(err.message));
    return () => {
      live = false;
    };
  }, [jobId, status, reset]);

  // "Send anyway" sends the held message again with the reason beside it.
  const override = useRef<{ override: true; reason: string } | null>(null);
  const {
    submit: onSubmit,
    send,
    formError,
    setFormError,
  } = useSubmit<ReadyMessageForm, { sent: { to: string } }>(form, {
    url: `/api/jobs/${jobId}/ready-message`,
    body: (values) => ({ ...values, ...override.current }),
    fields: ["subject", "text"],
    refresh: false,
    onStart: () => setSent(null),
    onFail: (f, values) => {
      const checks = readyChecksOf(f);
      if (checks.length) {
        setFormError(null);
        setHeld({ values, checks });
      } else setFormError(messageFor(f, "reason"));
    },
    onDone: (data) => {
      setHeld(null);
      setSent(`Sent to ${data.sent.to} with the bench sheet attached.`);
    },
  });
  const result = sent ? { ok: true, message: sent } : formError ? { ok: false, message: formError } : null;
  async function sendAnyway(values: ReadyMessageForm, body: { override: true; reason: string }) {
    override.current = body;
    try {
      await send(values);
    } finally {
      override.current = null;
    }
  }

  if (loadError) return <p className="text-note text-flag">{loadError}</p>;
  if (!draft) return <p className="text-note text-muted">Loading the customer message…</p>;
  if (!draft.canSend) {
    if (draft.blocked === "role") return null;
    return (
      <section aria-labelledby={`ready-${jobId}`} className="rounded-card border border-dashed border-rule p-4">
        <h3 id={`ready-${jobId}`} className="font-bold">
          Tell the customer
        </h3>
        <p className="mt-1 text-note text-muted">{draft.reason}</p>
      </section>
    );
  }
  return (
    <section aria-labelledby={`ready-${jobId}`} className="rounded-card border border-ok bg-ok-bg/40 p-4">
      <h3 id={`ready-${jobId}`} className="font-bold">
        Tell the customer it’s ready
      </h3>
      <p className="mb-3 mt-1 text-note text-muted">
        To <strong className="text-ink">{draft.to}</strong>, with the bench sheet as a PDF. Edit the words for this customer if you like; the template lives in
        the workshop settings.
      </p>
      {open.length && !held ? (
        <div role="note" className="mb-3 rounded-chip border border-caution/50 bg-caution-bg px-3 py-2 text-note" data-testid="ready-open-checks">
          <p className="font-bold text-caution">Still open on the record</p>
          <ul className="list-disc pl-5">
            {open.map((c) => (
              <li key={c.id}>{c.message}</li>
            ))}
          </ul>
        </div>
      ) : null}
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-1" aria-label="Collection message">
        <Field id={`ready-subject-${jobId}`} label="Subject" error={errors.subject?.message} {...register("subject")} />
        <TextareaField id={`ready-text-${jobId}`} label="Message" rows={10} error={errors.text?.message} {...register("text")} />
        <div className="flex flex-wrap items-center gap-4">
          <Button type="submit" disabled={isSubmitting}>
            {isSubmitting ? "Sending…" : "Send to customer"}
          </Button>
          <p role="status" aria-live="polite" className={`text-note font-bold ${result?.ok ? "text-ok" : "text-flag"}`}>
            {held ? "" : (result?.message ?? "")}
          </p>
        </div>
      </form>
      {held ? (
        <div className="mt-3">
          <ReadyChecksPanel
            id={`ready-checks-${jobId}`}
            checks={held.checks}
            action="Send anyway"
            serverError={result?.ok ? null : result?.message}
            onContinue={(body) => sendAnyway(held.values, body)}
            onCancel={() => setHeld(null)}
          />
        </div>
      ) : null}
    </section>
  );
}
