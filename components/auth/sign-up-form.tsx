"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { NEW_PASSWORD_HINT, signUpSchema, type SignUpInput } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";
import { sendJson } from "@/lib/client/fetch-json";

const NAMES = ["workshopName", "name", "email", "password"] as const;

export function SignUpForm() {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { workshopName: "", name: "", email: "", password: "" },
  });

  const [password, email, name, workshopName] = useWatch({ control, name: ["password", "email", "name", "workshopName"] });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await sendJson("/api/auth/sign-up", values);
    if (!res.ok) {
      for (const n of NAMES) if (res.fields[n]) setError(n, { message: res.fields[n] });
      setFormError(res.message);
      return;
    }
    router.push("/jobs");
    router.refresh();
  });

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
      <p role="alert" aria-live="polite" className="min-h-6 font-bold text-flag">
        {formError ?? ""}
      </p>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Opening your workshop…" : "Open my workshop"}
      </Button>
    </form>
  );
}
