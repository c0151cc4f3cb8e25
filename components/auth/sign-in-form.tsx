"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { safeNextPath } from "@/lib/safe-next";
import { Field } from "@/components/ui/field";
import { signInSchema, type SignInInput } from "@/lib/auth/schemas";
import { FormError } from "@/components/ui/form-error";
import { useSubmit } from "@/components/ui/use-submit";

export function SignInForm({ next }: { next?: string }) {
  const router = useRouter();
  const form = useForm<SignInInput>({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });
  const {
    register,
    formState: { errors },
  } = form;
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit(form, {
    url: "/api/auth/sign-in",
    fields: ["email", "password"],
    onDone: () => router.push(safeNextPath(next)),
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2" aria-describedby="sign-in-error">
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <Field id="password" label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      <FormError id="sign-in-error" message={formError} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
