import { NextResponse } from "next/server";
import { getWorkshopSettings, updateWorkshopSettings } from "@/db/queries/workshop";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { workshopSettingsSchema } from "@/lib/workshop/schemas";

export const GET = handle(async () => {
  const member = await requireMember();
  return NextResponse.json({ workshop: getWorkshopSettings(member) });
});

export const PATCH = handle(async (request: Request) => {
  const member = await requireMember();
  const input = await parseJson(request, workshopSettingsSchema);
  return NextResponse.json({ workshop: updateWorkshopSettings(member, input) });
});
