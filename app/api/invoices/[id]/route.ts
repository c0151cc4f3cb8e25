import { NextResponse } from "next/server";
import { getInvoice } from "@/db/queries/invoices";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const member = await requireMember();
  return NextResponse.json(getInvoice(member, idParam((await params).id, "That invoice")));
});
