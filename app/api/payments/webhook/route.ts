import { NextResponse } from "next/server";
import type Stripe from "stripe";
import { applyCheckoutCompleted } from "@/db/queries/payments";
import { HttpError, handle } from "@/lib/http/api";
import { PaymentsNotConfigured, getStripe, webhookSecret } from "@/lib/payments/stripe";

/**
 * The payment service's webhook. It reads the raw body (the signature covers those exact bytes), so it is
 * exempt from the JSON/Origin checks of other routes, but never from the signature check: the SDK's
 * constructEvent verifies the HMAC and the timestamp's age (five minutes) before anything is read.
 */

const MAX_EVENT_BYTES = 512 * 1024;

export const POST = handle(async (request: Request) => {
  const signature = request.headers.get("stripe-signature");
  if (!signature) throw new HttpError(400, "The Stripe-Signature header is missing.");
  const raw = await request.text();
  if (Buffer.byteLength(raw) > MAX_EVENT_BYTES) throw new HttpError(413, "The event is too large.");
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
