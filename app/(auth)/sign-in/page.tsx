import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { SignInForm } from "@/components/auth/sign-in-form";
import { safeNextPath } from "@/lib/safe-next";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; reset?: string }> }) {
  const { next, reset } = await searchParams;
  return (
    <>
      <h1 className="text-title font-bold">Sign in to your workshop</h1>
      <p className="mb-6 mt-2 text-muted">Pick up where you left the set.</p>
      {reset === "1" ? (
        <p role="status" className="mb-4 rounded-chip border border-ok bg-ok-bg px-4 py-3 font-bold text-ok">
          Your new password is set and every other session has ended. Sign in with it now.
        </p>
      ) : null}
      <SignInForm next={safeNextPath(next)} />
      <p className="mt-3">
        <Link href="/forgot-password" className="font-bold text-signal underline underline-offset-4">
          Forgot your password?
        </Link>
      </p>
      <p className="mt-6 text-muted">
        New here?{" "}
        <Link href="/sign-up" className="font-bold text-signal underline underline-offset-4">
          Open a workshop
        </Link>{" "}
        or{" "}
        <Link href="/bench" className="font-bold text-signal underline underline-offset-4">
          use the Bench without an account
        </Link>
        .
      </p>
    </>
  );
}
