// Role × action matrix for the room workspace: every new route handler and server action, for each
// demo role, allowed or denied as lib/auth/permissions.ts designs it (workspace.*, scenario.*,
// treatment.update, library.*). Builders read; clients of the project get 403, of another 404.
import { beforeAll, describe, expect, it } from "vitest";
import * as analysisRoute from "@/app/api/v1/rooms/[roomId]/analysis/route";
import * as positionRoute from "@/app/api/v1/rooms/[roomId]/positions/[positionId]/route";
import * as positionsRoute from "@/app/api/v1/rooms/[roomId]/positions/route";
import * as roomScenariosRoute from "@/app/api/v1/rooms/[roomId]/scenarios/route";
import * as surfacesRoute from "@/app/api/v1/rooms/[roomId]/surfaces/route";
import * as workspaceRoute from "@/app/api/v1/rooms/[roomId]/workspace/route";
import * as duplicateRoute from "@/app/api/v1/scenarios/[scenarioId]/duplicate/route";
import * as itemsRoute from "@/app/api/v1/scenarios/[scenarioId]/items/route";
import * as scenarioRoute from "@/app/api/v1/scenarios/[scenarioId]/route";
import * as buildsRoute from "@/app/api/v1/builds/route";
import { addPositionAction, addTreatmentItemAction, createScenarioAction, movePositionAction, saveBuildAction, saveSurfacesAction } from "@/app/(app)/rooms/[roomId]/actions";
import { actAs, callRoute, runAction, type DemoWho } from "../support/act-as";
import { resetTables, testDb } from "./support/db";
import { hollisRoomId, PANEL_ITEM, roomVersion, scenarioByName, scenarioVersion } from "./workspace-support";

const WHO: DemoWho[] = ["owner", "engineer", "builder", "client", "client2", "anonymous"];
type Who = Exclude<DemoWho, "anonymous">;
let room: string;
let scenario: string;
let sub: string;

beforeAll(async () => {
  await resetTables();
  room = await hollisRoomId();
  scenario = (await scenarioByName(room, "Panels and corner traps")).id;
  sub = (await testDb().selectFrom("room_positions").select("id").where("room_id", "=", room).where("name", "=", "Rear subwoofer").executeTakeFirstOrThrow()).id;
});

const READ = { owner: 200, engineer: 200, builder: 200, client: 403, client2: 404 };
const rows: { name: string; expect: Record<Who, number>; call: () => Promise<{ status: number }> }[] = [
  { name: "GET /rooms/:id/workspace", expect: READ, call: () => callRoute(workspaceRoute.GET, { params: { roomId: room } }) },
  { name: "GET /rooms/:id/surfaces", expect: READ, call: () => callRoute(surfacesRoute.GET, { params: { roomId: room } }) },
  { name: "GET /rooms/:id/positions", expect: READ, call: () => callRoute(positionsRoute.GET, { params: { roomId: room } }) },
  { name: "GET /rooms/:id/scenarios", expect: READ, call: () => callRoute(roomScenariosRoute.GET, { params: { roomId: room } }) },
  { name: "GET /rooms/:id/analysis", expect: READ, call: () => callRoute(analysisRoute.GET, { params: { roomId: room } }) },
  { name: "GET /scenarios/:id", expect: READ, call: () => callRoute(scenarioRoute.GET, { params: { scenarioId: scenario } }) },
  { name: "GET /scenarios/:id/items", expect: READ, call: () => callRoute(itemsRoute.GET, { params: { scenarioId: scenario } }) },
  {
    name: "PATCH /rooms/:id/positions/:sub",
    expect: { owner: 200, engineer: 200, builder: 403, client: 403, client2: 404 },
    call: async () => callRoute(positionRoute.PATCH, { method: "PATCH", params: { roomId: room, positionId: sub }, body: { xM: 5.4, version: await roomVersion(room) } }),
  },
  {
    name: "POST /rooms/:id/scenarios",
    expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 404 },
    call: () => callRoute(roomScenariosRoute.POST, { params: { roomId: room }, body: { name: "Matrix scenario" } }),
  },
  {
    name: "PATCH /scenarios/:id",
    expect: { owner: 200, engineer: 200, builder: 403, client: 403, client2: 404 },
    call: async () => callRoute(scenarioRoute.PATCH, { method: "PATCH", params: { scenarioId: scenario }, body: { notes: "matrix", version: await scenarioVersion(scenario) } }),
  },
  {
    name: "POST /scenarios/:id/duplicate",
    expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 404 },
    call: () => callRoute(duplicateRoute.POST, { params: { scenarioId: scenario }, body: {} }),
  },
  {
    name: "POST /scenarios/:id/items",
    expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 404 },
    call: async () => callRoute(itemsRoute.POST, { params: { scenarioId: scenario }, body: { ...PANEL_ITEM, version: await scenarioVersion(scenario) } }),
  },
  { name: "GET /builds", expect: { owner: 200, engineer: 200, builder: 200, client: 403, client2: 403 }, call: () => callRoute(buildsRoute.GET) },
  {
    name: "POST /builds",
    expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 403 },
    call: () => callRoute(buildsRoute.POST, { body: { name: `Matrix build ${Math.random().toString(36).slice(2)}`, spec: { kind: "membrane", massKgM2: 8, cavityDepthM: 0.12 } } }),
  },
];

describe("workspace route handlers × roles", () => {
  for (const row of rows) {
    for (const who of WHO) {
      const expected = who === "anonymous" ? 401 : row.expect[who];
      it(`${row.name} as ${who} → ${expected}`, async () => {
        await actAs(who);
        expect((await row.call()).status).toBe(expected);
      });
    }
  }
});

// Server actions answer the same decisions as ActionResult codes; anonymous is sent to sign-in.
const CODE: Record<number, string> = { 403: "forbidden", 404: "not_found" };
const actions: { name: string; expect: Record<Who, "ok" | 403 | 404>; call: () => Promise<unknown> }[] = [
  {
    name: "movePositionAction",
    expect: { owner: "ok", engineer: "ok", builder: 403, client: 403, client2: 404 },
    call: async () => {
      const v = await roomVersion(room);
      return movePositionAction(room, sub, { xM: 5.3, yM: 2.0, zM: 0.3, version: v });
    },
  },
  {
    name: "addPositionAction",
    expect: { owner: "ok", engineer: "ok", builder: 403, client: 403, client2: 404 },
    call: async () => {
      const v = await roomVersion(room);
      return addPositionAction(room, { kind: "seat", name: "Matrix seat", xM: 5, yM: 3, zM: 1.1, version: v });
    },
  },
  {
    name: "saveSurfacesAction",
    expect: { owner: "ok", engineer: "ok", builder: 403, client: 403, client2: 404 },
    call: async () => {
      const v = await roomVersion(room);
      const rows = await testDb().selectFrom("room_surfaces").selectAll().where("room_id", "=", room).execute();
      return saveSurfacesAction(room, { version: v, surfaces: rows.map((r) => ({ surface: r.surface, finish: r.finish, openings: r.openings })) });
    },
  },
  { name: "createScenarioAction", expect: { owner: "ok", engineer: "ok", builder: 403, client: 403, client2: 404 }, call: () => createScenarioAction(room, { name: "Matrix action scenario" }) },
  {
    name: "addTreatmentItemAction",
    expect: { owner: "ok", engineer: "ok", builder: 403, client: 403, client2: 404 },
    call: async () => {
      const v = await scenarioVersion(scenario);
      return addTreatmentItemAction(scenario, { ...PANEL_ITEM, version: v });
    },
  },
  {
    name: "saveBuildAction",
    expect: { owner: "ok", engineer: "ok", builder: 403, client: 403, client2: 403 },
    call: () => saveBuildAction({ name: `Matrix action build ${Math.random().toString(36).slice(2)}`, spec: { kind: "membrane", massKgM2: 8, cavityDepthM: 0.12 } }),
  },
];

describe("workspace server actions × roles", () => {
  for (const a of actions) {
    for (const who of WHO) {
      const expected = who === "anonymous" ? "sign-in" : a.expect[who];
      it(`${a.name} as ${who} → ${expected}`, async () => {
        await actAs(who);
        const res = (await runAction(a.call)) as { ok?: boolean; code?: string; redirect?: string };
        if (expected === "sign-in") expect(res.redirect).toBe("/sign-in");
        else if (expected === "ok") expect(res.ok).toBe(true);
        else expect(res).toMatchObject({ ok: false, code: CODE[expected] });
      });
    }
  }
});
