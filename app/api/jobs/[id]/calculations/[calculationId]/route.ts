import { NextResponse } from "next/server";
import { deleteCalculation } from "@/db/queries/calculations";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

type Params = { params: Promise<{ id: string; calculationId: string }> };

export const DELETE = handle(async (_request: Request, { params }: Params) => {
  const member = await requireMember();
  const { id, calculationId } = await params;
  deleteCalculation(member, idParam(id, "That job"), idParam(calculationId, "That calculation"));
  return NextResponse.json({ deleted: true });
});
