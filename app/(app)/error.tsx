"use client";

import { Button } from "@/components/ui/button";

export default function AppError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="mx-auto max-w-lg rounded-[10px] border border-outside/30 bg-paper-raised p-6">
      <h1 className="text-xl font-semibold">This page could not be shown</h1>
      <p className="mt-2 text-sm text-ink-soft">Something went wrong on our side; it has been logged{error.digest ? ` (reference ${error.digest})` : ""}. Nothing you saved was lost.</p>
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
