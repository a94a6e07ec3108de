"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { useTransition } from "react";
import { setUnitSystemAction } from "@/app/(app)/actions";
import { signOutAction } from "@/app/(auth)/actions";
import { cn } from "@/components/ui/cn";
import { LogoMark } from "@/components/ui/logo";
import { ROLE_LABEL } from "@/lib/schemas/member";
import type { Role, UnitSystem } from "@/db/schema";

export function AppHeader({ name, role, unitSystem, nav }: { name: string; role: Role; unitSystem: UnitSystem; nav: { href: string; label: string }[] }) {
  const pathname = usePathname();
  const [pending, start] = useTransition();
  return (
    <header className="no-print border-b border-paper-line bg-paper-raised/80 backdrop-blur">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/projects" className="flex items-center gap-2" aria-label="Eigenroom, projects">
          <LogoMark size={26} />
          <span className="font-serif text-lg font-semibold">Eigenroom</span>
        </Link>
        <nav aria-label="Main" className="flex gap-1">
          {nav.map((item) => {
            const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
            return (
              <Link key={item.href} href={item.href} aria-current={active ? "page" : undefined} className={cn("rounded-md px-3 py-1.5 text-sm", active ? "bg-kiln-50 font-medium text-kiln-700" : "text-ink-soft hover:bg-paper-sunk hover:text-ink")}>
                {item.label}
              </Link>
            );
          })}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <div role="group" aria-label="Units" className="flex overflow-hidden rounded-md border border-paper-line">
            {(["metric", "imperial"] as const).map((u) => (
              <button
                key={u}
                type="button"
                aria-pressed={unitSystem === u}
                disabled={pending}
                onClick={() => start(() => setUnitSystemAction(u))}
                className={cn("px-2.5 py-1 text-xs", unitSystem === u ? "bg-ink text-paper" : "bg-paper-raised text-ink-soft hover:bg-paper-sunk")}
              >
                {u === "metric" ? "m" : "ft·in"}
              </button>
            ))}
          </div>
          <span className="hidden text-ink-soft sm:inline">
            {name} · <span className="text-ink-faint">{ROLE_LABEL[role]}</span>
          </span>
          <form action={signOutAction}>
            <button type="submit" className="rounded-md px-2.5 py-1.5 text-ink-soft hover:bg-paper-sunk hover:text-ink">
              Sign out
            </button>
          </form>
        </div>
      </div>
    </header>
  );
}
