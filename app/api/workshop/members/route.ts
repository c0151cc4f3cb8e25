import { NextResponse } from "next/server";
import { listMembers } from "@/db/queries/members";
import { route } from "@/server/http/route";

export const GET = route({}, ({ member }) => NextResponse.json({ members: listMembers(member) }));
