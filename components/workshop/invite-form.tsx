"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { sendJson } from "@/lib/client/fetch-json";
import { invitationSchema, type InvitationForm } from "@/lib/workshop/schemas";
import { ROLE_OPTIONS } from "./role-labels";

export function InviteForm() {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<InvitationForm>({ resolver: zodResolver(invitationSchema), defaultValues: { email: "", role: "technician" } });

  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const res = await sendJson<{ invitation: { email: string } }>("/api/workshop/invitations", values);
    if (!res.ok) {
      if (res.fields.email) setError("email", { message: res.fields.email });
      if (res.fields.role) setError("role", { message: res.fields.role });
      setStatus({ ok: false, message: res.message });
      return;
    }
    setStatus({ ok: true, message: `Invitation sent to ${res.data.invitation.email}.` });
    reset({ email: "", role: values.role });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-x-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start" aria-label="Invite someone">
      <Field id="invite-email" label="E-mail" type="email" autoComplete="off" placeholder="name@example.com" error={errors.email?.message} {...register("email")} />
      <SelectField id="invite-role" label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...register("role")} />
      <Button type="submit" disabled={isSubmitting} className="sm:mt-7">
        {isSubmitting ? "Sending…" : "Send invitation"}
      </Button>
      <p role="status" aria-live="polite" className={`min-h-6 text-note font-bold sm:col-span-3 ${status?.ok ? "text-ok" : "text-flag"}`}>
        {status?.message ?? ""}
      </p>
    </form>
  );
}
