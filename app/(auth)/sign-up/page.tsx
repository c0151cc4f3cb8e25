import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { SignUpForm } from "@/components/auth/sign-up-form";

export const metadata: Metadata = { title: "Open a workshop" };

export default function SignUpPage() {
  return (
    <>
      <h1 className="text-title font-bold">Open a workshop</h1>
      <p className="mb-6 mt-2 text-muted">You will be its owner; invite technicians and apprentices afterwards.</p>
      <SignUpForm />
      <p className="mt-6 text-muted">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-bold text-signal underline underline-offset-4">
          Sign in
        </Link>
        .
      </p>
    </>
  );
}
