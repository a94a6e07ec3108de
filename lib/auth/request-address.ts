import "server-only";
import { headers } from "next/headers";

/** The client's address for rate limiting: the first hop a proxy reports, else "direct". */
export async function requestAddress(): Promise<string> {
  const h = await headers();
  const forwarded = h.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || h.get("x-real-ip") || "direct";
}
