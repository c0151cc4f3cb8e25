import { NextResponse } from "next/server";
import { getCharges, updateCharges } from "@/db/queries/workshop";
import { route } from "@/server/http/route";
import { chargesSchema } from "@/lib/workshop/charges-schema";

export const GET = route({ role: "seeCharges" }, ({ member }) => NextResponse.json({ charges: getCharges(member) }));

// The role is checked before the body is read, so a technician or apprentice learns nothing about the rules from a 400.
export const PATCH = route({ role: "manageWorkshop", body: chargesSchema }, ({ member, body }) => NextResponse.json({ charges: updateCharges(member, body) }));
