"use client";

import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { DEFAULT_READY_TEMPLATE, READY_PLACEHOLDERS } from "@/lib/mail/ready-message";
import { workshopSettingsSchema, type WorkshopSettingsForm } from "@/lib/workshop/schemas";
import { SaveRow, useSettingsForm } from "./settings-save";

const NAMES = ["name", "contactEmail", "contactPhone", "address", "readyMessageTemplate"] as const;

export function SettingsForm({ initial }: { initial: WorkshopSettingsForm }) {
  const { form, register, errors, submit, formError, pending, success } = useSettingsForm(workshopSettingsSchema, initial, {
    url: "/api/workshop",
    fields: NAMES,
    saved: "Settings saved.",
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-1" aria-label="Workshop settings">
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
      <SaveRow label="Save settings" pending={pending} dirty={form.formState.isDirty} formError={formError} success={success} />
    </form>
  );
}
