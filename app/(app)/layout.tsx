import type { ReactNode } from "react";
import { AppHeader } from "@/components/shell/app-header";
import { navigationFor } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export default async function AppLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  return (
    <div className="min-h-screen">
      <AppHeader name={actor.name} role={actor.role} unitSystem={actor.unitSystem} nav={navigationFor(actor)} />
      <main className="mx-auto max-w-6xl px-4 py-8 sm:px-6">{children}</main>
    </div>
  );
}
