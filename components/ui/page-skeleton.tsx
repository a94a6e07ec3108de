/** The placeholder a leaf page shows while its data loads (its segment's loading.tsx). */
export function PageSkeleton() {
  return (
    <div role="status" aria-live="polite" className="animate-pulse space-y-4">
      <div className="h-7 w-64 rounded bg-paper-sunk" />
      <div className="h-4 w-96 max-w-full rounded bg-paper-sunk" />
      <div className="h-40 rounded-[10px] bg-paper-sunk" />
      <span className="sr-only">Loading…</span>
    </div>
  );
}
