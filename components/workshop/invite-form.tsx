"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { useSubmit } from "@/components/ui/use-submit";
import { invitationSchema, type InvitationForm } from "@/lib/workshop/schemas";
import { ROLE_OPTIONS } from "./role-labels";

export function InviteForm() {
  const [sent, setSent] = useState<string | null>(null);
  const form = useForm<InvitationForm>({ resolver: zodResolver(invitationSchema), defaultValues: { email: "", role: "technician" } });
  const {
    register,
    reset,
    formState: { errors },
  } = form;
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit<InvitationForm, { invitation: { email: string } }>(form, {
    url: "/api/workshop/invitations",
    fields: ["email", "role"],
    onStart: () => setSent(null),
    onDone: (data, values) => {
      setSent(`Invitation sent to ${data.invitation.email}.`);
      reset({ email: "", role: values.role });
    },
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-x-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start" aria-label="Invite someone">
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
      <Button type="submit" disabled={isSubmitting} className="sm:mt-7">
        {isSubmitting ? "Sending…" : "Send invitation"}
      </Button>
      <p role="status" aria-live="polite" className={`min-h-6 text-note font-bold sm:col-span-3 ${formError ? "text-flag" : "text-ok"}`}>
        {formError ?? sent ?? ""}
      </p>
    </form>
  );
}
