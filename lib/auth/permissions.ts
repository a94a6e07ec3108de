import type { Role } from "@/db/schema";
import type { Actor } from "./actor";

/**
 * Every permission decision of Eigenroom lives here. Pages, server actions and route handlers ask
 * these functions; none of them decides on its own.
 *
 * Visibility of a project is decided in the query (db/queries/projects.ts `projectScope`) from the
 * same rules written below in `canSeeProject`, so that a project an actor may not see is simply not
 * found (404), never "forbidden" (which would confirm that it exists).
 */

/** Firm-wide actions, not tied to one project. */
export type FirmAction =
  | "project.list"
  | "project.create"
  | "member.list"
  | "member.manage"
  | "outbox.read"
  | "engine.run"
  | "report.settings"
  | "fee.manage"
  | LibraryAction
  | PriceListAction;

/** Actions on one project (and the rooms and analyses inside it). */
export type ProjectAction =
  | "project.read"
  | "project.update"
  | "project.delete"
  | "room.read"
  | "room.create"
  | "room.update"
  | "room.delete"
  | "build.read"
  | "build.mark-done"
  // Reports. Drafts (unsigned) are staff-only: `report.read` covers every revision, `report.read-issued`
  // only issued and superseded ones. Builders get build sheets, not the client's report.
  | "report.read"
  | "report.compose"
  | "report.issue"
  | "report.send"
  | "report.answer"
  | "report.read-issued"
  | "report.approve"
  | "report.ask"
  // Room files (photos, drawings, the client's own files) and the engineering fee's invoices.
  | FileAndInvoiceAction
  | WorkspaceAction;

/**
 * `file.delete` removes any file of the project, `file.delete-own` only one the actor uploaded;
 * `file.curate` chooses the report's photos; `invoice.raise` raises and voids; only the project's
 * client pays (`invoice.pay`). Builders see invoices not at all (the fee is between firm and client).
 */
export type FileAndInvoiceAction = "file.read" | "file.upload" | "file.delete" | "file.delete-own" | "file.curate" | "invoice.read" | "invoice.raise" | "invoice.pay";

/**
 * The firm's build library (saved absorber designs): owners and engineers manage it, builders read
 * it, clients neither. Builds are firm-scoped: another firm's build is simply not found (404).
 */
export type LibraryAction = "library.read" | "library.manage";
const LIBRARY_ACTIONS: Record<Role, readonly LibraryAction[]> = {
  owner: ["library.read", "library.manage"],
  engineer: ["library.read", "library.manage"],
  builder: ["library.read"],
  client: [],
};

/**
 * A room's workspace: surfaces, positions, scenarios, treatment items and their stored analysis.
 * Owners and engineers read and write; builders read (they build from it); clients do not read it
 * through the API — the analysis is the firm's working material, and a client sees what an issued
 * report shows. So a client of the project gets 403 on workspace routes (the room itself stays
 * readable), and a client of another project 404.
 */
export type WorkspaceAction = "workspace.read" | "workspace.update" | "scenario.create" | "scenario.update" | "scenario.archive" | "treatment.update";
const STAFF_WORKSPACE_ACTIONS = ["workspace.read", "workspace.update", "scenario.create", "scenario.update", "scenario.archive", "treatment.update"] as const;
const WORKSPACE_ACTIONS: Record<Role, readonly WorkspaceAction[]> = {
  owner: STAFF_WORKSPACE_ACTIONS,
  engineer: STAFF_WORKSPACE_ACTIONS,
  builder: ["workspace.read"],
  client: [],
};

/**
 * The firm's price list and stock sizes for build sheets: the owner sets it; engineers and builders
 * read it (build sheets show the materials cost); clients neither.
 */
export type PriceListAction = "price-list.read" | "price-list.manage";
const PRICE_LIST_ACTIONS: Record<Role, readonly PriceListAction[]> = {
  owner: ["price-list.read", "price-list.manage"],
  engineer: ["price-list.read"],
  builder: ["price-list.read"],
  client: [],
};

const FIRM_ACTIONS: Record<Role, readonly FirmAction[]> = {
  owner: ["project.list", "project.create", "member.list", "member.manage", "outbox.read", "engine.run", "report.settings", "fee.manage"],
  engineer: ["project.list", "project.create", "member.list", "engine.run"],
  builder: ["project.list", "engine.run"],
  client: ["project.list", "engine.run"],
};

/** May the actor do this firm-wide action? */
export function canInFirm(actor: Actor, action: FirmAction): boolean {
  return (
    FIRM_ACTIONS[actor.role].includes(action) ||
    (LIBRARY_ACTIONS[actor.role] as readonly FirmAction[]).includes(action) ||
    (PRICE_LIST_ACTIONS[actor.role] as readonly FirmAction[]).includes(action)
  );
}

/** The facts about a project that permissions depend on. */
export interface ProjectFacts {
  firmId: string;
  clientUserId: string | null;
  builderIds: readonly string[];
}

/** Whether the actor may know the project exists at all. */
export function canSeeProject(actor: Actor, project: ProjectFacts): boolean {
  if (project.firmId !== actor.firmId) return false;
  switch (actor.role) {
    case "owner":
    case "engineer":
      return true;
    case "builder":
      return project.builderIds.includes(actor.userId);
    case "client":
      return project.clientUserId === actor.userId;
  }
}

const STAFF_REPORT_ACTIONS = ["report.read", "report.compose", "report.issue", "report.send", "report.answer", "report.read-issued"] as const;

const STAFF_FILE_INVOICE_ACTIONS = ["file.read", "file.upload", "file.delete", "file.curate", "invoice.read", "invoice.raise"] as const;
const FILE_INVOICE_ACTIONS: Record<Role, readonly FileAndInvoiceAction[]> = {
  owner: STAFF_FILE_INVOICE_ACTIONS,
  engineer: STAFF_FILE_INVOICE_ACTIONS,
  builder: ["file.read", "file.upload", "file.delete-own"],
  client: ["file.read", "file.upload", "file.delete-own", "invoice.read", "invoice.pay"],
};

/**
 * Which kinds of room file a role may upload: builders add site photos (drawings are the engineer's
 * design documents), clients add their own files (plans, pictures, papers), staff add anything.
 */
export const UPLOAD_KINDS: Record<Role, readonly ("photo" | "drawing" | "client-file")[]> = {
  owner: ["photo", "drawing", "client-file"],
  engineer: ["photo", "drawing", "client-file"],
  builder: ["photo"],
  client: ["client-file"],
};

const PROJECT_ACTIONS: Record<Role, readonly ProjectAction[]> = {
  owner: ["project.read", "project.update", "project.delete", "room.read", "room.create", "room.update", "room.delete", "build.read", "build.mark-done", ...STAFF_REPORT_ACTIONS],
  engineer: ["project.read", "project.update", "project.delete", "room.read", "room.create", "room.update", "room.delete", "build.read", ...STAFF_REPORT_ACTIONS],
  builder: ["project.read", "room.read", "build.read", "build.mark-done"],
  client: ["project.read", "room.read", "report.read-issued", "report.approve", "report.ask"],
};

/** May the actor do this to the project? False whenever the project is not visible to them. */
export function canOnProject(actor: Actor, action: ProjectAction, project: ProjectFacts): boolean {
  return canSeeProject(actor, project) && (PROJECT_ACTIONS[actor.role].includes(action) || (FILE_INVOICE_ACTIONS[actor.role] as readonly ProjectAction[]).includes(action) || (WORKSPACE_ACTIONS[actor.role] as readonly ProjectAction[]).includes(action));
}

/** Roles an owner may give when inviting or changing a member. */
export const ASSIGNABLE_ROLES: readonly Role[] = ["owner", "engineer", "builder", "client"];

/** The navigation a role sees (the server decides; the layout only renders it). */
export function navigationFor(actor: Actor): { href: string; label: string }[] {
  const items = [{ href: "/projects", label: actor.role === "client" ? "My projects" : actor.role === "builder" ? "My jobs" : "Projects" }];
  if (canInFirm(actor, "member.list")) items.push({ href: "/members", label: "Team" });
  if (canInFirm(actor, "fee.manage")) items.push({ href: "/settings/fees", label: "Fees" });
  if (canInFirm(actor, "price-list.manage")) items.push({ href: "/settings/prices", label: "Prices" });
  if (canInFirm(actor, "outbox.read")) items.push({ href: "/dev/outbox", label: "Outbox" });
  return items;
}
