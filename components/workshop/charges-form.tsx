"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { useSubmit } from "@/components/ui/use-submit";
import { CHARGE_CURRENCIES, chargesSchema, type ChargesForm as ChargesFormValues, type ChargesInput } from "@/lib/workshop/charges-schema";

const NAMES = ["currency", "hourlyRate", "taxRate"] as const;

export function ChargesForm({ initial, currencyLocked }: { initial: ChargesFormValues; currencyLocked: boolean }) {
  const [saved, setSaved] = useState<string | null>(null);
  const form = useForm<ChargesFormValues, unknown, ChargesInput>({ resolver: zodResolver(chargesSchema), defaultValues: initial });
  const {
    register,
    reset,
    getValues,
    watch,
    formState: { errors, isDirty },
  } = form;
  const currency = watch("currency");

  // The server parses the same schema, so it gets the typed text rather than the minor units.
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit(form, {
    url: "/api/workshop/charges",
    method: "PATCH",
    body: () => getValues(),
    fields: NAMES,
    onStart: () => setSaved(null),
    onDone: () => {
      reset(getValues());
      setSaved("Charges saved.");
    },
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-1" aria-label="Workshop charges">
      {currencyLocked ? (
        // Not registered: the value stays in the form's defaults and the server refuses a change anyway (409).
        <div className="mb-5 flex flex-col gap-1">
          <p className="font-bold">Currency</p>
          <p className="font-mono">{currency}</p>
          <p className="text-note text-muted">Estimates or invoices already use this currency, so it stays as it is.</p>
          {errors.currency?.message ? (
            <p role="alert" className="text-note font-bold text-flag">
              {errors.currency.message}
            </p>
          ) : null}
        </div>
      ) : (
        <SelectField
          id="ch-currency"
          label="Currency"
          options={CHARGE_CURRENCIES}
          hint="Every estimate and invoice is in this currency."
          error={errors.currency?.message}
          {...register("currency")}
        />
      )}
      <div className="grid gap-x-4 sm:grid-cols-2">
        <Field
          id="ch-rate"
          label="Hourly rate"
          inputMode="decimal"
          autoComplete="off"
          suffix={currency}
          hint="Per hour of labour."
          error={errors.hourlyRate?.message}
          {...register("hourlyRate")}
        />
        <Field
          id="ch-tax"
          label="Tax rate"
          inputMode="decimal"
          autoComplete="off"
          suffix="%"
          hint="On each total; 0 for none."
          error={errors.taxRate?.message}
          {...register("taxRate")}
        />
      </div>
      <div className="flex items-center gap-4">
        <Button type="submit" disabled={isSubmitting || !isDirty}>
          {isSubmitting ? "Saving…" : "Save charges"}
        </Button>
        <p role="status" aria-live="polite" className={`text-note font-bold ${formError ? "text-flag" : "text-ok"}`}>
          {formError ?? saved ?? ""}
        </p>
      </div>
    </form>
  );
}
