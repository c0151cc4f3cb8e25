import { NextResponse } from "next/server";
import { payLinkSchema } from "@/lib/invoices/schemas";
import { publicOrigin } from "@/server/http/public-origin";
import { route } from "@/server/http/route";
import { checkoutUrlForPayLink } from "@/server/payments/checkout";

/**
 * "Pay by card" on the customer's pay link: no account, the single-use token is the credential. Answers the
 * payment page's address (an open one is reused); 404 for an unknown token, 410 once paid, void or expired.
 */
export const POST = route({ auth: "public", body: payLinkSchema }, async ({ request, body }) =>
  NextResponse.json({ url: await checkoutUrlForPayLink(body.token, publicOrigin(request)) }),
);
