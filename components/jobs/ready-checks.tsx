"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/textarea-field";
import { readyOverrideFields, requireOverrideReason, type ReadyIssue } from "@/lib/jobs/ready-checks";

/**
 * Checks before "ready" (parts not fitted, faults not fixed, no passed power-up). The server answers 409
 * with the list; this panel shows it and lets an owner or technician go on with a reason, which the server
 * writes to the Log. It warns; it never hides what is undone. The callers send through the one submit path
 * and read the list with readyChecksOf (lib/client/submit-errors.ts).
 */

const overrideSchema = z.object({ override: z.literal(true), reason: readyOverrideFields.reason }).superRefine(requireOverrideReason);
type OverrideForm = { override: true; reason: string };

/** The list of checks, and "continue with a reason". `action` names what continuing does ("Move to ready anyway"). */
export function ReadyChecksPanel({
  id,
  checks,
  action,
  serverError,
  onContinue,
  onCancel,
}: {
  id: string;
  checks: readonly ReadyIssue[];
  action: string;
  serverError?: string | null;
  onContinue: (body: { override: true; reason: string }) => Promise<void>;
  onCancel: () => void;
}) {
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<OverrideForm>({
    resolver: zodResolver(overrideSchema as never) as never,
    defaultValues: { override: true, reason: "" },
  });
  const submit = handleSubmit(async (v) => onContinue({ override: true, reason: v.reason.trim() }));
  return (
    <section aria-labelledby={`${id}-h`} className="rounded-card border border-caution/60 bg-caution-bg p-4" data-testid="ready-checks">
      <div role="alert">
        <h3 id={`${id}-h`} className="font-bold text-caution">
          Before collection, the record shows
        </h3>
        <ul className="mt-1 list-disc pl-5">
          {checks.map((c) => (
            <li key={c.id} data-check={c.id}>
              {c.message}
            </li>
          ))}
        </ul>
      </div>
      <p className="mt-2 text-note text-muted">Finish these first, or go on and say why: the reason goes to the Log.</p>
      <form onSubmit={submit} noValidate aria-label="Continue with a reason" className="mt-3 flex flex-col gap-1">
        <TextareaField
          id={`${id}-reason`}
          label="Reason to continue"
          rows={2}
          placeholder="Customer collecting today; the hum is noted on the bench sheet"
          error={errors.reason?.message}
          {...register("reason")}
        />
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" disabled={isSubmitting}>
            {action}
          </Button>
          <Button type="button" variant="secondary" onClick={onCancel}>
            Not yet
          </Button>
          <p role="status" className="font-bold text-flag">
            {serverError ?? ""}
          </p>
        </div>
      </form>
    </section>
  );
}
