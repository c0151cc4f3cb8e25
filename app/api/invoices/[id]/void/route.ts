import { NextResponse } from "next/server";
import { z } from "zod";
import { voidInvoice } from "@/db/queries/invoices";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const member = await requireMember();
  const invoiceId = idParam((await params).id, "That invoice");
  await parseJson(request, z.object({}));
  return NextResponse.json(voidInvoice(member, invoiceId));
});
