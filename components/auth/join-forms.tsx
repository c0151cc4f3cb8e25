"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { sendJson } from "@/lib/client/fetch-json";
import { NEW_PASSWORD_HINT } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";
import { joinExistingSchema, joinNewSchema, type JoinExistingForm, type JoinNewForm } from "@/lib/workshop/schemas";

function useJoin(token: string) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  async function join(body: Record<string, unknown>) {
    setFormError(null);
    const res = await sendJson("/api/invitations/accept", { token, ...body });
    if (!res.ok) {
      setFormError(res.message);
      return res.fields;
    }
    router.push("/jobs");
    router.refresh();
    return null;
  }
  return { join, formError };
}

function FormError({ message }: { message: string | null }) {
  return (
    <p id="join-error" role="alert" aria-live="polite" className="min-h-6 font-bold text-flag">
      {message ?? ""}
    </p>
  );
}

/** No account yet for the invited address: choose a name and password. */
export function JoinNewForm({ token, email }: { token: string; email: string }) {
  const { join, formError } = useJoin(token);
  const { register, handleSubmit, setError, control, formState: { errors, isSubmitting } } = useForm<JoinNewForm>({ resolver: zodResolver(joinNewSchema), defaultValues: { name: "", password: "" } });
  const [password, name] = useWatch({ control, name: ["password", "name"] });
  const onSubmit = handleSubmit(async (values) => {
    const fields = await join({ mode: "sign-up", ...values });
    if (fields?.name) setError("name", { message: fields.name });
    if (fields?.password) setError("password", { message: fields.password });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <Field id="join-email" label="E-mail" value={email} readOnly disabled hint="The address the invitation was sent to." />
      <Field id="name" label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <Field id="password" label="Choose a password" type="password" autoComplete="new-password" hint={NEW_PASSWORD_HINT} error={errors.password?.message} {...register("password")} />
      <PasswordStrength id="password-strength" password={password} context={[email, name]} />
      <FormError message={formError} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Joining…" : "Create my account and join"}
      </Button>
    </form>
  );
}

/** The invited address already has an account: its password joins. */
export function JoinExistingForm({ token, email }: { token: string; email: string }) {
  const { join, formError } = useJoin(token);
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<JoinExistingForm>({ resolver: zodResolver(joinExistingSchema), defaultValues: { password: "" } });
  const onSubmit = handleSubmit(async (values) => {
    const fields = await join({ mode: "sign-in", ...values });
    if (fields?.password) setError("password", { message: fields.password });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <Field id="join-email" label="E-mail" value={email} readOnly disabled />
      <Field id="password" label="Your Glowbench password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      <p className="-mt-2 mb-1 text-note">
        <Link href="/forgot-password" className="font-bold text-signal underline underline-offset-4">
          Forgot your password?
        </Link>
      </p>
      <FormError message={formError} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Joining…" : "Sign in and join"}
      </Button>
    </form>
  );
}

/** Already signed in as the invited address: one click joins. */
export function JoinSignedIn({ token, workshopName }: { token: string; workshopName: string }) {
  const { join, formError } = useJoin(token);
  const [busy, setBusy] = useState(false);
  return (
    <div className="flex flex-col gap-2">
      <Button
        disabled={busy}
        onClick={async () => {
          setBusy(true);
          await join({ mode: "session" });
          setBusy(false);
        }}
      >
        {busy ? "Joining…" : `Join ${workshopName}`}
      </Button>
      <FormError message={formError} />
    </div>
  );
}
