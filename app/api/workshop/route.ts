import { NextResponse } from "next/server";
import { getWorkshopSettings, updateWorkshopSettings } from "@/db/queries/workshop";
import { route } from "@/server/http/route";
import { workshopSettingsSchema } from "@/lib/workshop/schemas";

export const GET = route({}, ({ member }) => NextResponse.json({ workshop: getWorkshopSettings(member) }));

export const PATCH = route({ role: "manageWorkshop", body: workshopSettingsSchema }, ({ member, body }) =>
  NextResponse.json({ workshop: updateWorkshopSettings(member, body) }),
);
