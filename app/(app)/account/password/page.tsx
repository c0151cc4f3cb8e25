import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { ChangePasswordForm } from "@/components/auth/change-password-form";
import { Card } from "@/components/ui/card";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Change password" };

export default async function ChangePasswordPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/account/password");
  return (
    <>
      <h1 className="text-title font-bold">Change password</h1>
      <p className="mb-6 mt-2 max-w-prose text-muted">
        For {member.email}. Your current password is asked for first. Once the new one is set, every other browser signed in to your account is signed out; this
        one stays signed in.
      </p>
      <Card>
        <ChangePasswordForm context={[member.email, member.name, member.workshopName]} />
      </Card>
    </>
  );
}
