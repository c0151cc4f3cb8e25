"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { newPasswordFormSchema, resetRequestSchema, type NewPasswordForm, type ResetRequestForm } from "@/lib/auth/reset-schemas";
import { FormError } from "@/components/ui/form-error";
import { useSubmit } from "@/components/ui/use-submit";
import { useRouter } from "next/navigation";
import { NEW_PASSWORD_HINT } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";

export function ResetRequestForm() {
  const [sent, setSent] = useState<string | null>(null);
  const form = useForm<ResetRequestForm>({ resolver: zodResolver(resetRequestSchema), defaultValues: { email: "" } });
  const {
    register,
    formState: { errors },
  } = form;
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit<ResetRequestForm, { message: string }>(form, {
    url: "/api/auth/password-reset",
    fields: ["email"],
    refresh: false,
    onDone: (data) => setSent(data.message),
  });
  if (sent) {
    return (
      <div role="status" className="rounded-card border border-ok bg-ok-bg px-5 py-4">
        <p className="font-bold text-ok">Check your inbox</p>
        <p className="mt-1">{sent}</p>
        <p className="mt-2 text-note text-muted">Nothing after a few minutes? Look in the spam folder, or ask again.</p>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <FormError message={formError} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Sending…" : "Send me a reset link"}
      </Button>
    </form>
  );
}

export function NewPasswordFormView({ token }: { token: string }) {
  const router = useRouter();
  const form = useForm<NewPasswordForm>({ resolver: zodResolver(newPasswordFormSchema), defaultValues: { password: "", confirm: "" } });
  const {
    register,
    control,
    formState: { errors },
  } = form;
  const password = useWatch({ control, name: "password" });
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit(form, {
    url: "/api/auth/password-reset/complete",
    body: (values) => ({ token, password: values.password }),
    fields: ["password"],
    onDone: () => router.push("/sign-in?reset=1"),
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
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
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : "Set new password"}
      </Button>
    </form>
  );
}
