"use client";

import { Link } from "@/components/ui/link";
import { useRouter } from "next/navigation";
import { useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { useAction } from "@/components/ui/use-submit";
import { NEW_PASSWORD_HINT } from "@/lib/auth/schemas";
import { PasswordStrength } from "./password-strength";
import { joinExistingSchema, joinNewSchema } from "@/lib/workshop/schemas";

const ACCEPT = "/api/invitations/accept";

function JoinError({ message }: { message: string | null }) {
  return <FormError id="join-error" message={message} />;
}

/** No account yet for the invited address: choose a name and password. */
export function JoinNewForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const { form, register, errors, submit, formError, pending } = useSchemaForm(
    joinNewSchema,
    { name: "", password: "" },
    { url: ACCEPT, body: (values) => ({ token, mode: "sign-up", ...values }), fields: ["name", "password"], onDone: () => router.push("/jobs") },
  );
  const [password, name] = useWatch({ control: form.control, name: ["password", "name"] });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <Field id="join-email" label="E-mail" value={email} readOnly disabled hint="The address the invitation was sent to." />
      <Field id="name" label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <Field
        id="password"
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={NEW_PASSWORD_HINT}
        error={errors.password?.message}
        {...register("password")}
      />
      <PasswordStrength id="password-strength" password={password} context={[email, name]} />
      <JoinError message={formError} />
      <SubmitButton pending={pending} busy="Joining…">
        Create my account and join
      </SubmitButton>
    </form>
  );
}

/** The invited address already has an account: its password joins. */
export function JoinExistingForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const { register, errors, submit, formError, pending } = useSchemaForm(
    joinExistingSchema,
    { password: "" },
    { url: ACCEPT, body: (values) => ({ token, mode: "sign-in", ...values }), fields: ["password"], onDone: () => router.push("/jobs") },
  );
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <Field id="join-email" label="E-mail" value={email} readOnly disabled />
      <Field
        id="password"
        label="Your Glowbench password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register("password")}
      />
      <p className="-mt-2 mb-1 text-note">
        <Link href="/forgot-password" className="font-bold text-signal underline underline-offset-4">
          Forgot your password?
        </Link>
      </p>
      <JoinError message={formError} />
      <SubmitButton pending={pending} busy="Joining…">
        Sign in and join
      </SubmitButton>
    </form>
  );
}

/** Already signed in as the invited address: one click joins. */
export function JoinSignedIn({ token, workshopName }: { token: string; workshopName: string }) {
  const router = useRouter();
  const { run, error: formError, pending: busy } = useAction({ url: ACCEPT, onDone: () => router.push("/jobs") });
  return (
    <div className="flex flex-col gap-2">
      <Button disabled={busy} onClick={() => run({ token, mode: "session" })}>
        {busy ? "Joining…" : `Join ${workshopName}`}
      </Button>
      <JoinError message={formError} />
    </div>
  );
}
