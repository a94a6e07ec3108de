import type { BandVerdict } from "@/lib/reverb";

const WORDS: Record<BandVerdict, string> = { within: "within", near: "near", outside: "outside" };

/** A verdict as shape + colour + word: ● within, ▲ near, ✕ outside (a grey print still reads). */
export function VerdictMark({ verdict, withWord = true }: { verdict: BandVerdict; withWord?: boolean }) {
  const cls = verdict === "within" ? "text-within" : verdict === "near" ? "text-near" : "text-outside";
  return (
    <span className={`inline-flex items-center gap-1 ${cls}`} data-verdict={verdict}>
      <svg width="12" height="12" viewBox="-6 -6 12 12" aria-hidden="true">
        {verdict === "within" && <circle r="4.5" fill="currentColor" />}
        {verdict === "near" && <path d="M0,-5 L5,4 L-5,4 Z" fill="currentColor" />}
        {verdict === "outside" && <path d="M-4,-4 L4,4 M-4,4 L4,-4" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />}
      </svg>
      {withWord ? <span className="text-xs font-medium">{WORDS[verdict]}</span> : <span className="sr-only">{WORDS[verdict]}</span>}
    </span>
  );
}
