import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { EmptyState, PageHeader } from "@/components/ui/card";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Outbox" };

const linkify = (text: string) =>
  text.split(/(https?:\/\/[^\s<>"]+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} href={part} className="break-all text-kiln-600 underline">
        {part}
      </a>
    ) : (
      part
    ),
  );

/**
 * Development outbox: every message the local fake SMTP server received. Owner-only. In production
 * SMTP_URL points at a real relay and this page stays empty.
 */
export default async function OutboxPage() {
  const actor = await requireActor();
  if (!canInFirm(actor, "outbox.read")) notFound();
  const messages = await db.selectFrom("dev_outbox").select(["id", "received_at", "envelope_from", "envelope_to", "subject", "text_body", "attachments"]).orderBy("id", "desc").limit(50).execute();
  return (
    <>
      <PageHeader title="Outbox" eyebrow="Development">
        Messages caught by the local mail server (the newest 50). Nothing here left this machine.
      </PageHeader>
      {messages.length === 0 ? (
        <EmptyState title="No messages yet">Invitations, password resets and report e-mails appear here.</EmptyState>
      ) : (
        <ol className="space-y-4">
          {messages.map((m) => (
            <li key={m.id} className="rounded-[10px] border border-paper-line bg-paper-raised">
              <details>
                <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-4 gap-y-1 px-4 py-3">
                  <span className="font-medium">{m.subject ?? "(no subject)"}</span>
                  <span className="text-sm text-ink-soft">to {m.envelope_to.join(", ")}</span>
                  <time className="ml-auto text-xs text-ink-faint" dateTime={new Date(m.received_at).toISOString()}>
                    {new Date(m.received_at).toLocaleString("en-GB")}
                  </time>
                </summary>
                <div className="border-t border-paper-line px-4 py-3">
                  <pre className="whitespace-pre-wrap font-sans text-sm text-ink">{linkify(m.text_body ?? "")}</pre>
                  {m.attachments.length > 0 && (
                    <p className="mt-3 text-xs text-ink-soft">
                      Attachments: {m.attachments.map((a) => `${a.filename ?? "unnamed"} (${a.contentType}, ${Math.round(a.size / 1024)} KB)`).join(", ")}
                    </p>
                  )}
                </div>
              </details>
            </li>
          ))}
        </ol>
      )}
    </>
  );
}
