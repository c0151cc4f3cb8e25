"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSubmit } from "@/components/ui/use-submit";
import { DEFAULT_READY_TEMPLATE, READY_PLACEHOLDERS } from "@/lib/mail/ready-message";
import { workshopSettingsSchema, type WorkshopSettingsForm, type WorkshopSettingsInput } from "@/lib/workshop/schemas";

const NAMES = ["name", "contactEmail", "contactPhone", "address", "readyMessageTemplate"] as const;

export function SettingsForm({ initial }: { initial: WorkshopSettingsForm }) {
  const [saved, setSaved] = useState<string | null>(null);
  const form = useForm<WorkshopSettingsForm, unknown, WorkshopSettingsInput>({ resolver: zodResolver(workshopSettingsSchema), defaultValues: initial });
  const {
    register,
    reset,
    getValues,
    formState: { errors, isDirty },
  } = form;

  // The server parses the same schema, so it gets the typed text, not the parsed values (blank → null).
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit(form, {
    url: "/api/workshop",
    method: "PATCH",
    body: () => getValues(),
    fields: NAMES,
    onStart: () => setSaved(null),
    onDone: () => {
      reset(getValues());
      setSaved("Settings saved.");
    },
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-1" aria-label="Workshop settings">
      <Field id="ws-name" label="Workshop name" error={errors.name?.message} {...register("name")} />
      <Field
        id="ws-email"
        label="Contact e-mail"
        type="email"
        hint="Shown to customers on bench sheets and messages."
        error={errors.contactEmail?.message}
        {...register("contactEmail")}
      />
      <Field id="ws-phone" label="Phone" type="tel" error={errors.contactPhone?.message} {...register("contactPhone")} />
      <Field id="ws-address" label="Address" error={errors.address?.message} {...register("address")} />
      <TextareaField
        id="ws-ready"
        label="Collection message"
        rows={9}
        placeholder={DEFAULT_READY_TEMPLATE}
        hint={
          <>
            Sent to a customer, with the bench sheet attached, when their set is ready. Leave blank to use the text shown. Fill-ins:{" "}
            {READY_PLACEHOLDERS.map((p) => (
              <code key={p} className="mr-1 rounded bg-sunk px-1 font-mono">{`{${p}}`}</code>
            ))}
          </>
        }
        error={errors.readyMessageTemplate?.message}
        {...register("readyMessageTemplate")}
      />
      <div className="flex items-center gap-4">
        <Button type="submit" disabled={isSubmitting || !isDirty}>
          {isSubmitting ? "Saving…" : "Save settings"}
        </Button>
        <p role="status" aria-live="polite" className={`text-note font-bold ${formError ? "text-flag" : "text-ok"}`}>
          {formError ?? saved ?? ""}
        </p>
      </div>
    </form>
  );
}
