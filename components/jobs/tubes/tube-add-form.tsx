"use client";

import { Button } from "@/components/ui/button";
import { tubeSchema } from "@/lib/jobs/tube-schemas";
import { useRecordForm } from "../record-form";
import { EMPTY_TUBE, TubeFields, tubeBody, type TubeForm } from "./tube-fields";

/** One socket at a time: any member may add a tube and its test result. */
export function TubeAddForm({ jobId }: { jobId: number }) {
  const { form, onSubmit, formError } = useRecordForm<TubeForm, typeof tubeSchema>(tubeSchema, {
    url: `/api/jobs/${jobId}/tubes`,
    defaults: EMPTY_TUBE,
    prepare: (v) => tubeBody(v, undefined),
    onDone: () => {
      form.reset(EMPTY_TUBE);
      form.setFocus("position");
    },
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a tube" className="grid gap-x-3 sm:grid-cols-2">
      <TubeFields idPrefix="tube-add" register={form.register} errors={errors} />
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          Add tube
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
