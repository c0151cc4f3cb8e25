"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { tubeLineupSchema } from "@/lib/jobs/tube-schemas";
import { fieldError, useRecordForm } from "../record-form";

export interface TypeGroup {
  label: string;
  types: readonly string[];
}

/**
 * The whole line-up in one go: paste the types as the tube chart lists them ("6BE6 6BA6 6AV6 6AQ5 6X4"),
 * or pick them one by one from the built-in tables. Positions V1, V2, … follow the order given.
 */
export function TubeLineupForm({ jobId, groups }: { jobId: number; groups: readonly TypeGroup[] }) {
  const [pick, setPick] = useState("");
  const { form, onSubmit, formError } = useRecordForm<{ types: string }, typeof tubeLineupSchema>(tubeLineupSchema, {
    url: `/api/jobs/${jobId}/tubes/lineup`,
    defaults: { types: "" },
  });
  const { errors, isSubmitting } = form.formState;
  const add = () => {
    if (!pick) return;
    const now = form.getValues("types").trim();
    form.setValue("types", now ? `${now} ${pick}` : pick, { shouldDirty: true });
    form.clearErrors("types");
    setPick("");
  };
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a tube line-up" className="flex flex-col gap-2">
      <Field
        id="tube-lineup"
        label="Tube line-up"
        placeholder="6BE6 6BA6 6AV6 6AQ5 6X4"
        autoComplete="off"
        spellCheck={false}
        hint="Types in socket order, separated by spaces or commas; they become V1, V2, …"
        error={fieldError(errors as Record<string, unknown>, "types")}
        {...form.register("types")}
      />
      <div className="flex flex-wrap items-end gap-2">
        <label className="flex min-w-0 flex-1 flex-col gap-1">
          <span className="text-note font-bold">Or pick from the built-in tables</span>
          <select
            value={pick}
            onChange={(e) => setPick(e.target.value)}
            className="min-h-11 w-full rounded-chip border border-edge bg-panel px-3"
            aria-label="Tube type from the tables"
          >
            <option value="">Choose a type…</option>
            {groups.map((g) => (
              <optgroup key={g.label} label={g.label}>
                {g.types.map((t) => (
                  <option key={t} value={t}>
                    {t}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        </label>
        <Button type="button" variant="secondary" onClick={add} disabled={!pick}>
          Add to the line-up
        </Button>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          Add these tubes
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
