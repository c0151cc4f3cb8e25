import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { ResetRequestForm } from "@/components/auth/reset-forms";

export const metadata: Metadata = { title: "Forgot your password?" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-title font-bold">Forgot your password?</h1>
      <p className="mb-6 mt-2 text-muted">Give the address you sign in with and we will e-mail you a link to choose a new one.</p>
      <ResetRequestForm />
      <p className="mt-6 text-muted">
        Remembered it?{" "}
        <Link href="/sign-in" className="font-bold text-signal underline underline-offset-4">
          Sign in
        </Link>
        .
      </p>
    </>
  );
}
