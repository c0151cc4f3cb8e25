"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSubmit } from "@/components/ui/use-submit";
import { logNoteSchema, powerUpSchema } from "@/lib/jobs/log-schemas";

function useLogForm<F extends Record<string, string>>(jobId: number, schema: typeof logNoteSchema | typeof powerUpSchema, empty: F) {
  const form = useForm<F>({ resolver: zodResolver(schema) as never, defaultValues: empty as never });
  const { submit: onSubmit, formError } = useSubmit(form, {
    url: `/api/jobs/${jobId}/log`,
    body: () => form.getValues(),
    fields: Object.keys(empty),
    onDone: () => form.reset(empty as never),
  });
  return { form, onSubmit, formError };
}

export function NoteForm({ jobId }: { jobId: number }) {
  const { form, onSubmit, formError } = useLogForm(jobId, logNoteSchema, { kind: "note", text: "" });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Write a log entry">
      <TextareaField id="log-text" label="What you did or found" rows={3} error={errors.text?.message as string | undefined} {...form.register("text")} />
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          Add to log
        </Button>
        <p role="alert" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}

/** The quick entry for a current-limited bring-up: supply voltage, current drawn, what was seen. */
export function PowerUpForm({ jobId }: { jobId: number }) {
  const { form, onSubmit, formError } = useLogForm(jobId, powerUpSchema, { kind: "power-up", supplyVoltage: "", currentDrawn: "", text: "" });
  const { errors, isSubmitting } = form.formState;
  const msg = (k: string) => (errors as Record<string, { message?: string }>)[k]?.message;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Record a power-up" className="grid gap-x-3 sm:grid-cols-2">
      <Field id="pu-supply" label="Supply voltage" placeholder="60 V" suffix="V" error={msg("supplyVoltage")} {...form.register("supplyVoltage")} />
      <Field id="pu-current" label="Current drawn" placeholder="180 mA" suffix="A" error={msg("currentDrawn")} {...form.register("currentDrawn")} />
      <TextareaField
        id="pu-text"
        label="What was seen"
        className="sm:col-span-2"
        rows={2}
        placeholder="Heaters lit, lamp dimmed after 20 s, no smoke, faint hum"
        error={msg("text")}
        {...form.register("text")}
      />
      <div className="flex items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          Record power-up
        </Button>
        <p role="alert" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
