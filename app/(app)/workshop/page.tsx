import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getMember } from "@/lib/auth/member";

export const metadata: Metadata = { title: "Workshop" };

export default async function WorkshopPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/workshop");
  return (
    <>
      <h1 className="text-title font-bold">{member.workshopName}</h1>
      <p className="mt-1 text-muted">Members, roles and settings of your workshop.</p>
    </>
  );
}
