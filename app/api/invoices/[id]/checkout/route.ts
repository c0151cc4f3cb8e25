import { NextResponse } from "next/server";
import { z } from "zod";
import { publicOrigin } from "@/lib/http/public-origin";
import { route } from "@/lib/http/route";
import { checkoutUrlForInvoice } from "@/lib/payments/checkout";

/** The owner asks for a payment page for an invoice of their own workshop; answers its URL. */
export const POST = route({ role: "seeMoney", ids: { id: "That invoice" }, body: z.object({}) }, async ({ request, member, ids }) =>
  NextResponse.json({ url: await checkoutUrlForInvoice(member, ids.id, publicOrigin(request)) }),
);
