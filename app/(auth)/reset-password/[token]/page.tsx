import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { NewPasswordFormView } from "@/components/auth/reset-forms";
import { RESET_GONE, findPasswordReset } from "@/db/queries/password-resets";
import { resetPasswordSchema } from "@/lib/auth/reset-schemas";

export const metadata: Metadata = { title: "Choose a new password", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = resetPasswordSchema.shape.token.safeParse(token).success ? findPasswordReset(token) : "unknown";
  if (state !== "valid") {
    return (
      <>
        <h1 className="text-title font-bold">This link cannot be used</h1>
        <p className="mt-2 text-muted">{state === "gone" ? RESET_GONE : "Check that you opened the whole link from the e-mail, or ask for a new one."}</p>
        <p className="mt-6">
          <Link href="/forgot-password" className="font-bold text-signal underline underline-offset-4">
            Ask for a new link
          </Link>
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="text-title font-bold">Choose a new password</h1>
      <p className="mb-6 mt-2 text-muted">Once it is set, every browser signed in to your account is signed out, and you sign in again with the new one.</p>
      <NewPasswordFormView token={token} />
    </>
  );
}
