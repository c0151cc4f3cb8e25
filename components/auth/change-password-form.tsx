"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { NEW_PASSWORD_HINT, changePasswordSchema, type ChangePasswordInput } from "@/lib/auth/schemas";
import { sendJson } from "@/lib/client/fetch-json";
import { PasswordStrength } from "./password-strength";

const NAMES = ["currentPassword", "newPassword"] as const;

/** Current password, then the new one; on success every other browser is signed out and this one stays in. */
export function ChangePasswordForm({ context }: { context: string[] }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, setError, reset, control, formState: { errors, isSubmitting } } = useForm<ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: "", newPassword: "" },
  });
  const newPassword = useWatch({ control, name: "newPassword" });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setDone(false);
    const res = await sendJson("/api/auth/password", values);
    if (!res.ok) {
      for (const n of NAMES) if (res.fields[n]) setError(n, { message: res.fields[n] });
      setFormError(res.message);
      return;
    }
    reset();
    setDone(true);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-md flex-col gap-2">
      <Field id="currentPassword" label="Current password" type="password" autoComplete="current-password" error={errors.currentPassword?.message} {...register("currentPassword")} />
      <Field id="newPassword" label="New password" type="password" autoComplete="new-password" hint={NEW_PASSWORD_HINT} error={errors.newPassword?.message} {...register("newPassword")} />
      <PasswordStrength id="new-password-strength" password={newPassword} context={context} />
      <p role="alert" aria-live="polite" className="min-h-6 font-bold text-flag">
        {formError ?? ""}
      </p>
      {done ? (
        <p role="status" className="rounded-card border border-ok bg-ok-bg px-4 py-3 font-bold text-ok">
          Password changed. Every other browser signed in to your account has been signed out.
        </p>
      ) : null}
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Changing…" : "Change password"}
      </Button>
    </form>
  );
}
