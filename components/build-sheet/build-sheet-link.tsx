import Link from "next/link";
import type { Project } from "@/db/queries/projects";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject } from "@/lib/auth/permissions";

/** The project page's way to the build sheet, for those who may read it (owner, engineer, the project's builders). */
export function BuildSheetLink({ actor, project }: { actor: Actor; project: Project }) {
  if (!canOnProject(actor, "build.read", project)) return null;
  return (
    <Link href={`/projects/${project.id}/build-sheet`} className="mt-6 flex items-center justify-between rounded-[10px] border border-paper-line bg-paper-raised p-4 transition hover:border-kiln-300 hover:shadow-sm" data-testid="build-sheet-link">
      <span>
        <span className="block font-medium">Build sheet</span>
        <span className="block text-sm text-ink-soft">{actor.role === "builder" ? "Cut lists, materials and fixings; mark items built and installed." : "Cut lists, materials, cost, and the builders' progress on site."}</span>
      </span>
      <span aria-hidden="true" className="text-kiln-600">→</span>
    </Link>
  );
}
