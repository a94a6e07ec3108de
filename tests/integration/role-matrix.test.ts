// Role × action matrix: every route handler and server action of the foundation, for each demo
// role, allowed or denied as lib/auth/permissions.ts designs it. Runs on the real test database.
import { beforeAll, describe, expect, it } from "vitest";
import * as memberRoute from "@/app/api/v1/members/[userId]/route";
import * as membersRoute from "@/app/api/v1/members/route";
import * as meRoute from "@/app/api/v1/me/route";
import * as projectRoute from "@/app/api/v1/projects/[projectId]/route";
import * as projectRoomsRoute from "@/app/api/v1/projects/[projectId]/rooms/route";
import * as projectsRoute from "@/app/api/v1/projects/route";
import * as roomRoute from "@/app/api/v1/rooms/[roomId]/route";
import * as openapiRoute from "@/app/api/v1/openapi.json/route";
import { setUnitSystemAction } from "@/app/(app)/actions";
import { inviteMemberAction, updateMemberAction } from "@/app/(app)/members/actions";
import { createProjectAction, createRoomAction, deleteProjectAction, deleteRoomAction, updateProjectAction, updateRoomAction } from "@/app/(app)/projects/actions";
import { actAs, callRoute, runAction, userIdOf, type DemoWho } from "../support/act-as";
import { resetTables, testDb } from "./support/db";

const WHO: DemoWho[] = ["owner", "engineer", "builder", "client", "client2", "anonymous"];

let hollis: string; // client's project, builder assigned
let vale: string; // client2's project, no builder
let hollisRoom: string;

async function projectId(name: string) {
  return (await testDb().selectFrom("projects").select("id").where("name", "=", name).executeTakeFirstOrThrow()).id;
}
async function version(table: "projects" | "rooms", id: string) {
  return (await testDb().selectFrom(table).select("version").where("id", "=", id).executeTakeFirstOrThrow()).version;
}
async function throwawayProject() {
  const owner = await userIdOf("owner");
  const firm = await testDb().selectFrom("users").select("firm_id").where("id", "=", owner).executeTakeFirstOrThrow();
  return (await testDb().insertInto("projects").values({ firm_id: firm.firm_id, name: "Throwaway", client_name: "Nobody" }).returning("id").executeTakeFirstOrThrow()).id;
}
async function throwawayRoom(project: string) {
  return (await testDb().insertInto("rooms").values({ project_id: project, name: "Spare", length_m: 3, width_m: 3, height_m: 2.4 }).returning("id").executeTakeFirstOrThrow()).id;
}

beforeAll(async () => {
  await resetTables();
  hollis = await projectId("Hollis media room");
  vale = await projectId("Vale home studio");
  hollisRoom = (await testDb().selectFrom("rooms").select("id").where("project_id", "=", hollis).executeTakeFirstOrThrow()).id;
});

const room = { name: "Matrix room", lengthM: 4, widthM: 3, heightM: 2.5 };

// Expected HTTP status per role for each route handler call (anonymous is always 401).
type Row = { name: string; expect: Record<Exclude<DemoWho, "anonymous">, number>; call: () => Promise<{ status: number }> };

const rows: Row[] = [
  { name: "GET /me", expect: { owner: 200, engineer: 200, builder: 200, client: 200, client2: 200 }, call: () => callRoute(meRoute.GET) },
  { name: "GET /projects", expect: { owner: 200, engineer: 200, builder: 200, client: 200, client2: 200 }, call: () => callRoute(projectsRoute.GET) },
  { name: "POST /projects", expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 403 }, call: () => callRoute(projectsRoute.POST, { body: { name: "New", clientName: "Someone" } }) },
  { name: "GET /projects/:hollis", expect: { owner: 200, engineer: 200, builder: 200, client: 200, client2: 404 }, call: () => callRoute(projectRoute.GET, { params: { projectId: hollis } }) },
  { name: "GET /projects/:vale", expect: { owner: 200, engineer: 200, builder: 404, client: 404, client2: 200 }, call: () => callRoute(projectRoute.GET, { params: { projectId: vale } }) },
  {
    name: "PATCH /projects/:hollis",
    expect: { owner: 200, engineer: 200, builder: 403, client: 403, client2: 404 },
    call: async () => callRoute(projectRoute.PATCH, { method: "PATCH", params: { projectId: hollis }, body: { notes: "matrix", version: await version("projects", hollis) } }),
  },
  {
    name: "DELETE /projects/:id",
    expect: { owner: 204, engineer: 204, builder: 404, client: 404, client2: 404 },
    call: async () => callRoute(projectRoute.DELETE, { method: "DELETE", params: { projectId: await throwawayProject() } }),
  },
  { name: "GET /projects/:hollis/rooms", expect: { owner: 200, engineer: 200, builder: 200, client: 200, client2: 404 }, call: () => callRoute(projectRoomsRoute.GET, { params: { projectId: hollis } }) },
  { name: "POST /projects/:hollis/rooms", expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 404 }, call: () => callRoute(projectRoomsRoute.POST, { params: { projectId: hollis }, body: room }) },
  { name: "GET /rooms/:hollisRoom", expect: { owner: 200, engineer: 200, builder: 200, client: 200, client2: 404 }, call: () => callRoute(roomRoute.GET, { params: { roomId: hollisRoom } }) },
  {
    name: "PATCH /rooms/:hollisRoom",
    expect: { owner: 200, engineer: 200, builder: 403, client: 403, client2: 404 },
    call: async () => callRoute(roomRoute.PATCH, { method: "PATCH", params: { roomId: hollisRoom }, body: { notes: "matrix", version: await version("rooms", hollisRoom) } }),
  },
  {
    name: "DELETE /rooms/:id",
    expect: { owner: 204, engineer: 204, builder: 403, client: 403, client2: 404 },
    call: async () => callRoute(roomRoute.DELETE, { method: "DELETE", params: { roomId: await throwawayRoom(hollis) } }),
  },
  { name: "GET /members", expect: { owner: 200, engineer: 200, builder: 403, client: 403, client2: 403 }, call: () => callRoute(membersRoute.GET) },
  {
    name: "POST /members",
    expect: { owner: 201, engineer: 403, builder: 403, client: 403, client2: 403 },
    call: () => callRoute(membersRoute.POST, { body: { email: `new-${Math.random().toString(36).slice(2)}@invented.example`, name: "New Person", role: "builder" } }),
  },
  {
    name: "PATCH /members/:builder",
    expect: { owner: 200, engineer: 403, builder: 403, client: 403, client2: 403 },
    call: async () => callRoute(memberRoute.PATCH, { method: "PATCH", params: { userId: await userIdOf("builder") }, body: { role: "builder" } }),
  },
];

describe("route handlers × roles", () => {
  for (const row of rows) {
    for (const who of WHO) {
      const expected = who === "anonymous" ? 401 : row.expect[who];
      it(`${row.name} as ${who} → ${expected}`, async () => {
        await actAs(who);
        const res = await row.call();
        expect(res.status).toBe(expected);
      });
    }
  }

  it("GET /openapi.json is public", async () => {
    await actAs("anonymous");
    const res = await openapiRoute.GET();
    expect(res.status).toBe(200);
  });

  it("GET /projects lists only what each role may see", async () => {
    const names = async (who: DemoWho) => {
      await actAs(who);
      const res = await callRoute(projectsRoute.GET);
      return (res as { json: { projects: { name: string }[] } }).json.projects.map((p) => p.name).sort();
    };
    expect(await names("builder")).toEqual(["Hollis media room"]);
    expect(await names("client")).toEqual(["Hollis media room"]);
    expect(await names("client2")).toEqual(["Vale home studio"]);
    expect((await names("engineer")).length).toBeGreaterThanOrEqual(2);
  });

  it("a malformed id is a 404, not a database error", async () => {
    await actAs("owner");
    expect((await callRoute(projectRoute.GET, { params: { projectId: "not-a-uuid" } })).status).toBe(404);
    expect((await callRoute(roomRoute.GET, { params: { roomId: "%FF" } })).status).toBe(404);
  });
});

// Server actions: { ok } or the error code they return; anonymous callers are sent to /sign-in.
type ActionRow = { name: string; allowed: DemoWho[]; denied: Partial<Record<DemoWho, string>>; call: () => Promise<unknown> };

const actionRows: ActionRow[] = [
  { name: "createProjectAction", allowed: ["owner", "engineer"], denied: { builder: "forbidden", client: "forbidden", client2: "forbidden" }, call: () => createProjectAction({ name: "Via action", clientName: "Someone" }) },
  {
    name: "updateProjectAction(hollis)",
    allowed: ["owner", "engineer"],
    denied: { builder: "forbidden", client: "forbidden", client2: "not_found" },
    call: async () => updateProjectAction(hollis, { notes: "via action", version: await version("projects", hollis) }),
  },
  { name: "deleteProjectAction", allowed: ["owner", "engineer"], denied: { builder: "not_found", client: "not_found", client2: "not_found" }, call: async () => deleteProjectAction(await throwawayProject()) },
  { name: "createRoomAction(hollis)", allowed: ["owner", "engineer"], denied: { builder: "forbidden", client: "forbidden", client2: "not_found" }, call: () => createRoomAction(hollis, room) },
  {
    name: "updateRoomAction(hollisRoom)",
    allowed: ["owner", "engineer"],
    denied: { builder: "forbidden", client: "forbidden", client2: "not_found" },
    call: async () => updateRoomAction(hollisRoom, { notes: "via action", version: await version("rooms", hollisRoom) }),
  },
  { name: "deleteRoomAction", allowed: ["owner", "engineer"], denied: { builder: "forbidden", client: "forbidden", client2: "not_found" }, call: async () => deleteRoomAction(await throwawayRoom(hollis), hollis) },
  {
    name: "inviteMemberAction",
    allowed: ["owner"],
    denied: { engineer: "forbidden", builder: "forbidden", client: "forbidden", client2: "forbidden" },
    call: () => inviteMemberAction({ email: `act-${Math.random().toString(36).slice(2)}@invented.example`, name: "Invited", role: "engineer" }),
  },
  {
    name: "updateMemberAction(builder)",
    allowed: ["owner"],
    denied: { engineer: "forbidden", builder: "forbidden", client: "forbidden", client2: "forbidden" },
    call: async () => updateMemberAction(await userIdOf("builder"), { role: "builder" }),
  },
];

describe("server actions × roles", () => {
  for (const row of actionRows) {
    for (const who of WHO) {
      const allowed = row.allowed.includes(who);
      const label = who === "anonymous" ? "redirect to /sign-in" : allowed ? "ok" : row.denied[who];
      it(`${row.name} as ${who} → ${label}`, async () => {
        await actAs(who);
        const result = (await runAction(row.call)) as { ok?: boolean; code?: string; redirect?: string };
        if (who === "anonymous") expect(result.redirect).toBe("/sign-in");
        else if (allowed) expect(result.ok).toBe(true);
        else {
          expect(result.ok).toBe(false);
          expect(result.code).toBe(row.denied[who]);
        }
      });
    }
  }

  it("setUnitSystemAction changes only the caller's own preference", async () => {
    await actAs("client");
    await setUnitSystemAction("metric");
    const rows = await testDb().selectFrom("users").select(["email", "unit_system"]).execute();
    const client = rows.find((r) => r.email === "client@larchmere.example");
    expect(client?.unit_system).toBe("metric");
    expect(rows.find((r) => r.email === "client2@larchmere.example")?.unit_system).toBe("imperial");
  });
});
