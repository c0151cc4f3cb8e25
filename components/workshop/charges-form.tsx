"use client";

import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { CHARGE_CURRENCIES, chargesSchema, type ChargesForm as ChargesFormValues } from "@/lib/workshop/charges-schema";
import { SaveRow, useSettingsForm } from "./settings-save";

const NAMES = ["currency", "hourlyRate", "taxRate"] as const;

export function ChargesForm({ initial, currencyLocked }: { initial: ChargesFormValues; currencyLocked: boolean }) {
  const { form, register, errors, submit, formError, pending, success } = useSettingsForm(chargesSchema, initial, {
    url: "/api/workshop/charges",
    fields: NAMES,
    saved: "Charges saved.",
  });
  const currency = form.watch("currency");

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-1" aria-label="Workshop charges">
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
      <SaveRow label="Save charges" pending={pending} dirty={form.formState.isDirty} formError={formError} success={success} />
    </form>
  );
}
