import { NextResponse } from "next/server";
import { listAuditEvents } from "@/db/queries/audit";
import { route } from "@/server/http/route";

export const GET = route({ role: "manageWorkshop" }, ({ member }) => NextResponse.json({ events: listAuditEvents(member) }));
