/** Eigenroom's mark: a room outline holding its first standing wave, with the wave's two nodes. */
export function LogoMark({ size = 28, className }: { size?: number; className?: string }) {
  return (
    <svg viewBox="0 0 32 32" width={size} height={size} className={className} aria-hidden="true">
      <rect x="2.5" y="2.5" width="27" height="27" rx="6" fill="#fffdf9" stroke="#1f2328" strokeWidth="2" />
      <path d="M6 11.5C10 11.5 11 20.5 16 20.5S22 11.5 26 11.5" fill="none" stroke="#b2572a" strokeWidth="2.4" strokeLinecap="round" />
      <circle cx="11.2" cy="16" r="1.6" fill="#1f2328" />
      <circle cx="20.8" cy="16" r="1.6" fill="#1f2328" />
    </svg>
  );
}

export function Wordmark({ className }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className ?? ""}`}>
      <LogoMark />
      <span className="font-serif text-xl font-semibold tracking-tight">Eigenroom</span>
    </span>
  );
}
