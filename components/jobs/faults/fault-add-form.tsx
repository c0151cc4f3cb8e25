"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { faultSchema } from "@/lib/jobs/fault-schemas";
import { fieldError, useRecordForm } from "../record-form";

type FaultForm = { symptom: string; section: string };
const EMPTY: FaultForm = { symptom: "", section: "" };

/** A symptom as the set shows it, and the section it points to. */
export function FaultAddForm({ jobId }: { jobId: number }) {
  const { form, onSubmit, formError } = useRecordForm<FaultForm, typeof faultSchema>(faultSchema, { url: `/api/jobs/${jobId}/faults`, defaults: EMPTY });
  const { errors, isSubmitting } = form.formState;
  const err = (n: string) => fieldError(errors as Record<string, unknown>, n);
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a fault" className="grid gap-x-3 sm:grid-cols-[2fr_1fr]">
      <Field
        id="fault-symptom"
        label="Symptom"
        placeholder="No vertical deflection: a bright horizontal line"
        autoComplete="off"
        error={err("symptom")}
        {...form.register("symptom")}
      />
      <Field
        id="fault-section"
        label="Section"
        placeholder="Vertical sweep"
        autoComplete="off"
        hint="Where it points, if you can tell"
        error={err("section")}
        {...form.register("section")}
      />
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          Add fault
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
