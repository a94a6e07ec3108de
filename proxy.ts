import { NextResponse, type NextRequest } from "next/server";

/**
 * Next answers a malformed percent-encoded path with a plain-text 500 before any route runs; the API
 * promises JSON, so such paths get the API's 400 here.
 */
export function proxy(request: NextRequest) {
  try {
    decodeURIComponent(request.nextUrl.pathname);
  } catch {
    return NextResponse.json({ error: { code: "bad_request", message: "The request path is not valid percent-encoding." } }, { status: 400 });
  }
  return NextResponse.next();
}

export const config = { matcher: "/api/:path*" };
