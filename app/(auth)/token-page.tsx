import Link from "next/link";
import { db } from "@/db/client";
import { SetPasswordForm } from "@/components/auth/auth-forms";
import { peekToken } from "@/lib/auth/tokens";

/** Shared body of the reset and invitation pages: a live token shows the form, anything else explains. */
export async function TokenPage({ token, purpose }: { token: string | undefined; purpose: "reset" | "invite" }) {
  const found = token && token.length <= 200 ? await peekToken(db, token, purpose === "invite" ? "invitation" : "password-reset") : undefined;
  if (!token || !found) {
    return (
      <div className="space-y-3">
        <h1 className="text-xl font-semibold">This link no longer works</h1>
        <p className="text-sm text-ink-soft">
          {purpose === "invite"
            ? "The invitation has expired or was already used. Ask the person who invited you to send a new one."
            : "Reset links work once and expire after an hour."}
        </p>
        <p className="text-sm">
          <Link href={purpose === "invite" ? "/sign-in" : "/forgot-password"} className="text-kiln-600 hover:underline">
            {purpose === "invite" ? "Go to sign in" : "Ask for a new link"}
          </Link>
        </p>
      </div>
    );
  }
  return <SetPasswordForm token={token} purpose={purpose} email={found.email} />;
}
