"use client";

import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/textarea-field";
import { powerUpOutcomeSchema } from "@/lib/jobs/power-up-schemas";
import { outcomeRefusal, type StepFigures } from "@/lib/jobs/power-up-steps";
import type { PowerUpOutcome } from "@/lib/vocabulary";
import { fieldError, useRecordForm } from "../record-form";

type OutcomeForm = { outcome: PowerUpOutcome; reason: string };

/**
 * How the session ended. Passing a session with a step over its stop current needs a reason (the same
 * rule the server keeps, from lib/jobs/power-up-steps.ts); stopping always asks what stopped it.
 */
export function OutcomeForm({
  jobId,
  sessionId,
  steps,
  stopCurrent,
}: {
  jobId: number;
  sessionId: number;
  steps: readonly StepFigures[];
  stopCurrent: number | null;
}) {
  const schema = powerUpOutcomeSchema.superRefine((v, ctx) => {
    const refusal = outcomeRefusal(v.outcome, v.reason, steps, stopCurrent);
    if (refusal) ctx.addIssue({ code: "custom", path: ["reason"], message: refusal });
    else if (v.outcome === "stopped" && !v.reason) ctx.addIssue({ code: "custom", path: ["reason"], message: "Say what stopped the session." });
  });
  const { form, onSubmit, formError } = useRecordForm<OutcomeForm, typeof schema>(schema, {
    url: `/api/jobs/${jobId}/power-ups/${sessionId}`,
    method: "PATCH",
    defaults: { outcome: "passed", reason: "" },
  });
  const { errors, isSubmitting } = form.formState;
  const over = steps.some((s) => stopCurrent !== null && s.currentDrawn > stopCurrent);
  const id = `outcome-${sessionId}-reason`;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="End the session" className="flex flex-col gap-1">
      <TextareaField
        id={id}
        label="Reason"
        rows={2}
        hint={over ? "A step went over the stop current: passing needs a reason." : "Needed to stop; optional to pass."}
        placeholder={over ? "Surge at switch-on only; settled at 0.42 A after the filters formed" : "Lamp stayed bright at 60 V: suspect the filter capacitor"}
        error={fieldError(errors as Record<string, unknown>, "reason")}
        {...form.register("reason")}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting} onClick={() => form.setValue("outcome", "passed")}>
          Mark passed
        </Button>
        <Button type="submit" variant="secondary" disabled={isSubmitting} onClick={() => form.setValue("outcome", "stopped")}>
          Stop the session
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
