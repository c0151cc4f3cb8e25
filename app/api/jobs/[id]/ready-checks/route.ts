import { NextResponse } from "next/server";
import { readyIssues } from "@/db/queries/ready-record";
import { route } from "@/server/http/route";

/** The checks before "ready" still open on this job (`{ checks: [{ id, message }] }`), for the status control to warn before it asks. */
export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ checks: readyIssues(member, ids.id) }));
