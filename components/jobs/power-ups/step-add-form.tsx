"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { powerUpStepSchema } from "@/lib/jobs/power-up-schemas";
import type { PowerUpWarning } from "@/lib/jobs/power-up-steps";
import { fieldError, useRecordForm } from "../record-form";

type StepForm = { supplyVoltage: string; currentDrawn: string; minutes: string; bPlus: string; note: string };
const EMPTY: StepForm = { supplyVoltage: "", currentDrawn: "", minutes: "", bPlus: "", note: "" };

/** One step up the variac (or one more minute on the lamp): what the supply was, what the set drew, what happened. */
export function StepAddForm({ jobId, sessionId }: { jobId: number; sessionId: number }) {
  const [warnings, setWarnings] = useState<PowerUpWarning[]>([]);
  const { form, onSubmit, formError } = useRecordForm<StepForm, typeof powerUpStepSchema>(powerUpStepSchema, {
    url: `/api/jobs/${jobId}/power-ups/${sessionId}/steps`,
    defaults: EMPTY,
    onDone: (data) => {
      setWarnings((data as { step?: { warnings?: PowerUpWarning[] } }).step?.warnings ?? []);
      form.reset(EMPTY);
      form.setFocus("supplyVoltage");
    },
  });
  const { errors, isSubmitting } = form.formState;
  const err = (n: string) => fieldError(errors as Record<string, unknown>, n);
  const id = (n: string) => `step-${sessionId}-${n}`;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a step" className="grid gap-x-3 grid-cols-2 lg:grid-cols-4">
      <Field
        id={id("supply")}
        label="Supply voltage"
        placeholder="60 V"
        suffix="V"
        autoComplete="off"
        error={err("supplyVoltage")}
        {...form.register("supplyVoltage")}
      />
      <Field
        id={id("current")}
        label="Current drawn"
        placeholder="180 mA"
        suffix="A"
        autoComplete="off"
        error={err("currentDrawn")}
        {...form.register("currentDrawn")}
      />
      <Field
        id={id("minutes")}
        label="Minutes held"
        placeholder="5"
        inputMode="decimal"
        autoComplete="off"
        error={err("minutes")}
        {...form.register("minutes")}
      />
      <Field id={id("bplus")} label="B+ if measured" placeholder="95 V" suffix="V" autoComplete="off" error={err("bPlus")} {...form.register("bPlus")} />
      <TextareaField
        id={id("note")}
        label="What was seen, heard or smelt"
        rows={2}
        className="col-span-2 lg:col-span-4"
        placeholder="Heaters lit, lamp dim, no smoke, faint hum"
        error={err("note")}
        {...form.register("note")}
      />
      <div className="col-span-2 flex flex-wrap items-center gap-3 lg:col-span-4">
        <Button type="submit" disabled={isSubmitting}>
          Add step
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
      {warnings.length ? (
        <ul className="col-span-2 flex flex-col gap-1 lg:col-span-4" role="status">
          {warnings.map((w) => (
            <li
              key={w.message}
              className={`rounded-chip border px-3 py-2 font-bold ${w.level === "danger" ? "border-hazard/60 bg-hazard-bg text-hazard" : "border-caution/50 bg-caution-bg text-caution"}`}
            >
              {w.message}
            </li>
          ))}
        </ul>
      ) : null}
    </form>
  );
}
