import type { ReactNode } from "react";
import { Wordmark } from "@/components/ui/logo";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="flex min-h-screen flex-col items-center justify-center px-4 py-12">
      <div className="mb-8">
        <Wordmark />
      </div>
      <div className="w-full max-w-sm rounded-[10px] border border-paper-line bg-paper-raised p-6 shadow-sm">{children}</div>
      <p className="mt-6 max-w-sm text-center text-xs text-ink-faint">Small-room acoustics, from survey to signed recommendation.</p>
    </main>
  );
}
