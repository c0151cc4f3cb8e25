"use client";

import { useWatch } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { newPasswordFormSchema, resetRequestSchema } from "@/lib/auth/reset-schemas";
import { FormError } from "@/components/ui/form-error";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { useRouter } from "next/navigation";
import { NEW_PASSWORD_HINT } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";

export function ResetRequestForm() {
  const { register, errors, submit, formError, pending, success } = useSchemaForm(
    resetRequestSchema,
    { email: "" },
    { url: "/api/auth/password-reset", fields: ["email"], refresh: false, success: (data: { message: string }) => data.message },
  );
  if (success) {
    return (
      <div role="status" className="rounded-card border border-ok bg-ok-bg px-5 py-4">
        <p className="font-bold text-ok">Check your inbox</p>
        <p className="mt-1">{success}</p>
        <p className="mt-2 text-note text-muted">Nothing after a few minutes? Look in the spam folder, or ask again.</p>
      </div>
    );
  }
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <FormError message={formError} />
      <SubmitButton pending={pending} busy="Sending…">
        Send me a reset link
      </SubmitButton>
    </form>
  );
}

export function NewPasswordFormView({ token }: { token: string }) {
  const router = useRouter();
  const { form, register, errors, submit, formError, pending } = useSchemaForm(
    newPasswordFormSchema,
    { password: "", confirm: "" },
    {
      url: "/api/auth/password-reset/complete",
      body: (values) => ({ token, password: values.password }),
      fields: ["password"],
      onDone: () => router.push("/sign-in?reset=1"),
    },
  );
  const password = useWatch({ control: form.control, name: "password" });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <Field
        id="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={NEW_PASSWORD_HINT}
        error={errors.password?.message}
        {...register("password")}
      />
      <PasswordStrength id="password-strength" password={password} />
      <Field id="confirm" label="The same again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...register("confirm")} />
      <FormError message={formError} />
      <SubmitButton pending={pending} busy="Saving…">
        Set new password
      </SubmitButton>
    </form>
  );
}
