"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { powerUpSchema } from "@/lib/jobs/power-up-schemas";
import { POWER_UP_CHECKLIST, POWER_UP_LIMITERS, POWER_UP_LIMITER_LABELS, type PowerUpChecklistId, type PowerUpLimiter } from "@/lib/vocabulary";
import { fieldError, useRecordForm } from "../record-form";

type StartForm = { limiter: PowerUpLimiter; lampPower: string; currentLimit: string; stopCurrent: string; checklist: Record<PowerUpChecklistId, boolean> };

const EMPTY: StartForm = {
  limiter: "series-lamp",
  lampPower: "",
  currentLimit: "",
  stopCurrent: "",
  checklist: Object.fromEntries(POWER_UP_CHECKLIST.map((c) => [c.id, false])) as Record<PowerUpChecklistId, boolean>,
};

/** Only the limiter's own figure is sent: a lamp's wattage, or a supply's current limit. */
function body(v: StartForm) {
  return {
    limiter: v.limiter,
    stopCurrent: v.stopCurrent,
    checklist: v.checklist,
    ...(v.limiter === "series-lamp" ? { lampPower: v.lampPower } : {}),
    ...(v.limiter === "limited-supply" ? { currentLimit: v.currentLimit } : {}),
  };
}

const LIMITER_HINT: Record<PowerUpLimiter, string> = {
  variac: "Bring the mains up by hand from zero, watching the current.",
  "series-lamp": "An incandescent lamp in series: it glows when the set draws too much.",
  "limited-supply": "A bench supply that holds the current at its limit.",
};

/**
 * A new bring-up. The checklist is advice, not a gate: what is left unticked is shown as not done, with a
 * caution, and the session can still start.
 */
export function PowerUpStartForm({ jobId }: { jobId: number }) {
  const { form, onSubmit, formError } = useRecordForm<StartForm, typeof powerUpSchema>(powerUpSchema, {
    url: `/api/jobs/${jobId}/power-ups`,
    defaults: EMPTY,
    prepare: body,
  });
  const { errors, isSubmitting } = form.formState;
  const err = (n: string) => fieldError(errors as Record<string, unknown>, n);
  const limiter = form.watch("limiter");
  const ticks = form.watch("checklist");
  const undone = POWER_UP_CHECKLIST.filter((c) => !ticks[c.id]);
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Start a power-up" className="flex flex-col gap-2">
      <div className="grid gap-x-3 sm:grid-cols-3">
        <SelectField
          id="pu-limiter"
          label="Limiter"
          hint={LIMITER_HINT[limiter]}
          options={POWER_UP_LIMITERS.map((l) => ({ value: l, label: POWER_UP_LIMITER_LABELS[l] }))}
          error={err("limiter")}
          {...form.register("limiter")}
        />
        {limiter === "series-lamp" ? (
          <Field id="pu-lamp" label="Lamp wattage" placeholder="100 W" suffix="W" autoComplete="off" error={err("lampPower")} {...form.register("lampPower")} />
        ) : null}
        {limiter === "limited-supply" ? (
          <Field
            id="pu-limit"
            label="Current limit"
            placeholder="500 mA"
            suffix="A"
            autoComplete="off"
            error={err("currentLimit")}
            {...form.register("currentLimit")}
          />
        ) : null}
        <Field
          id="pu-stop"
          label="Stop current"
          placeholder="600 mA"
          suffix="A"
          autoComplete="off"
          hint="Above this, switch off and look for the fault"
          error={err("stopCurrent")}
          {...form.register("stopCurrent")}
        />
      </div>
      <fieldset className="rounded-card border border-rule p-4">
        <legend className="px-1 font-bold">Before first power</legend>
        <ul className="flex flex-col gap-1">
          {POWER_UP_CHECKLIST.map((c) => (
            <li key={c.id}>
              <label className="flex min-h-11 cursor-pointer items-center gap-3">
                <input type="checkbox" className="size-5 shrink-0 accent-glow" {...form.register(`checklist.${c.id}`)} />
                <span>{c.label}</span>
              </label>
            </li>
          ))}
        </ul>
        {undone.length ? (
          <p className="mt-2 rounded-chip border border-caution/50 bg-caution-bg px-3 py-2 text-note" data-testid="checklist-undone">
            <strong className="text-caution">
              Not done yet: {undone.length} of {POWER_UP_CHECKLIST.length}.{" "}
            </strong>
            You can still start; each one left will show as not done on the session.
          </p>
        ) : null}
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          Start the session
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
