// POST /api/v1/sizer and POST /api/v1/reflections on the demo media room (real test database): the
// answers, bad input with 400 and its fields, and who may ask (client of another project: 404).
import { beforeAll, describe, expect, it } from "vitest";
import * as reflections from "@/app/api/v1/reflections/route";
import * as sizer from "@/app/api/v1/sizer/route";
import { actAs, callRoute } from "../support/act-as";
import { resetTables, testDb } from "./support/db";
import { hollisRoomId, scenarioByName, valeRoomId } from "./workspace-support";

let room: string;
let panels: string;
let baseline: string;
const LIMITS = { maxDepthM: 0.6, verticalCorners: ["front-left", "front-right", "rear-left", "rear-right"], ceilingEdges: [{ edge: "rear", lengthM: 4.1 }], wallAreaM2: 4 };

beforeAll(async () => {
  await resetTables();
  room = await hollisRoomId();
  panels = (await scenarioByName(room, "Panels at reflection points")).id;
  baseline = (await testDb().selectFrom("scenarios").select("id").where("room_id", "=", room).where("is_baseline", "=", true).executeTakeFirstOrThrow()).id;
  await actAs("engineer");
});

describe("POST /sizer on the demo media room", () => {
  it("proposes treatment on top of a scenario, starting from that scenario's stored decay, reproducibly", async () => {
    const body = { roomId: room, scenarioId: panels, objective: "cost", limits: LIMITS };
    const a = await callRoute(sizer.POST, { body });
    expect(a.status).toBe(200);
    const p = a.json.proposal;
    expect(p.items.length).toBeGreaterThan(0);
    expect(p.bands.map((b: { nominalHz: number }) => b.nominalHz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000]);
    // before = the scenario's treated Eyring time as lib/analysis stored it (same room, items and air); 1e-9 s
    const stored = await testDb().selectFrom("scenarios").select("results").where("id", "=", panels).executeTakeFirstOrThrow();
    const eyring = (stored.results as { reverb: { treated: { eyringS: number[] } } }).reverb.treated.eyringS;
    p.bands.forEach((b: { beforeS: number }, i: number) => expect(b.beforeS).toBeCloseTo(eyring[i]!, 9));
    // added absorption lowers the sized bands (Eyring decreases monotonically in A)
    for (const b of p.bands.slice(0, 3)) expect(b.afterS).toBeLessThan(b.beforeS);
    expect(p.caveat).toMatch(/Schroeder frequency/);
    expect(p.modal.frequenciesHz.length).toBe(p.modal.beforeDb.length);
    const b = await callRoute(sizer.POST, { body });
    expect(b.json).toEqual(a.json);
  });

  it("keeps every item within the user's depth limit and counts within the free corners", async () => {
    const res = await callRoute(sizer.POST, { body: { roomId: room, scenarioId: panels, objective: "depth", limits: { ...LIMITS, maxDepthM: 0.4, verticalCorners: ["rear-left", "rear-right"] } } });
    expect(res.status).toBe(200);
    for (const it of res.json.proposal.items) expect(it.projectionM).toBeLessThanOrEqual(0.4 + 1e-9);
    expect(res.json.proposal.totals.verticalCorners).toBeLessThanOrEqual(2);
  });

  it("says when the limits make the target unreachable (nothing allowed)", async () => {
    const res = await callRoute(sizer.POST, { body: { roomId: room, scenarioId: baseline, objective: "count", limits: { maxDepthM: 0, verticalCorners: [], ceilingEdges: [], wallAreaM2: 0 } } });
    expect(res.status).toBe(200);
    expect(res.json.proposal.items).toEqual([]);
    expect(res.json.proposal.reached).toBe(false);
    expect(res.json.proposal.binding.length).toBeGreaterThan(0);
  });

  it("answers an unknown objective and a negative depth with 400 naming the fields", async () => {
    const res = await callRoute(sizer.POST, { body: { roomId: room, scenarioId: panels, objective: "fastest", limits: { ...LIMITS, maxDepthM: -1 } } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toEqual(expect.arrayContaining(["objective", "limits.maxDepthM"]));
  });

  it("answers a scenario of another room with 400 on scenarioId", async () => {
    const other = await valeRoomId();
    const res = await callRoute(sizer.POST, { body: { roomId: other, scenarioId: panels, objective: "cost", limits: LIMITS } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("scenarioId");
  });

  it("hides the room from a client of another project (404) and refuses the project's client (403)", async () => {
    await actAs("client2");
    expect((await callRoute(sizer.POST, { body: { roomId: room, scenarioId: panels, objective: "cost", limits: LIMITS } })).status).toBe(404);
    await actAs("client");
    expect((await callRoute(sizer.POST, { body: { roomId: room, scenarioId: panels, objective: "cost", limits: LIMITS } })).status).toBe(403);
    await actAs("anonymous");
    expect((await callRoute(sizer.POST, { body: { roomId: room, scenarioId: panels, objective: "cost", limits: LIMITS } })).status).toBe(401);
    await actAs("engineer");
  });
});

describe("POST /reflections on the demo media room", () => {
  it("gives every speaker × seat × surface point, with the left-wall point of the main seat where mirror images put it", async () => {
    const res = await callRoute(reflections.POST, { body: { roomId: room } });
    expect(res.status).toBe(200);
    // 2 main speakers × 5 seats × 6 surfaces, none of them on a surface
    expect(res.json.points).toHaveLength(60);
    // hand computation (image source): speaker (0.35, 1.0, 1.1) mirrored in y = 0 to (0.35, −1.0, 1.1); the line to the
    // seat (3.2, 2.05, 1.1) crosses y = 0 at x = 0.35 + 2.85 · 1.0/3.05 = 1.2844 m, z = 1.1 m; tolerance 1e-4 m
    const p = res.json.points.find((x: { speakerId: string; seatId: string; surface: string }) => x.speakerId === "Front left speaker" && x.seatId === "Front centre" && x.surface === "left");
    expect(p.point[0]).toBeCloseTo(0.35 + (2.85 * 1.0) / 3.05, 4);
    expect(p.point[1]).toBeCloseTo(0, 9);
    expect(p.point[2]).toBeCloseTo(1.1, 9);
    // extra path = reflected − direct; direct = √(2.85² + 1.05²) (hand), reflected = √(2.85² + 3.05²)
    expect(p.directPathM).toBeCloseTo(Math.hypot(2.85, 1.05), 6);
    expect(p.reflectedPathM).toBeCloseTo(Math.hypot(2.85, 3.05), 6);
    expect(res.json.zones.length).toBeGreaterThan(0);
    for (const set of res.json.panels) expect(set.count).toBe(set.placements.length);
  });

  it("lists a panel that would cover the rear door as a placement problem", async () => {
    // a 1.2 × 0.6 m panel with its lower corner at u = 0.5, v = 1.0 on the rear wall overlaps the door (u 0.2–1.1, v 0–2.03)
    const res = await callRoute(reflections.POST, { body: { roomId: room, items: [{ id: "test panel", surface: "rear", uM: 0.5, vM: 1.0, widthM: 1.2, heightM: 0.6 }] } });
    expect(res.status).toBe(200);
    expect(res.json.problems.some((p: { kind: string; itemIds: string[] }) => p.kind === "covers-opening" && p.itemIds.includes("test panel"))).toBe(true);
  });

  it("answers a bad margin and a room id that is not a UUID with 400 and the fields", async () => {
    const res = await callRoute(reflections.POST, { body: { roomId: "kitchen", marginM: -1 } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toEqual(expect.arrayContaining(["roomId", "marginM"]));
  });

  it("hides the room from a client of another project (404)", async () => {
    await actAs("client2");
    expect((await callRoute(reflections.POST, { body: { roomId: room } })).status).toBe(404);
    await actAs("engineer");
  });
});
