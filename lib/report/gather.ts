import "server-only";
import type { Kysely } from "kysely";
import { analysisItemOf, loadAnalysisRoom } from "@/db/queries/analysis";
import type { Project } from "@/db/queries/projects";
import type { Report, ReportRevision } from "@/db/queries/reports";
import type { Room } from "@/db/queries/rooms";
import { reportPhotos } from "@/db/queries/files";
import { compareScenarios, listScenarios } from "@/db/queries/scenarios";
import type { Database } from "@/db/schema";
import { analyzeScenario } from "@/lib/analysis";
import { AppError } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";
import { DEFAULT_TARGET } from "@/lib/schemas/workspace";
import { loadReportPhotos } from "@/lib/storage/room-files";
import { objectStorage } from "@/lib/storage/storage";
import type { ReportInput, ReportScenarioInput } from "./types";

/**
 * Collects what a report is made of from the workspace: the room with its surfaces and positions,
 * the chosen scenarios with fresh lib/analysis results (the same `compareScenarios` the comparison
 * screen uses), and the baseline as "before". The caller has checked report.compose / report.issue.
 */
export async function gatherReportInput(
  db: Kysely<Database>,
  actor: Actor,
  ctx: { report: Report; revision: ReportRevision; project: Project; room: Room; firm: { name: string; contactEmail: string | null } },
  opts: { issuedAt: Date; status: "draft" | "issued"; signature: ReportInput["signature"] },
): Promise<ReportInput> {
  const { revision, room } = ctx;
  if (revision.scenarioIds.length === 0) throw new AppError("bad_request", "Choose at least one scenario for the report.", { scenarioIds: ["choose at least one scenario"] });
  const summaries = await listScenarios(db, actor, room.id, { includeArchived: true });
  const baseline = summaries.find((s) => s.isBaseline);
  const ids = [...new Set([...(baseline ? [baseline.id] : []), ...revision.scenarioIds])];
  const full = await compareScenarios(db, actor, room.id, ids);
  const toInput = (s: (typeof full)[number]): ReportScenarioInput => ({
    id: s.id,
    name: s.name,
    isBaseline: s.isBaseline,
    notes: s.notes,
    analysis: { target: s.target, items: s.items.map(analysisItemOf) },
    results: s.results,
  });
  const analysisRoom = await loadAnalysisRoom(db, room.id);
  const chosen = revision.scenarioIds.map((id) => full.find((s) => s.id === id)).filter((s) => s !== undefined).map(toInput);
  if (chosen.length === 0) throw new AppError("bad_request", "The chosen scenarios no longer exist in this room.", { scenarioIds: ["choose scenarios of this room"] });
  const baseFull = baseline ? full.find((s) => s.id === baseline.id) : undefined;
  const rec = chosen[chosen.length - 1]!;
  const before: ReportScenarioInput = baseFull
    ? toInput(baseFull)
    : { id: "untreated", name: "Untreated", isBaseline: true, notes: "", analysis: { target: rec.analysis.target ?? DEFAULT_TARGET, items: [] }, results: analyzeScenario(analysisRoom, { target: rec.analysis.target, items: [] }) };
  return {
    firm: ctx.firm,
    project: { name: ctx.project.name, clientName: ctx.project.clientName, siteAddress: ctx.project.siteAddress },
    room: { ...analysisRoom, name: room.name },
    engineerName: actor.name,
    number: ctx.report.number,
    revision: revision.revision,
    issuedAt: opts.issuedAt,
    paperSize: revision.paperSize,
    status: opts.status,
    note: revision.note,
    before,
    scenarios: chosen,
    signature: opts.signature,
    photos: await chosenPhotos(db, room.id),
  };
}

/** The room's photos the engineer chose for the report, as JPEG; null when none are chosen. */
async function chosenPhotos(db: Kysely<Database>, roomId: string): Promise<ReportInput["photos"]> {
  if ((await reportPhotos(db, roomId)).length === 0) return null;
  const images = await loadReportPhotos(db, objectStorage(), roomId);
  return images.map((p) => ({ caption: p.caption || p.name, data: Buffer.from(p.jpeg), format: "jpg" as const }));
}
