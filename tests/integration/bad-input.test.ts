// Bad input → 400 with a field message, and nothing half-written in the database.
import { beforeAll, describe, expect, it } from "vitest";
import * as projectRoute from "@/app/api/v1/projects/[projectId]/route";
import * as projectRoomsRoute from "@/app/api/v1/projects/[projectId]/rooms/route";
import * as projectsRoute from "@/app/api/v1/projects/route";
import { createRoomAction } from "@/app/(app)/projects/actions";
import { actAs, callRoute } from "../support/act-as";
import { resetTables, testDb } from "./support/db";

let hollis: string;
const counts = async () => ({
  projects: Number((await testDb().selectFrom("projects").select(testDb().fn.countAll().as("n")).executeTakeFirstOrThrow()).n),
  rooms: Number((await testDb().selectFrom("rooms").select(testDb().fn.countAll().as("n")).executeTakeFirstOrThrow()).n),
});

beforeAll(async () => {
  await resetTables();
  hollis = (await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow()).id;
  await actAs("engineer");
});

describe("POST /projects with bad input", () => {
  it("malformed JSON → 400 bad_request", async () => {
    const before = await counts();
    const res = await callRoute(projectsRoute.POST, { rawBody: '{"name": "x",' });
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe("bad_request");
    expect(await counts()).toEqual(before);
  });

  it("missing fields → 400 naming each field", async () => {
    const res = await callRoute(projectsRoute.POST, { body: {} });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toEqual(expect.arrayContaining(["name", "clientName"]));
  });

  it("wrong types → 400 with the field", async () => {
    const res = await callRoute(projectsRoute.POST, { body: { name: 42, clientName: ["x"] } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.name).toBeDefined();
    expect(res.json.error.fields.clientName).toBeDefined();
  });

  it("a huge string → 400 (field too long) and a huge body → 413", async () => {
    const res = await callRoute(projectsRoute.POST, { body: { name: "x".repeat(10_000), clientName: "A" } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.name[0]).toMatch(/at most 120/);
    const big = await callRoute(projectsRoute.POST, { body: { name: "x", clientName: "y", notes: "z".repeat(1_100_000) } });
    expect(big.status).toBe(413);
  });

  it("a non-JSON content type → 415", async () => {
    const res = await callRoute(projectsRoute.POST, { rawBody: "name=x", contentType: "application/x-www-form-urlencoded" });
    expect(res.status).toBe(415);
  });

  it("a client user id from outside the firm → 400 on clientUserId, nothing saved", async () => {
    const before = await counts();
    const res = await callRoute(projectsRoute.POST, { body: { name: "x", clientName: "y", clientUserId: "nobody" } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.clientUserId).toBeDefined();
    expect(await counts()).toEqual(before);
  });
});

describe("rooms with absurd sizes", () => {
  for (const [label, body, field] of [
    ["negative length", { name: "R", lengthM: -4, widthM: 3, heightM: 2.5 }, "lengthM"],
    ["zero width", { name: "R", lengthM: 4, widthM: 0, heightM: 2.5 }, "widthM"],
    ["a 1 km height", { name: "R", lengthM: 4, widthM: 3, heightM: 1000 }, "heightM"],
    ["a string length", { name: "R", lengthM: "4 m", widthM: 3, heightM: 2.5 }, "lengthM"],
    ["humidity 150 %", { name: "R", lengthM: 4, widthM: 3, heightM: 2.5, humidityPct: 150 }, "humidityPct"],
  ] as const) {
    it(`${label} → 400 on ${field}, nothing saved`, async () => {
      const before = await counts();
      const res = await callRoute(projectRoomsRoute.POST, { params: { projectId: hollis }, body });
      expect(res.status).toBe(400);
      expect(res.json.error.fields[field]?.[0]).toBeTruthy();
      expect(await counts()).toEqual(before);
    });
  }

  it("the server action answers the same field errors", async () => {
    const before = await counts();
    const result = await createRoomAction(hollis, { name: "R", lengthM: -1, widthM: 3, heightM: 2 });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.fields?.lengthM?.[0]).toMatch(/at least/);
    expect(await counts()).toEqual(before);
  });
});

describe("optimistic concurrency", () => {
  it("a stale version → 409 and the newer save stays", async () => {
    const v = (await testDb().selectFrom("projects").select("version").where("id", "=", hollis).executeTakeFirstOrThrow()).version;
    const first = await callRoute(projectRoute.PATCH, { method: "PATCH", params: { projectId: hollis }, body: { notes: "first", version: v } });
    expect(first.status).toBe(200);
    const stale = await callRoute(projectRoute.PATCH, { method: "PATCH", params: { projectId: hollis }, body: { notes: "second", version: v } });
    expect(stale.status).toBe(409);
    expect(stale.json.error.code).toBe("conflict");
    const row = await testDb().selectFrom("projects").select("notes").where("id", "=", hollis).executeTakeFirstOrThrow();
    expect(row.notes).toBe("first");
  });
});
