"use client";

import { useRouter } from "next/navigation";
import { Notice } from "./card";

/** A failed save's message; a conflict (409) offers to reload the newer version. */
export function ActionError({ error }: { error: { message: string; conflict: boolean } | null }) {
  const router = useRouter();
  if (!error) return null;
  return (
    <Notice tone="error">
      {error.message}{" "}
      {error.conflict && (
        <button type="button" className="font-medium underline" onClick={() => router.refresh()}>
          Reload
        </button>
      )}
    </Notice>
  );
}
