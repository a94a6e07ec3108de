import Link from "next/link";
import type { ButtonHTMLAttributes, ComponentProps } from "react";
import { cn } from "./cn";

type Variant = "primary" | "secondary" | "ghost" | "danger";

const styles: Record<Variant, string> = {
  primary: "bg-kiln-500 text-white hover:bg-kiln-600 disabled:bg-kiln-300",
  secondary: "border border-paper-line bg-paper-raised text-ink hover:bg-paper-sunk disabled:text-ink-faint",
  ghost: "text-ink-soft hover:bg-paper-sunk hover:text-ink",
  danger: "border border-outside/40 bg-paper-raised text-outside hover:bg-outside-soft",
};

const base = "inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed";

export function Button({ variant = "primary", className, ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button className={cn(base, styles[variant], className)} {...props} />;
}

export function ButtonLink({ variant = "primary", className, ...props }: ComponentProps<typeof Link> & { variant?: Variant }) {
  return <Link className={cn(base, styles[variant], className)} {...props} />;
}
