import Link from "next/link";
import { LogoMark } from "@/components/ui/logo";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-md flex-col items-center justify-center px-4 text-center">
      <LogoMark size={40} />
      <h1 className="mt-4 text-2xl font-semibold">Nothing here</h1>
      <p className="mt-2 text-sm text-ink-soft">The page does not exist, or it belongs to a project you cannot see.</p>
      <Link href="/projects" className="mt-5 text-sm font-medium text-kiln-600 hover:underline">
        Back to projects
      </Link>
    </main>
  );
}
