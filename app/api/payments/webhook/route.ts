import { NextResponse } from "next/server";
import type Stripe from "stripe";
import { applyCheckoutCompleted } from "@/db/queries/payments";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { PaymentsNotConfigured, getStripe, webhookSecret } from "@/server/payments/stripe";

/**
 * The payment service's webhook. It reads the raw body (the signature covers those exact bytes), so it
 * takes no JSON parsing and no session, but never skips the signature check: the SDK's constructEvent
 * verifies the HMAC and the timestamp's age (five minutes) before anything is read. The payment service
 * sends no Origin, so the wrapper's Origin check passes it; a browser's cross-site post is still refused.
 */

const eventLimit = { bytes: 512 * 1024, message: "The event is too large." };

export const POST = route({ auth: "public", body: "raw", limit: eventLimit }, ({ request, body: raw }) => {
  const signature = request.headers.get("stripe-signature");
  if (!signature) throw new HttpError(400, "The Stripe-Signature header is missing.");
  let event: Stripe.Event;
  try {
    const stripe = getStripe();
    event = stripe.webhooks.constructEvent(raw, signature, webhookSecret());
  } catch (err) {
    if (err instanceof PaymentsNotConfigured) throw new HttpError(503, "Card payments are not set up for this Glowbench.");
    throw new HttpError(400, "The event's signature did not verify.");
  }
  if (event.type === "checkout.session.completed") {
    const result = applyCheckoutCompleted(event.id, event.type, event.data.object);
    return NextResponse.json({ received: true, result });
  }
  return NextResponse.json({ received: true, result: "ignored" });
});
