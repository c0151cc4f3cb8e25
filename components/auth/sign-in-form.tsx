"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { safeNextPath } from "@/lib/safe-next";
import { Field } from "@/components/ui/field";
import { signInSchema, type SignInInput } from "@/lib/auth/schemas";
import { sendJson } from "@/lib/client/fetch-json";

export function SignInForm({ next }: { next?: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SignInInput>({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await sendJson("/api/auth/sign-in", values);
    if (!res.ok) {
      for (const [name, message] of Object.entries(res.fields)) {
        if (name === "email" || name === "password") setError(name, { message });
      }
      setFormError(res.message);
      return;
    }
    router.push(safeNextPath(next));
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2" aria-describedby="sign-in-error">
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <Field id="password" label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      <p id="sign-in-error" role="alert" aria-live="polite" className="min-h-6 font-bold text-flag">
        {formError ?? ""}
      </p>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
