import { NextResponse } from "next/server";
import { markGroupOrdered } from "@/db/queries/orders";
import { route } from "@/server/http/route";
import { markOrderedSchema } from "@/lib/jobs/order-schemas";

/** Marks one supplier's parts ordered, every job at once, each job's Log written in the same transaction. */
export const POST = route({ role: "editJobs", body: markOrderedSchema }, ({ member, body }) => NextResponse.json(markGroupOrdered(member, body)));
