import { NextResponse } from "next/server";
import { deleteCalculation } from "@/db/queries/calculations";
import { route } from "@/server/http/route";

export const DELETE = route({ role: "editJobs", ids: { id: "That job", calculationId: "That calculation" } }, ({ member, ids }) => {
  deleteCalculation(member, ids.id, ids.calculationId);
  return NextResponse.json({ deleted: true });
});
