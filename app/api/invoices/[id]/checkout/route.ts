import { NextResponse } from "next/server";
import { z } from "zod";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";
import { publicOrigin } from "@/lib/http/public-origin";
import { checkoutUrlForInvoice } from "@/lib/payments/checkout";

/** The owner asks for a payment page for an invoice of their own workshop; answers its URL. */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const member = await requireMember();
  const invoiceId = idParam((await params).id, "That invoice");
  await parseJson(request, z.object({}));
  return NextResponse.json({ url: await checkoutUrlForInvoice(member, invoiceId, publicOrigin(request)) });
});
