"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { sendJson } from "@/lib/client/fetch-json";
import { CHARGE_CURRENCIES, chargesSchema, type ChargesForm as ChargesFormValues, type ChargesInput } from "@/lib/workshop/charges-schema";

const NAMES = ["currency", "hourlyRate", "taxRate"] as const;

export function ChargesForm({ initial, currencyLocked }: { initial: ChargesFormValues; currencyLocked: boolean }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    getValues,
    watch,
    formState: { errors, isSubmitting, isDirty },
  } = useForm<ChargesFormValues, unknown, ChargesInput>({ resolver: zodResolver(chargesSchema), defaultValues: initial });
  const currency = watch("currency");

  // The server parses the same schema, so it gets the typed text rather than the minor units.
  const onSubmit = handleSubmit(async () => {
    const values = getValues();
    setStatus(null);
    const res = await sendJson("/api/workshop/charges", values, "PATCH");
    if (!res.ok) {
      for (const n of NAMES) if (res.fields[n]) setError(n, { message: res.fields[n] });
      setStatus({ ok: false, message: res.message });
      return;
    }
    reset(values);
    setStatus({ ok: true, message: "Charges saved." });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-1" aria-label="Workshop charges">
      {currencyLocked ? (
        // Not registered: the value stays in the form's defaults and the server refuses a change anyway (409).
        <div className="mb-5 flex flex-col gap-1">
          <p className="font-bold">Currency</p>
          <p className="font-mono">{currency}</p>
          <p className="text-note text-muted">Estimates or invoices already use this currency, so it stays as it is.</p>
          {errors.currency?.message ? <p role="alert" className="text-note font-bold text-flag">{errors.currency.message}</p> : null}
        </div>
      ) : (
        <SelectField id="ch-currency" label="Currency" options={CHARGE_CURRENCIES} hint="Every estimate and invoice is in this currency." error={errors.currency?.message} {...register("currency")} />
      )}
      <div className="grid gap-x-4 sm:grid-cols-2">
        <Field id="ch-rate" label="Hourly rate" inputMode="decimal" autoComplete="off" suffix={currency} hint="Per hour of labour." error={errors.hourlyRate?.message} {...register("hourlyRate")} />
        <Field id="ch-tax" label="Tax rate" inputMode="decimal" autoComplete="off" suffix="%" hint="On each total; 0 for none." error={errors.taxRate?.message} {...register("taxRate")} />
      </div>
      <div className="flex items-center gap-4">
        <Button type="submit" disabled={isSubmitting || !isDirty}>
          {isSubmitting ? "Saving…" : "Save charges"}
        </Button>
        <p role="status" aria-live="polite" className={`text-note font-bold ${status?.ok ? "text-ok" : "text-flag"}`}>
          {status?.message ?? ""}
        </p>
      </div>
    </form>
  );
}
