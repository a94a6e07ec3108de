import { sql } from "kysely";
import { groupItems, jobOf, EMPTY_PRICE_LIST, type JobGroup } from "@/lib/build-sheet/job-from-items";
import type { ProgressInput } from "@/lib/schemas/build-sheet";
import { AppError, forbidden, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject } from "@/lib/auth/permissions";
import { buildSheet, presentBuildSheet, type BuildSheet, type UnitSystem } from "@/lib/build-sheet";
import { inTransaction, loadItems, type Db, type TreatmentItem } from "./analysis";
import { loadPriceList, type PriceList } from "./price-lists";
import { findProject, isUuid, projectFor, type Project } from "./projects";
import { scenarioFor } from "./scenarios";

/** Site progress of one treatment item (days as YYYY-MM-DD). */
export interface ItemProgress {
  itemId: string;
  builtOn: string | null;
  builtByName: string | null;
  installedOn: string | null;
  installedByName: string | null;
  note: string;
  updatedAt: Date | null;
}

const NO_PROGRESS = (itemId: string): ItemProgress => ({ itemId, builtOn: null, builtByName: null, installedOn: null, installedByName: null, note: "", updatedAt: null });

/** Progress of these items (an item never marked reads as not built, not installed). */
export async function progressOf(db: Db, itemIds: readonly string[]): Promise<Map<string, ItemProgress>> {
  const out = new Map<string, ItemProgress>(itemIds.map((id) => [id, NO_PROGRESS(id)]));
  if (itemIds.length === 0) return out;
  const rows = await db
    .selectFrom("treatment_item_progress")
    .select([
      "item_id",
      sql<string | null>`to_char(built_at, 'YYYY-MM-DD')`.as("built_on"),
      "built_by_name",
      sql<string | null>`to_char(installed_at, 'YYYY-MM-DD')`.as("installed_on"),
      "installed_by_name",
      "note",
      "updated_at",
    ])
    .where("item_id", "in", itemIds)
    .execute();
  for (const r of rows) out.set(r.item_id, { itemId: r.item_id, builtOn: r.built_on, builtByName: r.built_by_name, installedOn: r.installed_on, installedByName: r.installed_by_name, note: r.note, updatedAt: r.updated_at });
  return out;
}

/** The scenario a room's build sheet lists: the one an engineer chose, else the latest active scenario with items. */
export interface BuildScenario {
  id: string;
  name: string;
  version: number;
  chosen: boolean;
  chosenAt: Date | null;
}

export async function buildScenarioOf(db: Db, roomId: string): Promise<BuildScenario | null> {
  const chosen = await db
    .selectFrom("room_build_scenarios as b")
    .innerJoin("scenarios as s", "s.id", "b.scenario_id")
    .select(["s.id", "s.name", "s.version", "b.chosen_at"])
    .where("b.room_id", "=", roomId)
    .where("s.archived_at", "is", null)
    .executeTakeFirst();
  if (chosen) return { id: chosen.id, name: chosen.name, version: chosen.version, chosen: true, chosenAt: chosen.chosen_at };
  const latest = await db
    .selectFrom("scenarios as s")
    .select(["s.id", "s.name", "s.version"])
    .where("s.room_id", "=", roomId)
    .where("s.is_baseline", "=", false)
    .where("s.archived_at", "is", null)
    .where((eb) => eb.exists(eb.selectFrom("treatment_items as t").select("t.id").whereRef("t.scenario_id", "=", "s.id")))
    .orderBy("s.sort_order", "desc")
    .orderBy("s.created_at", "desc")
    .executeTakeFirst();
  return latest ? { ...latest, chosen: false, chosenAt: null } : null;
}

/** A room of the build sheet: the scenario built there, its items and their progress. */
export interface BuildSheetRoom {
  id: string;
  name: string;
  scenario: BuildScenario | null;
  items: (TreatmentItem & { progress: ItemProgress; group: number | null })[];
}

/** What the build-sheet page and GET /projects/{projectId}/build-sheet show. */
export interface ProjectBuildSheet {
  project: { id: string; name: string; clientName: string; siteAddress: string };
  units: UnitSystem;
  rooms: BuildSheetRoom[];
  groups: (Omit<JobGroup, "key"> & { rooms: string[] })[];
  /** items the sheet cannot cut (built to a drawing) */
  skipped: { id: string; name: string; reason: string }[];
  /** null when no room has treatment to build yet */
  sheet: BuildSheet | null;
  presented: ReturnType<typeof presentBuildSheet> | null;
  priceList: (PriceList & { isSet: true }) | (typeof EMPTY_PRICE_LIST & { isSet: false });
  slab: { thicknessM: number; price: number; reason: string } | null;
  can: { markProgress: boolean };
}

/**
 * The build sheet of a project (`build.read`: owner, engineer, the project's builders): per room the
 * scenario to build, its items with their progress, and lib/build-sheet's sheet for all the items
 * (identical builds merged into one build type) at the firm's stock sizes and prices.
 */
export async function projectBuildSheet(db: Db, actor: Actor, projectId: string, units: UnitSystem = actor.unitSystem): Promise<ProjectBuildSheet> {
  const project = await projectFor(db, actor, projectId, "build.read");
  return inTransaction(db, async (trx) => {
    const roomRows = await trx.selectFrom("rooms").select(["id", "name"]).where("project_id", "=", project.id).orderBy("created_at").execute();
    const rooms: BuildSheetRoom[] = [];
    for (const r of roomRows) {
      const scenario = await buildScenarioOf(trx, r.id);
      const items = scenario ? await loadItems(trx, [scenario.id]) : [];
      const progress = await progressOf(
        trx,
        items.map((i) => i.id),
      );
      rooms.push({ id: r.id, name: r.name, scenario, items: items.map((i) => ({ ...i, progress: progress.get(i.id)!, group: null })) });
    }
    const stored = await loadPriceList(trx, project.firmId);
    const list = stored ?? EMPTY_PRICE_LIST;
    const all = rooms.flatMap((r) => r.items);
    const { groups, skipped } = groupItems(all, list.lumber.widthM);
    for (const room of rooms) for (const it of room.items) {
      const g = groups.findIndex((x) => x.itemIds.includes(it.id));
      it.group = g >= 0 ? g : null;
    }
    let sheet: BuildSheet | null = null;
    let slab: ProjectBuildSheet["slab"] = null;
    if (groups.length > 0) {
      const built = jobOf(groups, list);
      sheet = buildSheet(built.job);
      slab = built.slab;
    }
    return {
      project: { id: project.id, name: project.name, clientName: project.clientName, siteAddress: project.siteAddress },
      units,
      rooms,
      groups: groups.map(({ key: _key, ...g }) => ({ ...g, rooms: rooms.filter((r) => r.items.some((i) => g.itemIds.includes(i.id))).map((r) => r.name) })),
      skipped,
      sheet,
      presented: sheet ? presentBuildSheet(sheet, units) : null,
      priceList: stored ? { ...stored, isSet: true as const } : { ...EMPTY_PRICE_LIST, isSet: false as const },
      slab,
      can: { markProgress: canOnProject(actor, "build.mark-done", project) },
    };
  });
}

/** The item with its scenario, room and project, for an actor who may see the project (else 404). */
async function itemContext(db: Db, actor: Actor, itemId: string): Promise<{ item: { id: string; scenarioId: string; roomId: string }; project: Project }> {
  if (!isUuid(itemId)) throw notFound("That item");
  const row = await db
    .selectFrom("treatment_items as t")
    .innerJoin("scenarios as s", "s.id", "t.scenario_id")
    .innerJoin("rooms as r", "r.id", "s.room_id")
    .select(["t.id", "t.scenario_id", "s.room_id", "r.project_id"])
    .where("t.id", "=", itemId)
    .executeTakeFirst();
  const project = row ? await findProject(db, actor, row.project_id) : undefined;
  if (!row || !project) throw notFound("That item");
  return { item: { id: row.id, scenarioId: row.scenario_id, roomId: row.room_id }, project };
}

/**
 * Marks an item built and/or installed (`build.mark-done`: the project's builders and the owner; an
 * engineer reads the progress but does not mark it). Only items on the build sheet (the room's scenario
 * to build) can be marked; installed needs built, on the same day or later. One transaction.
 */
export async function markProgress(db: Db, actor: Actor, itemId: string, input: ProgressInput): Promise<ItemProgress> {
  return inTransaction(db, async (trx) => {
    const { item, project } = await itemContext(trx, actor, itemId);
    if (!canOnProject(actor, "build.mark-done", project)) throw forbidden("Only the project's builders mark items built or installed.");
    const onSheet = await buildScenarioOf(trx, item.roomId);
    if (onSheet?.id !== item.scenarioId) throw new AppError("bad_request", "That item is not on the build sheet: its scenario is not the one to build.", { itemId: ["not on the build sheet"] });
    const current = (await progressOf(trx, [itemId])).get(itemId)!;
    const builtOn = input.builtOn !== undefined ? input.builtOn : current.builtOn;
    const installedOn = input.installedOn !== undefined ? input.installedOn : current.installedOn;
    if (installedOn && !builtOn) throw new AppError("bad_request", "Mark the item built before installed.", { installedOn: ["the item is not built yet"] });
    if (installedOn && builtOn && installedOn < builtOn) throw new AppError("bad_request", "The item cannot be installed before it was built.", { installedOn: [`must be on or after ${builtOn}`] });
    const set = {
      built_at: builtOn,
      installed_at: installedOn,
      note: input.note ?? current.note,
      ...(input.builtOn !== undefined && { built_by: input.builtOn ? actor.userId : null, built_by_name: input.builtOn ? actor.name : null }),
      ...(input.installedOn !== undefined && { installed_by: input.installedOn ? actor.userId : null, installed_by_name: input.installedOn ? actor.name : null }),
    };
    await trx
      .insertInto("treatment_item_progress")
      .values({ item_id: itemId, ...set })
      .onConflict((oc) => oc.column("item_id").doUpdateSet({ ...set, updated_at: sql`now()` }))
      .execute();
    return (await progressOf(trx, [itemId])).get(itemId)!;
  });
}

/** Chooses the scenario a room's build sheet lists (`scenario.update`: owner, engineer); not the baseline. */
export async function chooseBuildScenario(db: Db, actor: Actor, scenarioId: string): Promise<{ roomId: string; projectId: string }> {
  return inTransaction(db, async (trx) => {
    const { row, room, project } = await scenarioFor(trx, actor, scenarioId, "scenario.update");
    if (row.is_baseline) throw new AppError("bad_request", "The baseline is the untreated room: choose a treated scenario to build.", { scenarioId: ["the baseline has nothing to build"] });
    if (row.archived_at) throw new AppError("bad_request", "Bring the scenario back from the archive first.", { scenarioId: ["archived"] });
    await trx
      .insertInto("room_build_scenarios")
      .values({ room_id: room.id, scenario_id: scenarioId, chosen_by: actor.userId })
      .onConflict((oc) => oc.column("room_id").doUpdateSet({ scenario_id: scenarioId, chosen_by: actor.userId, chosen_at: sql`now()` }))
      .execute();
    return { roomId: room.id, projectId: project.id };
  });
}
