import { db } from "@/db/client";
import { errorResponse, jsonError } from "@/lib/api/route";
import { paymentsEnv } from "@/lib/env";
import { handlePaymentWebhook } from "@/lib/payments/webhook";

/** Events are small; anything larger is not one. */
const MAX_EVENT_BYTES = 256 * 1024;

/**
 * The payment provider's webhook: public (no session), trusted only through its signature over the
 * raw body. Replays of an event already handled answer 200 and change nothing.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    const payload = await request.text();
    if (payload.length > MAX_EVENT_BYTES) return jsonError(413, "payload_too_large", "The event is larger than any event the provider sends.");
    const result = await handlePaymentWebhook(db, payload, request.headers.get("stripe-signature"), paymentsEnv().STRIPE_WEBHOOK_SECRET);
    if (!result.ok) return jsonError(result.status, "bad_request", result.message);
    return Response.json({ received: true, eventId: result.eventId, outcome: result.outcome }, { status: 200 });
  } catch (error) {
    return errorResponse(error);
  }
}
