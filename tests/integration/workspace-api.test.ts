// Room workspace through the /api/v1 route handlers, on the real test database with the demo seed:
// surfaces, positions, scenarios, treatment items, builds; stale writes, bad input, stored results.
import { beforeAll, describe, expect, it } from "vitest";
import * as analysisRoute from "@/app/api/v1/rooms/[roomId]/analysis/route";
import * as positionRoute from "@/app/api/v1/rooms/[roomId]/positions/[positionId]/route";
import * as positionsRoute from "@/app/api/v1/rooms/[roomId]/positions/route";
import * as roomScenariosRoute from "@/app/api/v1/rooms/[roomId]/scenarios/route";
import * as surfacesRoute from "@/app/api/v1/rooms/[roomId]/surfaces/route";
import * as workspaceRoute from "@/app/api/v1/rooms/[roomId]/workspace/route";
import * as roomRoute from "@/app/api/v1/rooms/[roomId]/route";
import * as duplicateRoute from "@/app/api/v1/scenarios/[scenarioId]/duplicate/route";
import * as itemRoute from "@/app/api/v1/scenarios/[scenarioId]/items/[itemId]/route";
import * as itemsRoute from "@/app/api/v1/scenarios/[scenarioId]/items/route";
import * as scenarioRoute from "@/app/api/v1/scenarios/[scenarioId]/route";
import * as buildRoute from "@/app/api/v1/builds/[buildId]/route";
import * as buildsRoute from "@/app/api/v1/builds/route";
import * as openapiRoute from "@/app/api/v1/openapi.json/route";
import { ENGINE_VERSION } from "@/lib/analysis";
import { actAs, callRoute } from "../support/act-as";
import { resetTables, testDb } from "./support/db";
import { counts, freshAnalysis, hollisRoomId, PANEL_ITEM, roomVersion, scenarioByName, scenarioVersion } from "./workspace-support";

let room: string;

beforeAll(async () => {
  await resetTables();
  room = await hollisRoomId();
  await actAs("engineer");
});

describe("the demo seed", () => {
  it("gives the Hollis media room six surfaces, five seats (one main), four sources and three scenarios with stored results", async () => {
    const res = await callRoute(workspaceRoute.GET, { params: { roomId: room } });
    expect(res.status).toBe(200);
    const w = res.json.workspace;
    expect(w.surfaces.map((s: { surface: string }) => s.surface)).toEqual(["front", "rear", "left", "right", "floor", "ceiling"]);
    expect(w.surfaces.every((s: { assumed: boolean }) => !s.assumed)).toBe(true);
    expect(w.seats).toHaveLength(5);
    expect(w.seats.filter((s: { isMain: boolean }) => s.isMain)).toHaveLength(1);
    expect(w.sources.filter((s: { kind: string }) => s.kind === "subwoofer")).toHaveLength(2);
    expect(w.scenarios.map((s: { name: string }) => s.name)).toEqual(["Untreated room", "Panels at reflection points", "Panels and corner traps"]);
    expect(w.scenarios[0].isBaseline).toBe(true);
    expect(w.scenarios[2].itemCount).toBe(12);
    expect(w.scenarios[2].totalCost).toBe(6 * 95 + 2 * 120 + 4 * 320);
    expect(w.can).toEqual({ editRoom: true, editScenarios: true });
  });

  it("stores results equal to a fresh lib/analysis computation, with the engine version and the inputs hash", async () => {
    for (const name of ["Untreated room", "Panels at reflection points", "Panels and corner traps"]) {
      const row = await scenarioByName(room, name);
      const fresh = await freshAnalysis(row.id);
      expect(row.engine_version).toBe(ENGINE_VERSION);
      expect(row.inputs_hash).toBe(fresh.inputsHash);
      expect(row.results).toEqual(JSON.parse(JSON.stringify(fresh)));
    }
  });

  it("treatment lowers the predicted decay: corner traps more than panels alone at 63 and 125 Hz", async () => {
    const res = await callRoute(analysisRoute.GET, { params: { roomId: room } });
    expect(res.status).toBe(200);
    const [base, panels, traps] = res.json.scenarios.map((s: { results: { reverb: { treated: { eyringS: number[] } } } }) => s.results.reverb.treated.eyringS);
    for (let b = 0; b < 8; b++) expect(panels[b]).toBeLessThan(base[b]);
    expect(traps[0]).toBeLessThan(panels[0]);
    expect(traps[1]).toBeLessThan(panels[1]);
  });

  it("every other demo room has surfaces, a seat and a source", async () => {
    const rooms = await testDb().selectFrom("rooms").select(["id", "name"]).execute();
    for (const r of rooms) {
      const w = (await callRoute(workspaceRoute.GET, { params: { roomId: r.id } })).json.workspace;
      expect(w.surfaces).toHaveLength(6);
      expect(w.seats.length).toBeGreaterThanOrEqual(1);
      expect(w.sources.length).toBeGreaterThanOrEqual(1);
      expect(w.scenarios[0].headline.treatedEyringS).toHaveLength(8);
    }
  });
});

describe("scenarios through the API", () => {
  it("create → add item → edit item → duplicate, each stored result equal to a fresh computation", async () => {
    const created = await callRoute(roomScenariosRoute.POST, { params: { roomId: room }, body: { name: "API scenario", target: { kind: "listening-room" } } });
    expect(created.status).toBe(201);
    const s = created.json.scenario;
    expect(s.isBaseline).toBe(false);
    expect(s.results.reverb.target).toEqual({ kind: "listening-room" });
    const added = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, version: s.version } });
    expect(added.status).toBe(201);
    expect(added.json.scenarioVersion).toBe(s.version + 1);
    const after = await freshAnalysis(s.id);
    expect(after.items.count).toBe(4);
    expect(after.reverb!.addedM2[3]).toBeGreaterThan(1);
    const edited = await callRoute(itemRoute.PATCH, { method: "PATCH", params: { scenarioId: s.id, itemId: added.json.item.id }, body: { count: 6, version: added.json.scenarioVersion } });
    expect(edited.status).toBe(200);
    const got = await callRoute(scenarioRoute.GET, { params: { scenarioId: s.id } });
    expect(got.json.scenario.items[0].count).toBe(6);
    expect(got.json.scenario.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(s.id))));
    expect(got.json.scenario.results.reverb.addedM2[3]).toBeCloseTo((after.reverb!.addedM2[3]! * 6) / 4, 9); // area scales with count (Sabine A = n·S·α)

    const dup = await callRoute(duplicateRoute.POST, { params: { scenarioId: s.id }, body: { name: "API scenario, copy" } });
    expect(dup.status).toBe(201);
    expect(dup.json.scenario.items).toHaveLength(1);
    expect(dup.json.scenario.results.reverb.treated).toEqual(got.json.scenario.results.reverb.treated);
    const row = await scenarioByName(room, "API scenario, copy");
    expect(row.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(row.id))));
  });

  it("rename and archive with PATCH; the baseline cannot be archived nor given items", async () => {
    const s = await scenarioByName(room, "API scenario");
    const renamed = await callRoute(scenarioRoute.PATCH, { method: "PATCH", params: { scenarioId: s.id }, body: { name: "API scenario (renamed)", archived: true, version: s.version } });
    expect(renamed.status).toBe(200);
    expect(renamed.json.scenario.archived).toBe(true);
    const list = await callRoute(roomScenariosRoute.GET, { params: { roomId: room } });
    expect(list.json.scenarios.some((x: { name: string }) => x.name === "API scenario (renamed)")).toBe(true);
    const base = await scenarioByName(room, "Untreated room");
    const archiveBase = await callRoute(scenarioRoute.PATCH, { method: "PATCH", params: { scenarioId: base.id }, body: { archived: true, version: base.version } });
    expect(archiveBase.status).toBe(400);
    expect(archiveBase.json.error.fields.archived).toBeDefined();
    const itemOnBase = await callRoute(itemsRoute.POST, { params: { scenarioId: base.id }, body: { ...PANEL_ITEM, version: base.version } });
    expect(itemOnBase.status).toBe(400);
    expect(await scenarioVersion(base.id)).toBe(base.version);
  });

  it("a stale scenario or item write → 409 and nothing changes", async () => {
    const s = await scenarioByName(room, "Panels at reflection points");
    const ok = await callRoute(scenarioRoute.PATCH, { method: "PATCH", params: { scenarioId: s.id }, body: { notes: "first", version: s.version } });
    expect(ok.status).toBe(200);
    const stale = await callRoute(scenarioRoute.PATCH, { method: "PATCH", params: { scenarioId: s.id }, body: { notes: "second", version: s.version } });
    expect(stale.status).toBe(409);
    expect(stale.json.error.code).toBe("conflict");
    const before = await counts();
    const staleItem = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, version: s.version } });
    expect(staleItem.status).toBe(409);
    expect(await counts()).toEqual(before);
    expect((await scenarioByName(room, "Panels at reflection points")).notes).toBe("first");
  });
});

describe("positions and surfaces through the API", () => {
  it("moving a subwoofer is one call: it bumps the room's version and changes the seat responses of every scenario", async () => {
    const sub = await testDb().selectFrom("room_positions").selectAll().where("room_id", "=", room).where("name", "=", "Rear subwoofer").executeTakeFirstOrThrow();
    const before = (await scenarioByName(room, "Panels and corner traps")).results as { lowFrequency: { seats: { levelsDb: number[] }[] }; inputsHash: string };
    const v = await roomVersion(room);
    const res = await callRoute(positionRoute.PATCH, { method: "PATCH", params: { roomId: room, positionId: sub.id }, body: { xM: 5.2, yM: 1.2, zM: 0.3, version: v } });
    expect(res.status).toBe(200);
    expect(res.json.roomVersion).toBe(v + 1);
    for (const name of ["Untreated room", "Panels and corner traps"]) {
      const row = await scenarioByName(room, name);
      expect(row.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(row.id))));
    }
    const after = (await scenarioByName(room, "Panels and corner traps")).results as typeof before;
    expect(after.inputsHash).not.toBe(before.inputsHash);
    expect(after.lowFrequency.seats[0]!.levelsDb).not.toEqual(before.lowFrequency.seats[0]!.levelsDb);
  });

  it("a stale room version → 409 and the position stays", async () => {
    const sub = await testDb().selectFrom("room_positions").selectAll().where("room_id", "=", room).where("name", "=", "Rear subwoofer").executeTakeFirstOrThrow();
    const v = await roomVersion(room);
    const res = await callRoute(positionRoute.PATCH, { method: "PATCH", params: { roomId: room, positionId: sub.id }, body: { xM: 1, version: v - 1 } });
    expect(res.status).toBe(409);
    const still = await testDb().selectFrom("room_positions").select("x_m").where("id", "=", sub.id).executeTakeFirstOrThrow();
    expect(still.x_m).toBe(sub.x_m);
    expect(await roomVersion(room)).toBe(v);
  });

  it("a position outside the room → 400 on that coordinate, nothing saved", async () => {
    const before = await counts();
    const v = await roomVersion(room);
    const res = await callRoute(positionsRoute.POST, { params: { roomId: room }, body: { kind: "subwoofer", name: "Outside", xM: 6.5, yM: 1, zM: 0.3, version: v } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.xM[0]).toMatch(/inside the room/);
    const neg = await callRoute(positionsRoute.POST, { params: { roomId: room }, body: { kind: "seat", name: "Below", xM: 1, yM: 1, zM: -0.2, version: v } });
    expect(neg.status).toBe(400);
    expect(neg.json.error.fields.zM).toBeDefined();
    expect(await counts()).toEqual(before);
    expect(await roomVersion(room)).toBe(v);
  });

  it("surfaces: a bad α count, an opening off its wall, a missing surface → 400 with the field, nothing saved", async () => {
    const current = (await callRoute(surfacesRoute.GET, { params: { roomId: room } })).json.surfaces;
    const v = await roomVersion(room);
    const six = current.map((s: { surface: string; finish: unknown; openings: unknown[] }) => ({ surface: s.surface, finish: s.finish, openings: s.openings }));
    const badAlpha = structuredClone(six);
    badAlpha[4].finish = { kind: "custom", alpha: [0.1, 0.2, 0.3] };
    const r1 = await callRoute(surfacesRoute.PUT, { method: "PUT", params: { roomId: room }, body: { version: v, surfaces: badAlpha } });
    expect(r1.status).toBe(400);
    expect(r1.json.error.fields["surfaces.4.finish.alpha"][0]).toMatch(/8 values/);
    const offWall = structuredClone(six);
    offWall[0].openings = [{ kind: "window", uM: 3.8, vM: 1, widthM: 1, heightM: 1 }];
    const r2 = await callRoute(surfacesRoute.PUT, { method: "PUT", params: { roomId: room }, body: { version: v, surfaces: offWall } });
    expect(r2.status).toBe(400);
    expect(r2.json.error.fields["surfaces.0.openings.0.widthM"]).toBeDefined();
    const r3 = await callRoute(surfacesRoute.PUT, { method: "PUT", params: { roomId: room }, body: { version: v, surfaces: six.slice(0, 5) } });
    expect(r3.status).toBe(400);
    expect(await roomVersion(room)).toBe(v);
    expect((await callRoute(surfacesRoute.GET, { params: { roomId: room } })).json.surfaces).toEqual(current);
  });

  it("surfaces: saving custom α recomputes every scenario (the untreated decay changes)", async () => {
    const current = (await callRoute(surfacesRoute.GET, { params: { roomId: room } })).json.surfaces;
    const base = await scenarioByName(room, "Untreated room");
    const six = current.map((s: { surface: string; finish: unknown; openings: unknown[] }) => ({ surface: s.surface, finish: s.finish, openings: s.openings }));
    six[5].finish = { kind: "custom", alpha: [0.6, 0.6, 0.6, 0.6, 0.6, 0.6, 0.6, 0.6], description: "test ceiling" };
    const res = await callRoute(surfacesRoute.PUT, { method: "PUT", params: { roomId: room }, body: { version: await roomVersion(room), surfaces: six } });
    expect(res.status).toBe(200);
    const after = await scenarioByName(room, "Untreated room");
    const t = (r: unknown) => (r as { reverb: { untreated: { eyringS: number[] } } }).reverb.untreated.eyringS;
    expect(t(after.results)[3]).toBeLessThan(t(base.results)[3]!);
    expect(after.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(after.id))));
  });
});

describe("treatment items: bad input", () => {
  it("negative sizes, a huge name, placements off the surface → 400 with field messages, nothing saved", async () => {
    const s = await scenarioByName(room, "Panels and corner traps");
    const before = await counts();
    const neg = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, spec: { ...PANEL_ITEM.spec, widthM: -0.6 }, version: s.version } });
    expect(neg.status).toBe(400);
    expect(neg.json.error.fields["spec.widthM"]).toBeDefined();
    const huge = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, name: "x".repeat(10_000), version: s.version } });
    expect(huge.status).toBe(400);
    expect(huge.json.error.fields.name[0]).toMatch(/at most 120/);
    const off = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, placements: [{ kind: "surface", surface: "left", uM: 5.7, vM: 1.2 }], version: s.version } });
    expect(off.status).toBe(400);
    expect(off.json.error.fields["placements.0.uM"]).toBeDefined();
    const tooMany = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, count: 1, placements: [PANEL_ITEM.placements[0], PANEL_ITEM.placements[0]], version: s.version } });
    expect(tooMany.status).toBe(400);
    expect(tooMany.json.error.fields.placements).toBeDefined();
    const resting = await callRoute(itemsRoute.POST, { params: { scenarioId: s.id }, body: { ...PANEL_ITEM, spec: { ...PANEL_ITEM.spec, layers: [{ kind: "resistive-sheet", flowResistance: 500 }] }, version: s.version } });
    expect(resting.status).toBe(400);
    expect(await counts()).toEqual(before);
    expect(await scenarioVersion(s.id)).toBe(s.version);
  });

  it("DELETE without a version → 400; with the current version → 200 and the analysis follows", async () => {
    const s = await scenarioByName(room, "Panels and corner traps");
    const items = (await callRoute(itemsRoute.GET, { params: { scenarioId: s.id } })).json.items;
    const traps = items.find((i: { kind: string }) => i.kind === "corner-trap");
    const noVersion = await callRoute(itemRoute.DELETE, { method: "DELETE", params: { scenarioId: s.id, itemId: traps.id } });
    expect(noVersion.status).toBe(400);
    // callRoute cannot add a query string, so this handler reads `version` from the URL: build one.
    const req = new Request(`http://eigenroom.test/api/v1/scenarios/${s.id}/items/${traps.id}?version=${s.version}`, { method: "DELETE" });
    const res = await itemRoute.DELETE(req, { params: Promise.resolve({ scenarioId: s.id, itemId: traps.id }) });
    expect(res.status).toBe(200);
    const row = await scenarioByName(room, "Panels and corner traps");
    expect((row.results as { items: { count: number } }).items.count).toBe(8);
    expect(row.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(row.id))));
  });
});

describe("room changes and engine versions", () => {
  it("changing a room dimension recomputes every scenario of that room (results change, version and hash stored)", async () => {
    const before = await testDb().selectFrom("scenarios").select(["id", "inputs_hash", "results"]).where("room_id", "=", room).execute();
    const res = await callRoute(roomRoute.PATCH, { method: "PATCH", params: { roomId: room }, body: { lengthM: 6.1, version: await roomVersion(room) } });
    expect(res.status).toBe(200);
    const after = await testDb().selectFrom("scenarios").select(["id", "inputs_hash", "engine_version", "results"]).where("room_id", "=", room).execute();
    expect(after).toHaveLength(before.length);
    for (const a of after) {
      const b = before.find((x) => x.id === a.id)!;
      const fresh = await freshAnalysis(a.id);
      expect(a.engine_version).toBe(ENGINE_VERSION);
      expect(a.inputs_hash).toBe(fresh.inputsHash);
      expect(a.inputs_hash).not.toBe(b.inputs_hash);
      expect((a.results as { room: { volumeM3: number } }).room.volumeM3).toBeCloseTo(6.1 * 4.1 * 2.5, 9);
      expect(a.results).toEqual(JSON.parse(JSON.stringify(fresh)));
    }
  });

  it("shrinking the room past a seat → 400 naming it; the room and its results stay", async () => {
    const v = await roomVersion(room);
    const hashes = await testDb().selectFrom("scenarios").select(["id", "inputs_hash"]).where("room_id", "=", room).orderBy("id").execute();
    const res = await callRoute(roomRoute.PATCH, { method: "PATCH", params: { roomId: room }, body: { lengthM: 4.0, version: v } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.lengthM.join(" ")).toMatch(/Back left/);
    expect(await roomVersion(room)).toBe(v);
    expect(await testDb().selectFrom("scenarios").select(["id", "inputs_hash"]).where("room_id", "=", room).orderBy("id").execute()).toEqual(hashes);
  });

  it("a stored result of another engine version is recomputed on read and stored again", async () => {
    const s = await scenarioByName(room, "Untreated room");
    await testDb().updateTable("scenarios").set({ engine_version: "analysis-old", results: JSON.stringify({ stale: true }) }).where("id", "=", s.id).execute();
    const res = await callRoute(scenarioRoute.GET, { params: { scenarioId: s.id } });
    expect(res.status).toBe(200);
    expect(res.json.scenario.results.engineVersion).toBe(ENGINE_VERSION);
    const row = await scenarioByName(room, "Untreated room");
    expect(row.engine_version).toBe(ENGINE_VERSION);
    expect(row.results).toEqual(JSON.parse(JSON.stringify(await freshAnalysis(s.id))));
    expect(row.version).toBe(s.version); // derived data: the user's version is untouched
  });

  it("a new room gets six assumed surfaces and an analysed baseline", async () => {
    const project = await testDb().selectFrom("rooms").select("project_id").where("id", "=", room).executeTakeFirstOrThrow();
    const { POST } = await import("@/app/api/v1/projects/[projectId]/rooms/route");
    const created = await callRoute(POST, { params: { projectId: project.project_id }, body: { name: "Spare room", lengthM: 3.5, widthM: 3, heightM: 2.4 } });
    expect(created.status).toBe(201);
    const w = (await callRoute(workspaceRoute.GET, { params: { roomId: created.json.room.id } })).json.workspace;
    expect(w.surfaces).toHaveLength(6);
    expect(w.surfaces.every((s: { assumed: boolean }) => s.assumed)).toBe(true);
    expect(w.scenarios).toHaveLength(1);
    expect(w.scenarios[0].isBaseline).toBe(true);
    expect(w.scenarios[0].engineVersion).toBe(ENGINE_VERSION);
  });
});

describe("build library", () => {
  it("create, refuse a duplicate name, stale patch → 409, delete → 204 (items keep their copy)", async () => {
    const spec = { kind: "membrane", massKgM2: 12, cavityDepthM: 0.15 };
    const created = await callRoute(buildsRoute.POST, { body: { name: "Test membrane", spec } });
    expect(created.status).toBe(201);
    expect(created.json.build.spec.resistanceRatio).toBe(0.2);
    const dup = await callRoute(buildsRoute.POST, { body: { name: "test MEMBRANE", spec } });
    expect(dup.status).toBe(400);
    expect(dup.json.error.fields.name).toBeDefined();
    const id = created.json.build.id;
    expect((await callRoute(buildRoute.PATCH, { method: "PATCH", params: { buildId: id }, body: { notes: "n", version: 1 } })).status).toBe(200);
    expect((await callRoute(buildRoute.PATCH, { method: "PATCH", params: { buildId: id }, body: { notes: "m", version: 1 } })).status).toBe(409);
    const list = await callRoute(buildsRoute.GET);
    expect(list.json.builds.map((b: { name: string }) => b.name)).toContain("Test membrane");
    expect((await callRoute(buildRoute.DELETE, { method: "DELETE", params: { buildId: id } })).status).toBe(204);
    expect((await callRoute(buildRoute.GET, { params: { buildId: id } })).status).toBe(404);
  });
});

describe("OpenAPI", () => {
  it("documents the workspace endpoints", async () => {
    const doc = await (await openapiRoute.GET()).json();
    for (const p of ["/rooms/{roomId}/workspace", "/rooms/{roomId}/surfaces", "/rooms/{roomId}/positions/{positionId}", "/scenarios/{scenarioId}/items/{itemId}", "/builds/{buildId}"]) expect(doc.paths[p]).toBeDefined();
    expect(doc.paths["/rooms/{roomId}/surfaces"].put.requestBody).toBeDefined();
  });
});
