import { BUILD_SHEET_CAUTIONS } from "@/lib/build-sheet";
import { cn } from "@/components/ui/cn";

/** The safety cautions of every plan and build sheet, deferring to local codes and licensed professionals. */
export function CautionsBlock({ className }: { className?: string }) {
  return (
    <section aria-labelledby="cautions-title" className={cn("rounded-[10px] border-2 border-near/60 bg-near-soft p-4 text-sm break-inside-avoid", className)} data-testid="cautions">
      <h2 id="cautions-title" className="mb-2 flex items-center gap-2 text-base font-semibold">
        <svg width="16" height="16" viewBox="-8 -8 16 16" aria-hidden="true">
          <path d="M0,-7 L7,6 L-7,6 Z" fill="none" stroke="currentColor" strokeWidth="1.6" />
          <path d="M0,-2 V2 M0,3.6 V4" stroke="currentColor" strokeWidth="1.6" />
        </svg>
        Before you build and hang
      </h2>
      <ul className="list-disc space-y-1 pl-5">
        {BUILD_SHEET_CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </section>
  );
}
