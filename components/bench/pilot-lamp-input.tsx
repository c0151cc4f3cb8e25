"use client";

import { useEffect, useRef } from "react";
import { useFormContext } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { errorAt } from "@/lib/bench/errors";
import type { InputMeta } from "@/lib/calc/types";

/**
 * The heater string's pilot lamp: its rated voltage and current, and the rectifier's DC through the tap,
 * as three quantity fields (the form keeps them as text under pilotLamp.*; lib/bench/form-values sends
 * the object only when something is typed).
 */
export function PilotLampInput({ meta }: { meta: InputMeta }) {
  const { register, formState, getValues } = useFormContext();
  const ref = useRef<HTMLFieldSetElement>(null);
  // A lamp that arrives filled in (a shared link, a saved job) shows itself rather than hiding folded away.
  useEffect(() => {
    const v = getValues("pilotLamp") as Record<string, string> | undefined;
    if (v && (v.voltage || v.current)) ref.current?.closest("details")?.setAttribute("open", "");
  }, [getValues]);
  const err = (f: string) => errorAt(formState.errors, `pilotLamp.${f}`) ?? (f === "voltage" ? errorAt(formState.errors, "pilotLamp") : undefined);
  return (
    <fieldset ref={ref} className="flex flex-col gap-1" aria-describedby="in-pilotLamp-hint">
      {/* The folding section's summary already shows the title; the legend names the group for screen readers. */}
      <legend className="sr-only">{meta.label} (optional)</legend>
      <p id="in-pilotLamp-hint" className="text-note text-muted">
        A lamp across the tapped section of a 35W4 or 35Z5GT heater, by its rating (a dial lamp is often 6.3 V, 150m). Leave blank for none.
      </p>
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field id="in-pilotLamp-voltage" label="Lamp voltage" suffix="V" autoComplete="off" error={err("voltage")} {...register("pilotLamp.voltage")} />
        <Field id="in-pilotLamp-current" label="Lamp current" suffix="A" autoComplete="off" error={err("current")} {...register("pilotLamp.current")} />
      </div>
      <Field
        id="in-pilotLamp-rectifierCurrent"
        label="Rectifier DC through the tap (optional)"
        hint="Where the plate is fed from the tap, its current also lights the lamp; blank counts as none."
        suffix="A"
        autoComplete="off"
        error={err("rectifierCurrent")}
        {...register("pilotLamp.rectifierCurrent")}
      />
    </fieldset>
  );
}
