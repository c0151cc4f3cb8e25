"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { newPasswordFormSchema, resetRequestSchema, type NewPasswordForm, type ResetRequestForm } from "@/lib/auth/reset-schemas";
import { sendJson } from "@/lib/client/fetch-json";
import { NEW_PASSWORD_HINT } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";

export function ResetRequestForm() {
  const [sent, setSent] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<ResetRequestForm>({ resolver: zodResolver(resetRequestSchema), defaultValues: { email: "" } });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await sendJson<{ message: string }>("/api/auth/password-reset", values);
    if (!res.ok) {
      if (res.fields.email) setError("email", { message: res.fields.email });
      setFormError(res.message);
      return;
    }
    setSent(res.data.message);
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
      <p role="alert" aria-live="polite" className="min-h-6 font-bold text-flag">
        {formError ?? ""}
      </p>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Sending…" : "Send me a reset link"}
      </Button>
    </form>
  );
}

export function NewPasswordFormView({ token }: { token: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, control, formState: { errors, isSubmitting } } = useForm<NewPasswordForm>({ resolver: zodResolver(newPasswordFormSchema), defaultValues: { password: "", confirm: "" } });
  const password = useWatch({ control, name: "password" });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await sendJson("/api/auth/password-reset/complete", { token, password: values.password });
    if (!res.ok) {
      if (res.fields.password) setError("password", { message: res.fields.password });
      setFormError(res.message);
      return;
    }
    router.push("/sign-in?reset=1");
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <Field id="password" label="New password" type="password" autoComplete="new-password" hint={NEW_PASSWORD_HINT} error={errors.password?.message} {...register("password")} />
      <PasswordStrength id="password-strength" password={password} />
      <Field id="confirm" label="The same again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...register("confirm")} />
      <p role="alert" aria-live="polite" className="min-h-6 font-bold text-flag">
        {formError ?? ""}
      </p>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : "Set new password"}
      </Button>
    </form>
  );
}
