"use client";

import { useWatch } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { NEW_PASSWORD_HINT, changePasswordSchema } from "@/lib/auth/schemas";
import { FormError } from "@/components/ui/form-error";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { PasswordStrength } from "./password-strength";

const NAMES = ["currentPassword", "newPassword"] as const;

/** Current password, then the new one; on success every other browser is signed out and this one stays in. */
export function ChangePasswordForm({ context }: { context: string[] }) {
  const { form, register, errors, submit, formError, pending, success } = useSchemaForm(
    changePasswordSchema,
    { currentPassword: "", newPassword: "" },
    {
      url: "/api/auth/password",
      fields: NAMES,
      refresh: false,
      onDone: (): void => form.reset(),
      success: () => "Password changed. Every other browser signed in to your account has been signed out.",
    },
  );
  const newPassword = useWatch({ control: form.control, name: "newPassword" });
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
      {success ? (
        <p role="status" className="rounded-card border border-ok bg-ok-bg px-4 py-3 font-bold text-ok">
          {success}
        </p>
      ) : null}
      <SubmitButton pending={pending} busy="Changing…">
        Change password
      </SubmitButton>
    </form>
  );
}
