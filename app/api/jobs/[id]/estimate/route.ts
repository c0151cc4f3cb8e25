import { NextResponse } from "next/server";
import { getEstimateForJob, saveEstimate } from "@/db/queries/estimates";
import { linesSchema } from "@/lib/estimates/schemas";
import { route } from "@/server/http/route";

export const GET = route({ role: "prepareEstimates", ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json(getEstimateForJob(member, ids.id)));

export const PUT = route({ role: "prepareEstimates", ids: { id: "That job" }, body: linesSchema }, ({ member, ids, body }) =>
  NextResponse.json(saveEstimate(member, ids.id, body)),
);
