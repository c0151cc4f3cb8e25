"use client";

import { useRouter } from "next/navigation";
import { safeNextPath } from "@/lib/safe-next";
import { Field } from "@/components/ui/field";
import { signInSchema } from "@/lib/auth/schemas";
import { FormError } from "@/components/ui/form-error";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";

export function SignInForm({ next }: { next?: string }) {
  const router = useRouter();
  const { register, errors, submit, formError, pending } = useSchemaForm(
    signInSchema,
    { email: "", password: "" },
    { url: "/api/auth/sign-in", fields: ["email", "password"], onDone: () => router.push(safeNextPath(next)) },
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2" aria-describedby="sign-in-error">
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <Field id="password" label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      <FormError id="sign-in-error" message={formError} />
      <SubmitButton pending={pending} busy="Signing in…">
        Sign in
      </SubmitButton>
    </form>
  );
}
