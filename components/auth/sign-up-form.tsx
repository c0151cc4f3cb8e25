"use client";

import { useRouter } from "next/navigation";
import { useWatch } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { NEW_PASSWORD_HINT, signUpSchema } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";
import { FormError } from "@/components/ui/form-error";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";

const NAMES = ["workshopName", "name", "email", "password"] as const;

export function SignUpForm() {
  const router = useRouter();
  const { form, register, errors, submit, formError, pending } = useSchemaForm(
    signUpSchema,
    { workshopName: "", name: "", email: "", password: "" },
    { url: "/api/auth/sign-up", fields: NAMES, onDone: () => router.push("/jobs") },
  );
  const [password, email, name, workshopName] = useWatch({ control: form.control, name: ["password", "email", "name", "workshopName"] });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <Field id="workshopName" label="Workshop name" autoComplete="organization" error={errors.workshopName?.message} {...register("workshopName")} />
      <Field id="name" label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <Field
        id="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={NEW_PASSWORD_HINT}
        error={errors.password?.message}
        {...register("password")}
      />
      <PasswordStrength id="password-strength" password={password} context={[email, name, workshopName]} />
      <FormError message={formError} />
      <SubmitButton pending={pending} busy="Opening your workshop…">
        Open my workshop
      </SubmitButton>
    </form>
  );
}
