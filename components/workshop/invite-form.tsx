"use client";

import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { invitationSchema } from "@/lib/workshop/schemas";
import { ROLE_OPTIONS } from "./role-labels";

export function InviteForm() {
  const { form, register, errors, submit, formError, pending, success } = useSchemaForm(
    invitationSchema,
    { email: "", role: "technician" },
    {
      url: "/api/workshop/invitations",
      fields: ["email", "role"],
      // The next invitation is often for the same role.
      onDone: (_, values): void => form.reset({ email: "", role: values.role }),
      success: (data: { invitation: { email: string } }) => `Invitation sent to ${data.invitation.email}.`,
    },
  );

  return (
    <form onSubmit={submit} noValidate className="grid gap-x-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start" aria-label="Invite someone">
      <Field
        id="invite-email"
        label="E-mail"
        type="email"
        autoComplete="off"
        placeholder="name@example.com"
        error={errors.email?.message}
        {...register("email")}
      />
      <SelectField id="invite-role" label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...register("role")} />
      <SubmitButton pending={pending} busy="Sending…" className="sm:mt-7">
        Send invitation
      </SubmitButton>
      <p role="status" aria-live="polite" className={`min-h-6 text-note font-bold sm:col-span-3 ${formError ? "text-flag" : "text-ok"}`}>
        {formError ?? success ?? ""}
      </p>
    </form>
  );
}
