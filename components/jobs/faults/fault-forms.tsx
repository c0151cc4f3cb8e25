"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { candidateSchema, faultUpdateSchema } from "@/lib/jobs/fault-schemas";
import { fieldError, useRecordForm } from "../record-form";

/** A new candidate goes to the end of the test order. */
export function CandidateAddForm({ jobId, faultId }: { jobId: number; faultId: number }) {
  const { form, onSubmit, formError } = useRecordForm<{ description: string }, typeof candidateSchema>(candidateSchema, {
    url: `/api/jobs/${jobId}/faults/${faultId}/candidates`,
    defaults: { description: "" },
    onDone: () => {
      form.reset({ description: "" });
      form.setFocus("description");
    },
  });
  const { errors, isSubmitting } = form.formState;
  const id = `fault-${faultId}-candidate`;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a candidate" className="flex flex-wrap items-start gap-x-3">
      <Field
        id={id}
        label="Next candidate"
        placeholder="Vertical output transformer"
        autoComplete="off"
        className="min-w-0 flex-1 basis-56"
        error={fieldError(errors as Record<string, unknown>, "description")}
        {...form.register("description")}
      />
      <div className="flex flex-wrap items-center gap-3 pt-0 sm:pt-7">
        <Button type="submit" disabled={isSubmitting}>
          Add candidate
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}

/** The repair as done. Written once the cause is found, it closes the fault; cleared, it reopens it. */
export function ResolutionForm({ jobId, faultId, resolution }: { jobId: number; faultId: number; resolution: string | null }) {
  const defaults = { resolution: resolution ?? "" };
  const { form, onSubmit, formError } = useRecordForm<typeof defaults, typeof faultUpdateSchema>(faultUpdateSchema, {
    url: `/api/jobs/${jobId}/faults/${faultId}`,
    method: "PATCH",
    defaults,
    onDone: (_data, values) => form.reset(values),
  });
  const { errors, isSubmitting, isDirty } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Write the resolution" className="flex flex-col gap-1">
      <TextareaField
        id={`fault-${faultId}-resolution`}
        label="Resolution"
        rows={2}
        placeholder="Replaced the vertical output transformer; full height restored, linearity set"
        error={fieldError(errors as Record<string, unknown>, "resolution")}
        {...form.register("resolution")}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting || !isDirty}>
          {!isDirty && resolution ? "Resolution saved" : "Save resolution"}
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
