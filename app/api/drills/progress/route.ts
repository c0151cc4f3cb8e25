import { NextResponse } from "next/server";
import { drillProgress } from "@/db/queries/drills";
import { drillMemberQuerySchema } from "@/lib/drills/schemas";
import { route } from "@/server/http/route";

/** `?member={userId}`: per kind attempts, correct and mastery, with a point per day. Left out: the caller's own. */
export const GET = route({ role: "doDrills", query: drillMemberQuerySchema }, ({ member, query }) => NextResponse.json(drillProgress(member, query.member)));
