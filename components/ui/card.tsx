import type { HTMLAttributes, ReactNode } from "react";
import { cn } from "./cn";

export function Card({ className, ...props }: HTMLAttributes<HTMLDivElement>) {
  return <div className={cn("rounded-[10px] border border-paper-line bg-paper-raised p-5 shadow-[0_1px_0_rgba(31,35,40,0.04)]", className)} {...props} />;
}

export function PageHeader({ title, eyebrow, actions, children }: { title: ReactNode; eyebrow?: ReactNode; actions?: ReactNode; children?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-paper-line pb-4">
      <div className="min-w-0">
        {eyebrow && <div className="mb-1 text-xs font-medium uppercase tracking-[0.08em] text-kiln-600">{eyebrow}</div>}
        <h1 className="text-2xl font-semibold text-ink">{title}</h1>
        {children && <div className="mt-1 text-sm text-ink-soft">{children}</div>}
      </div>
      {actions && <div className="no-print flex flex-wrap gap-2">{actions}</div>}
    </div>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-[10px] border border-dashed border-paper-line bg-paper-raised/60 px-6 py-10 text-center">
      <svg viewBox="0 0 48 24" className="mx-auto mb-3 h-6 w-12 text-kiln-300" aria-hidden="true">
        <path d="M2 12 C 10 2, 14 2, 24 12 S 38 22, 46 12" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="3 3" />
      </svg>
      <p className="font-medium text-ink">{title}</p>
      {children && <div className="mx-auto mt-1 max-w-md text-sm text-ink-soft">{children}</div>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}

export function Notice({ tone = "info", children }: { tone?: "info" | "caution" | "error" | "success"; children: ReactNode }) {
  const tones = {
    info: "border-paper-line bg-paper-sunk text-ink-soft",
    caution: "border-near/40 bg-near-soft text-ink",
    error: "border-outside/40 bg-outside-soft text-ink",
    success: "border-within/40 bg-within-soft text-ink",
  } as const;
  return (
    <div role={tone === "error" ? "alert" : "status"} className={cn("rounded-md border px-3.5 py-2.5 text-sm", tones[tone])}>
      {children}
    </div>
  );
}
