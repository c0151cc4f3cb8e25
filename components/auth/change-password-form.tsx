"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { NEW_PASSWORD_HINT, changePasswordSchema, type ChangePasswordInput } from "@/lib/auth/schemas";
import { FormError } from "@/components/ui/form-error";
import { useSubmit } from "@/components/ui/use-submit";
import { PasswordStrength } from "./password-strength";

const NAMES = ["currentPassword", "newPassword"] as const;

/** Current password, then the new one; on success every other browser is signed out and this one stays in. */
export function ChangePasswordForm({ context }: { context: string[] }) {
  const [done, setDone] = useState(false);
  const form = useForm<ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: "", newPassword: "" },
  });
  const {
    register,
    reset,
    control,
    formState: { errors },
  } = form;
  const newPassword = useWatch({ control, name: "newPassword" });
  const {
    submit,
    formError,
    pending: isSubmitting,
  } = useSubmit(form, {
    url: "/api/auth/password",
    fields: NAMES,
    refresh: false,
    onStart: () => setDone(false),
    onDone: () => {
      reset();
      setDone(true);
    },
  });
  return (
    <form onSubmit={submit} noValidate className="flex max-w-md flex-col gap-2">
      <Field
        id="currentPassword"
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...register("currentPassword")}
      />
      <Field
        id="newPassword"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={NEW_PASSWORD_HINT}
        error={errors.newPassword?.message}
        {...register("newPassword")}
      />
      <PasswordStrength id="new-password-strength" password={newPassword} context={context} />
      <FormError message={formError} />
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
