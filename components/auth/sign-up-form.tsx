"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { NEW_PASSWORD_HINT, signUpSchema, type SignUpInput } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";
import { FormError } from "@/components/ui/form-error";
import { useSubmit } from "@/components/ui/use-submit";

const NAMES = ["workshopName", "name", "email", "password"] as const;

export function SignUpForm() {
  const router = useRouter();
  const form = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { workshopName: "", name: "", email: "", password: "" },
  });
  const {
    register,
    control,
    formState: { errors },
  } = form;

  const [password, email, name, workshopName] = useWatch({ control, name: ["password", "email", "name", "workshopName"] });

  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit(form, { url: "/api/auth/sign-up", fields: NAMES, onDone: () => router.push("/jobs") });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
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
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Opening your workshop…" : "Open my workshop"}
      </Button>
    </form>
  );
}
