"use client";

import { useRef, useState, useTransition, type ReactNode } from "react";
import { Button } from "./button";

/**
 * A destructive action behind a confirmation dialog (native <dialog>: focus-trapped, Esc closes).
 * `onConfirm` returns an error message to show, or nothing on success.
 */
export function ConfirmButton({ label, title, children, confirmLabel = "Delete", onConfirm }: { label: string; title: string; children: ReactNode; confirmLabel?: string; onConfirm: () => Promise<string | void> }) {
  const ref = useRef<HTMLDialogElement>(null);
  const [error, setError] = useState<string | null>(null);
  const [pending, start] = useTransition();
  return (
    <>
      <Button variant="danger" type="button" onClick={() => ref.current?.showModal()}>
        {label}
      </Button>
      <dialog ref={ref} aria-labelledby="confirm-title" className="m-auto w-full max-w-md rounded-[10px] border border-paper-line bg-paper-raised p-6 text-ink shadow-xl backdrop:bg-ink/30">
        <h2 id="confirm-title" className="text-lg font-semibold">
          {title}
        </h2>
        <div className="mt-2 text-sm text-ink-soft">{children}</div>
        {error && <p className="mt-3 text-sm font-medium text-outside">{error}</p>}
        <div className="mt-5 flex justify-end gap-2">
          <Button variant="secondary" type="button" onClick={() => ref.current?.close()} autoFocus>
            Keep it
          </Button>
          <Button
            variant="danger"
            type="button"
            disabled={pending}
            onClick={() =>
              start(async () => {
                const message = await onConfirm();
                if (message) setError(message);
                else ref.current?.close();
              })
            }
          >
            {pending ? "Working…" : confirmLabel}
          </Button>
        </div>
      </dialog>
    </>
  );
}
