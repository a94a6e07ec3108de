import { randomBytes } from "node:crypto";

/** A random user id (lucia stores ids as text): 20 bytes, base32-like lowercase. */
export function newUserId(): string {
  return randomBytes(15).toString("base64url").toLowerCase().replace(/[^a-z0-9]/g, "x");
}

/** A random one-time token for links in e-mails (32 bytes, URL-safe). */
export function newToken(): string {
  return randomBytes(32).toString("base64url");
}
