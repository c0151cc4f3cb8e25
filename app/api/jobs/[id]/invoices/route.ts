import { NextResponse } from "next/server";
import { issueInvoice, listInvoicesForJob } from "@/db/queries/invoices";
import { issueInvoiceSchema } from "@/lib/estimates/schemas";
import { route } from "@/server/http/route";

export const GET = route({ role: "seeMoney", ids: { id: "That job" } }, ({ member, ids }) =>
  NextResponse.json({ invoices: listInvoicesForJob(member, ids.id) }),
);

export const POST = route({ role: "seeMoney", ids: { id: "That job" }, body: issueInvoiceSchema }, ({ member, ids, body }) =>
  NextResponse.json(issueInvoice(member, ids.id, body), { status: 201 }),
);
