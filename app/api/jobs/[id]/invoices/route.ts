import { NextResponse } from "next/server";
import { issueInvoice, listInvoicesForJob } from "@/db/queries/invoices";
import { requireMember } from "@/lib/auth/member";
import { issueInvoiceSchema } from "@/lib/estimates/schemas";
import { handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Ctx) => {
  const member = await requireMember();
  return NextResponse.json({ invoices: listInvoicesForJob(member, idParam((await params).id, "That job")) });
});

export const POST = handle(async (request: Request, { params }: Ctx) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, issueInvoiceSchema);
  return NextResponse.json(issueInvoice(member, jobId, input), { status: 201 });
});
