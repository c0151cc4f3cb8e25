import { NextResponse } from "next/server";
import { z } from "zod";
import { publicOrigin } from "@/server/http/public-origin";
import { route } from "@/server/http/route";
import { checkoutUrlForInvoice } from "@/server/payments/checkout";

/** The owner asks for a payment page for an invoice of their own workshop; answers its URL. */
export const POST = route({ role: "seeMoney", ids: { id: "That invoice" }, body: z.object({}) }, async ({ request, member, ids }) =>
  NextResponse.json({ url: await checkoutUrlForInvoice(member, ids.id, publicOrigin(request)) }),
);
