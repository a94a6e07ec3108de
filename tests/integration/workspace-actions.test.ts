// Room workspace through the server actions of app/(app)/rooms/[roomId]/actions.ts, on the real test
// database: the same query functions as the API, the ActionResult shape, versions, nothing half-saved.
import { beforeAll, describe, expect, it } from "vitest";
import {
  addPositionAction,
  addTreatmentItemAction,
  archiveScenarioAction,
  createScenarioAction,
  deleteBuildAction,
  deletePositionAction,
  duplicateScenarioAction,
  movePositionAction,
  removeTreatmentItemAction,
  renamePositionAction,
  renameScenarioAction,
  saveBuildAction,
  saveSurfacesAction,
  updatePositionAction,
  updateScenarioAction,
  updateTreatmentItemAction,
} from "@/app/(app)/rooms/[roomId]/actions";
import { actAs, runAction } from "../support/act-as";
import { resetTables, testDb } from "./support/db";
import { counts, freshAnalysis, hollisRoomId, PANEL_ITEM, roomVersion, scenarioByName, scenarioVersion } from "./workspace-support";

let room: string;
type R = { ok: boolean; code?: string; fields?: Record<string, string[]>; data?: any };
const act = async (fn: () => Promise<unknown>) => (await runAction(fn)) as R;

beforeAll(async () => {
  await resetTables();
  room = await hollisRoomId();
  await actAs("engineer");
});

describe("scenario actions", () => {
  it("create, duplicate, rename, re-target and archive, each stored result equal to a fresh computation", async () => {
    const created = await act(() => createScenarioAction(room, { name: "Action scenario" }));
    expect(created.ok).toBe(true);
    const id = created.data.id as string;
    const added = await act(() => addTreatmentItemAction(id, { ...PANEL_ITEM, version: created.data.version }));
    expect(added.ok).toBe(true);
    const edited = await act(() => updateTreatmentItemAction(id, added.data.id, { unitCost: 150, version: added.data.scenarioVersion }));
    expect(edited.ok).toBe(true);
    const row = await testDb().selectFrom("scenarios").selectAll().where("id", "=", id).executeTakeFirstOrThrow();
    expect((row.results as { items: { cost: number } }).items.cost).toBe(4 * 150);
    expect(row.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(id))));

    const dup = await act(() => duplicateScenarioAction(id, {}));
    expect(dup.ok).toBe(true);
    const copy = await testDb().selectFrom("scenarios").selectAll().where("id", "=", dup.data.id).executeTakeFirstOrThrow();
    expect(copy.name).toBe("Action scenario (copy)");
    expect(copy.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(copy.id))));
    expect((copy.results as { items: { cost: number } }).items.cost).toBe(600);

    const renamed = await act(() => renameScenarioAction(dup.data.id, { name: "Copy, renamed", version: dup.data.version }));
    expect(renamed.ok).toBe(true);
    const retarget = await act(() => updateScenarioAction(dup.data.id, { target: { kind: "listening-room" }, version: renamed.data.version }));
    expect(retarget.ok).toBe(true);
    const after = await testDb().selectFrom("scenarios").selectAll().where("id", "=", dup.data.id).executeTakeFirstOrThrow();
    expect((after.results as { reverb: { target: unknown } }).reverb.target).toEqual({ kind: "listening-room" });
    const archived = await act(() => archiveScenarioAction(dup.data.id, { archived: true, version: retarget.data.version }));
    expect(archived.ok).toBe(true);
    expect((await testDb().selectFrom("scenarios").select("archived_at").where("id", "=", dup.data.id).executeTakeFirstOrThrow()).archived_at).not.toBeNull();
    const back = await act(() => archiveScenarioAction(dup.data.id, { archived: false, version: archived.data.version }));
    expect(back.ok).toBe(true);

    const removed = await act(() => removeTreatmentItemAction(id, added.data.id, { version: edited.data.scenarioVersion }));
    expect(removed.ok).toBe(true);
    expect(((await testDb().selectFrom("scenarios").select("results").where("id", "=", id).executeTakeFirstOrThrow()).results as { items: { count: number } }).items.count).toBe(0);
  });

  it("a stale version → conflict, nothing changes", async () => {
    const s = await scenarioByName(room, "Panels at reflection points");
    expect((await act(() => renameScenarioAction(s.id, { name: "Fresh name", version: s.version }))).ok).toBe(true);
    const stale = await act(() => renameScenarioAction(s.id, { name: "Stale name", version: s.version }));
    expect(stale).toMatchObject({ ok: false, code: "conflict" });
    const before = await counts();
    const staleItem = await act(() => addTreatmentItemAction(s.id, { ...PANEL_ITEM, version: s.version }));
    expect(staleItem).toMatchObject({ ok: false, code: "conflict" });
    expect(await counts()).toEqual(before);
    expect((await scenarioByName(room, "Fresh name")).version).toBe(s.version + 1);
  });

  it("invalid input → bad_request with field messages, nothing saved", async () => {
    const s = await scenarioByName(room, "Panels and corner traps");
    const before = await counts();
    const bad = await act(() => addTreatmentItemAction(s.id, { ...PANEL_ITEM, count: 0, spec: { ...PANEL_ITEM.spec, heightM: -1 }, version: s.version }));
    expect(bad).toMatchObject({ ok: false, code: "bad_request" });
    expect(Object.keys(bad.fields!)).toEqual(expect.arrayContaining(["count", "spec.heightM"]));
    const noName = await act(() => createScenarioAction(room, { name: "" }));
    expect(noName.fields?.name).toBeDefined();
    const badTarget = await act(() => createScenarioAction(room, { name: "T", target: { kind: "small-room", lowerS: 0.5, upperS: 0.3 } }));
    expect(badTarget.fields?.["target.upperS"]).toBeDefined();
    expect(await counts()).toEqual(before);
    expect(await scenarioVersion(s.id)).toBe(s.version);
  });
});

describe("position and surface actions", () => {
  it("add, move (one call), rename and delete a subwoofer; the main seat's response follows the move", async () => {
    const v0 = await roomVersion(room);
    const added = await act(() => addPositionAction(room, { kind: "subwoofer", name: "Side sub", xM: 2.9, yM: 0.3, zM: 0.3, version: v0 }));
    expect(added.ok).toBe(true);
    expect(added.data.roomVersion).toBe(v0 + 1);
    const base = await scenarioByName(room, "Untreated room");
    const levels = (r: unknown) => (r as { lowFrequency: { seats: { isMain: boolean; levelsDb: number[] }[] } }).lowFrequency.seats.find((s) => s.isMain)!.levelsDb;
    // Not to y = 3.8: the mirror image of y = 0.3 about the centre line, where the main seat sits, gives the same response there.
    const moved = await act(() => movePositionAction(room, added.data.id, { xM: 4.0, yM: 3.8, zM: 0.3, version: added.data.roomVersion }));
    expect(moved.ok).toBe(true);
    const after = await scenarioByName(room, "Untreated room");
    expect(levels(after.results)).not.toEqual(levels(base.results));
    expect(after.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(after.id))));
    const renamed = await act(() => renamePositionAction(room, added.data.id, { name: "Right-side sub", version: moved.data.roomVersion }));
    expect(renamed.ok).toBe(true);
    const flipped = await act(() => updatePositionAction(room, added.data.id, { polarity: -1, delayMs: 3.5, version: renamed.data.roomVersion }));
    expect(flipped.ok).toBe(true);
    const row = await testDb().selectFrom("room_positions").selectAll().where("id", "=", added.data.id).executeTakeFirstOrThrow();
    expect([row.name, row.polarity, row.delay_ms, row.x_m, row.y_m]).toEqual(["Right-side sub", -1, 3.5, 4.0, 3.8]);
    const gone = await act(() => deletePositionAction(room, added.data.id, { version: flipped.data.roomVersion }));
    expect(gone.ok).toBe(true);
    expect(await testDb().selectFrom("room_positions").select("id").where("id", "=", added.data.id).executeTakeFirst()).toBeUndefined();
  });

  it("a move outside the room or with a stale version is refused; a seat cannot take a delay", async () => {
    const sub = await testDb().selectFrom("room_positions").selectAll().where("room_id", "=", room).where("name", "=", "Front subwoofer").executeTakeFirstOrThrow();
    const v = await roomVersion(room);
    const outside = await act(() => movePositionAction(room, sub.id, { xM: 0.3, yM: 4.5, zM: 0.3, version: v }));
    expect(outside).toMatchObject({ ok: false, code: "bad_request" });
    expect(outside.fields!.yM![0]).toMatch(/inside the room/);
    const stale = await act(() => movePositionAction(room, sub.id, { xM: 0.4, yM: 0.4, zM: 0.3, version: v - 1 }));
    expect(stale).toMatchObject({ ok: false, code: "conflict" });
    const seat = await testDb().selectFrom("room_positions").select("id").where("room_id", "=", room).where("kind", "=", "seat").executeTakeFirstOrThrow();
    const delay = await act(() => updatePositionAction(room, seat.id, { delayMs: 2, version: v }));
    expect(delay.fields?.delayMs).toBeDefined();
    expect(await roomVersion(room)).toBe(v);
    expect((await testDb().selectFrom("room_positions").select("y_m").where("id", "=", sub.id).executeTakeFirstOrThrow()).y_m).toBe(sub.y_m);
  });

  it("marking another seat main moves the mark (one main seat per room)", async () => {
    const back = await testDb().selectFrom("room_positions").select("id").where("room_id", "=", room).where("name", "=", "Back left").executeTakeFirstOrThrow();
    const v = await roomVersion(room);
    const res = await act(() => updatePositionAction(room, back.id, { isMain: true, version: v }));
    expect(res.ok).toBe(true);
    const mains = await testDb().selectFrom("room_positions").select("name").where("room_id", "=", room).where("is_main", "=", true).execute();
    expect(mains.map((m) => m.name)).toEqual(["Back left"]);
  });

  it("saving surfaces with an α out of range → bad_request on that value; a good save bumps the room version", async () => {
    const rows = await testDb().selectFrom("room_surfaces").selectAll().where("room_id", "=", room).execute();
    const order = ["front", "rear", "left", "right", "floor", "ceiling"];
    const six = order.map((s) => {
      const r = rows.find((x) => x.surface === s)!;
      return { surface: s, finish: r.finish, openings: r.openings };
    });
    const v = await roomVersion(room);
    const bad = structuredClone(six);
    bad[2]!.finish = { kind: "custom", alpha: [0.1, 0.1, 0.1, 1.4, 0.1, 0.1, 0.1, 0.1] };
    const res = await act(() => saveSurfacesAction(room, { version: v, surfaces: bad }));
    expect(res.fields?.["surfaces.2.finish.alpha.3"]).toBeDefined();
    expect(await roomVersion(room)).toBe(v);
    const good = await act(() => saveSurfacesAction(room, { version: v, surfaces: six }));
    expect(good).toMatchObject({ ok: true, data: { roomVersion: v + 1 } });
  });
});

describe("build library actions", () => {
  it("save and delete a build; a builder may not", async () => {
    const saved = await act(() => saveBuildAction({ name: "Action build", spec: { kind: "perforated", openAreaRatio: 0.05, plateThicknessM: 0.006, holeDiameterM: 0.008, cavityDepthM: 0.1 } }));
    expect(saved.ok).toBe(true);
    await actAs("builder");
    expect(await act(() => deleteBuildAction(saved.data.id))).toMatchObject({ ok: false, code: "forbidden" });
    await actAs("engineer");
    expect((await act(() => deleteBuildAction(saved.data.id))).ok).toBe(true);
  });
});
