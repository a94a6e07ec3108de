"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";

type Result =
  | { status: "valid"; message: string; signatureChecked: boolean; report: { number: string; revision: number; superseded: boolean; newestRevision: number; room: string; project: string; firm: string; signer: string; signedAt: string; sha256: string } }
  | { status: "tampered" | "unknown"; message: string };

const TONE = {
  valid: { box: "border-within/50 bg-within-soft", mark: "✓", title: "Genuine" },
  tampered: { box: "border-outside/50 bg-outside-soft", mark: "✕", title: "Changed since it was signed" },
  unknown: { box: "border-paper-line bg-paper-sunk", mark: "?", title: "Not one of our reports" },
} as const;

/** Upload a PDF, or give a report number and the file's SHA-256; shows valid / tampered / unknown. */
export function VerifyForm() {
  const [result, setResult] = useState<Result>();
  const [error, setError] = useState<string>();
  const [busy, setBusy] = useState(false);
  async function submit(init: RequestInit) {
    setBusy(true);
    setError(undefined);
    try {
      const res = await fetch("/api/v1/verify", { method: "POST", ...init });
      const json = await res.json();
      if (!res.ok) {
        setResult(undefined);
        setError(json?.error?.message ?? "The check failed.");
      } else setResult(json as Result);
    } finally {
      setBusy(false);
    }
  }
  return (
    <div className="space-y-6">
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          const data = new FormData(e.currentTarget);
          void submit({ body: data });
        }}
      >
        <Field id="verify-file" label="The report's PDF">
          <Input id="verify-file" name="file" type="file" accept="application/pdf,.pdf" required />
        </Field>
        <Button type="submit" disabled={busy}>
          Check the file
        </Button>
      </form>
      <form
        className="grid gap-3 border-t border-paper-line pt-5 sm:grid-cols-[1fr_2fr_auto] sm:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          const data = new FormData(e.currentTarget);
          void submit({ headers: { "content-type": "application/json" }, body: JSON.stringify({ reportNumber: data.get("reportNumber"), sha256: data.get("sha256") }) });
        }}
      >
        <Field id="verify-number" label="Report number">
          <Input id="verify-number" name="reportNumber" placeholder="ER-2026-0001" required />
        </Field>
        <Field id="verify-hash" label="SHA-256 of the file">
          <Input id="verify-hash" name="sha256" className="font-mono" placeholder="64 hexadecimal characters" required />
        </Field>
        <Button type="submit" variant="secondary" disabled={busy}>
          Check
        </Button>
      </form>
      {error && (
        <p role="alert" className="text-sm font-medium text-outside">
          {error}
        </p>
      )}
      {result && (
        <div role="status" data-verdict={result.status} className={`rounded-[10px] border p-4 ${TONE[result.status].box}`}>
          <p className="text-lg font-semibold">
            <span aria-hidden="true" className="mr-2">
              {TONE[result.status].mark}
            </span>
            {TONE[result.status].title}
          </p>
          <p className="mt-1 text-sm">{result.message}</p>
          {result.status === "valid" && (
            <dl className="mt-3 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
              <dt className="text-ink-faint">Report</dt>
              <dd className="tabular-nums">
                {result.report.number}, revision {result.report.revision}
                {result.report.superseded ? ` (superseded by revision ${result.report.newestRevision})` : ""}
              </dd>
              <dt className="text-ink-faint">Room</dt>
              <dd>
                {result.report.room} · {result.report.project}
              </dd>
              <dt className="text-ink-faint">Signed by</dt>
              <dd>
                {result.report.signer}, {result.report.firm}
              </dd>
              <dt className="text-ink-faint">Date</dt>
              <dd className="tabular-nums">{result.report.signedAt.slice(0, 16).replace("T", " ")} UTC</dd>
              <dt className="text-ink-faint">SHA-256</dt>
              <dd className="break-all font-mono text-xs">{result.report.sha256}</dd>
            </dl>
          )}
        </div>
      )}
    </div>
  );
}
