"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition, type ReactNode } from "react";
import { toast } from "sonner";
import { Button } from "./button";

type Result<T> = { ok: true; data: T } | { ok: false; message: string };

/**
 * A button that runs one server action: disabled while it runs, the action's message under it when
 * it fails, a toast and a refresh of the page's data when it succeeds.
 */
export function ActionButton<T>({ children, pendingLabel, run, success }: { children: ReactNode; pendingLabel: string; run: () => Promise<Result<T>>; success: (data: T) => string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string>();
  return (
    <div className="space-y-2">
      <Button
        disabled={pending}
        onClick={() =>
          start(async () => {
            const r = await run();
            if (!r.ok) return setError(r.message);
            setError(undefined);
            toast.success(success(r.data));
            router.refresh();
          })
        }
      >
        {pending ? pendingLabel : children}
      </Button>
      {error && (
        <p role="alert" className="text-xs font-medium text-outside">
          {error}
        </p>
      )}
    </div>
  );
}
