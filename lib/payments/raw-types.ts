// The payment provider's wire format (its REST API and webhook events), kept apart from our domain
// types in types.ts. Only the fields we read are listed.

export interface RawCheckoutSession {
  id: string;
  object: "checkout.session";
  url: string | null;
  status: "open" | "complete" | "expired" | null;
  payment_status: "paid" | "unpaid" | "no_payment_required";
  amount_total: number | null;
  currency: string | null;
  client_reference_id: string | null;
  metadata: Record<string, string> | null;
  created: number;
  expires_at?: number;
}

export interface RawEvent {
  id: string;
  object: "event";
  type: string;
  created: number;
  livemode: boolean;
  data: { object: Record<string, unknown> };
}

export interface RawApiError {
  error: { type?: string; code?: string; message?: string; param?: string };
}
