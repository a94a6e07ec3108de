// Build sheet, price list and site progress on the real test database: who may read and change what,
// the sheet's totals against lib/build-sheet for the demo scenario, and the builder's marks reaching
// the engineer. Routes and server actions.
import { beforeAll, describe, expect, it } from "vitest";
import { markProgressAction } from "@/app/(app)/projects/[projectId]/build-sheet/actions";
import { addTreatmentItemAction } from "@/app/(app)/rooms/[roomId]/actions";
import { addProposalAction } from "@/app/(app)/rooms/[roomId]/design/actions";
import { chooseBuildScenarioAction } from "@/app/(app)/rooms/[roomId]/plan/actions";
import { savePriceListAction } from "@/app/(app)/settings/prices/actions";
import * as sheetRoute from "@/app/api/v1/projects/[projectId]/build-sheet/route";
import * as priceRoute from "@/app/api/v1/price-list/route";
import * as progressRoute from "@/app/api/v1/treatment-items/[itemId]/progress/route";
import { groupItems, jobOf } from "@/lib/build-sheet/job-from-items";
import { proposalItems } from "@/components/design/proposal-items";
import { loadItems } from "@/db/queries/analysis";
import { DEMO_PRICE_LIST } from "@/db/seed-data";
import { buildSheet } from "@/lib/build-sheet";
import { defaultCatalogue, sizeTreatment } from "@/lib/sizer";
import { actAs, callRoute, runAction } from "../support/act-as";
import { resetTables, testDb } from "./support/db";
import { hollisRoomId, PANEL_ITEM, scenarioByName, scenarioVersion, valeRoomId } from "./workspace-support";

type R = { ok: boolean; code?: string; message?: string; fields?: Record<string, string[]>; data?: any };
const act = async (fn: () => Promise<unknown>) => (await runAction(fn)) as R;
const today = new Date().toISOString().slice(0, 10);

let room: string;
let hollis: string;
let vale: string;

async function projectOf(name: string) {
  return (await testDb().selectFrom("projects").select("id").where("name", "=", name).executeTakeFirstOrThrow()).id;
}

beforeAll(async () => {
  await resetTables();
  room = await hollisRoomId();
  hollis = await projectOf("Hollis media room");
  vale = await projectOf("Vale home studio");
});

describe("GET /projects/{projectId}/build-sheet", () => {
  it("lists the latest treated scenario of the demo room with the sheet lib/build-sheet gives for its items at the demo price list", async () => {
    await actAs("builder");
    const res = await callRoute(sheetRoute.GET, { params: { projectId: hollis } });
    expect(res.status).toBe(200);
    const scenario = await scenarioByName(room, "Panels and corner traps");
    expect(res.json.rooms[0].scenario).toMatchObject({ id: scenario.id, chosen: false });
    const items = await loadItems(testDb(), [scenario.id]);
    const { groups } = groupItems(items, DEMO_PRICE_LIST.lumber.widthM);
    const expected = buildSheet(jobOf(groups, DEMO_PRICE_LIST).job);
    expect(res.json.sheet.totals).toEqual(JSON.parse(JSON.stringify(expected.totals)));
    expect(res.json.sheet.cutPlan).toEqual(JSON.parse(JSON.stringify(expected.cutPlan)));
    expect(res.json.sheet.cautions.join(" ")).toMatch(/gloves.*respirator/);
  });

  it("merges the six identical wall panels into one build type with the slabs and fabric counted by hand", async () => {
    await actAs("engineer");
    const res = await callRoute(sheetRoute.GET, { params: { projectId: hollis } });
    const g = res.json.sheet.builds.find((b: { build: { kind: string; insulationThicknessM?: number; airGapM?: number } }) => b.build.kind === "panel" && b.build.insulationThicknessM === 0.1 && !b.build.airGapM);
    expect(g.count).toBe(6);
    // hand: slabs of 50 mm are the thickest listed that make both the 100 mm and the 50 mm fills whole layers;
    // 600 × 1200 × 100 mm fill from 1200 × 600 × 50 mm slabs: 2 layers, one piece per slab → 12 slabs for 6 panels
    expect(res.json.slab.thicknessM).toBe(0.05);
    expect(g.slabs).toBe(12);
    // hand: fabric (0.6 + 2·(0.1 + 0.05)) × (1.2 + 2·(0.1 + 0.05)) = 0.9 × 1.5 = 1.35 m² per panel, 8.1 m² for six; 1e-9
    expect(g.fabricAreaM2).toBeCloseTo(8.1, 9);
    expect(res.json.presented.units).toBe("metric");
  });

  it("answers in imperial on ?units=imperial and refuses other units with 400", async () => {
    const imperial = await callRoute(sheetRoute.GET, { params: { projectId: hollis }, rawBody: undefined, method: "GET" });
    expect(imperial.status).toBe(200);
    const req = new Request(`http://eigenroom.test/api/v1/projects/${hollis}/build-sheet?units=imperial`);
    const r = await sheetRoute.GET(req, { params: Promise.resolve({ projectId: hollis }) });
    const j = await r.json();
    expect(j.presented.totals.weight).toMatch(/lb$/);
    const bad = await sheetRoute.GET(new Request(`http://eigenroom.test/x?units=cubits`), { params: Promise.resolve({ projectId: hollis }) });
    expect(bad.status).toBe(400);
  });

  it("is 404 to a builder not assigned to the project and to a client of another project, 403 to the project's client", async () => {
    await actAs("builder");
    expect((await callRoute(sheetRoute.GET, { params: { projectId: vale } })).status).toBe(404);
    await actAs("client2");
    expect((await callRoute(sheetRoute.GET, { params: { projectId: hollis } })).status).toBe(404);
    await actAs("client");
    expect((await callRoute(sheetRoute.GET, { params: { projectId: hollis } })).status).toBe(403);
  });
});

describe("PUT /treatment-items/{itemId}/progress", () => {
  let itemId: string;
  beforeAll(async () => {
    const scenario = await scenarioByName(room, "Panels and corner traps");
    itemId = (await loadItems(testDb(), [scenario.id])).find((i) => i.name === "Corner traps")!.id;
  });

  it("lets the assigned builder mark an item built, and the engineer sees it on the sheet", async () => {
    await actAs("builder");
    const res = await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: { builtOn: today, note: "Frames glued" } });
    expect(res.status).toBe(200);
    expect(res.json.progress).toMatchObject({ builtOn: today, builtByName: "Rafe Lindqvist", installedOn: null, note: "Frames glued" });
    await actAs("engineer");
    const sheet = await callRoute(sheetRoute.GET, { params: { projectId: hollis } });
    const item = sheet.json.rooms[0].items.find((i: { id: string }) => i.id === itemId);
    expect(item.progress).toMatchObject({ builtOn: today, builtByName: "Rafe Lindqvist" });
    expect(sheet.json.can.markProgress).toBe(false);
  });

  it("refuses the engineer (403) and a client (403 on their project, 404 elsewhere)", async () => {
    await actAs("engineer");
    expect((await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: { installedOn: today } })).status).toBe(403);
    await actAs("client");
    expect((await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: { installedOn: today } })).status).toBe(403);
    await actAs("client2");
    expect((await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: { installedOn: today } })).status).toBe(404);
  });

  it("refuses installed before built, a future day and an empty body with 400 and the field", async () => {
    await actAs("builder");
    const early = await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: { installedOn: "2020-01-01" } });
    expect(early.status).toBe(400);
    expect(early.json.error.fields).toHaveProperty("installedOn");
    const future = await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: { builtOn: "2999-01-01" } });
    expect(future.status).toBe(400);
    expect(future.json.error.fields).toHaveProperty("builtOn");
    expect((await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId }, body: {} })).status).toBe(400);
  });

  it("marks installed through the server action, and clears a mark with null", async () => {
    await actAs("builder");
    const done = await act(() => markProgressAction(hollis, itemId, { installedOn: today }));
    expect(done).toMatchObject({ ok: true, data: { builtOn: today, installedOn: today, installedByName: "Rafe Lindqvist" } });
    const cleared = await act(() => markProgressAction(hollis, itemId, { installedOn: null }));
    expect(cleared.data.installedOn).toBeNull();
    expect(cleared.data.builtOn).toBe(today);
  });

  it("refuses an item that is not on the build sheet (another scenario) with 400", async () => {
    const other = await scenarioByName(room, "Panels at reflection points");
    const otherItem = (await loadItems(testDb(), [other.id]))[0]!.id;
    await actAs("builder");
    const res = await callRoute(progressRoute.PUT, { method: "PUT", params: { itemId: otherItem }, body: { builtOn: today } });
    expect(res.status).toBe(400);
  });

  it("keeps the builder out of the analyses: adding an item is forbidden", async () => {
    await actAs("builder");
    const s = await scenarioByName(room, "Panels and corner traps");
    const r = await act(() => addTreatmentItemAction(s.id, { ...PANEL_ITEM, version: s.version }));
    expect(r).toMatchObject({ ok: false, code: "forbidden" });
  });
});

describe("price list", () => {
  const input = { ...DEMO_PRICE_LIST, fabric: { pricePerM2: 13, wrapM: 0.05 }, version: 1 };

  it("is read by engineers and builders, not by clients", async () => {
    await actAs("engineer");
    const res = await callRoute(priceRoute.GET);
    expect(res.status).toBe(200);
    expect(res.json.priceList).toMatchObject({ currency: "EUR", version: 1, slab: { lengthM: 1.2, widthM: 0.6 } });
    await actAs("builder");
    expect((await callRoute(priceRoute.GET)).status).toBe(200);
    await actAs("client");
    expect((await callRoute(priceRoute.GET)).status).toBe(403);
  });

  it("is changed by the owner only (others 403), with a stale version 409, and the sheet's fabric cost follows", async () => {
    for (const who of ["engineer", "builder", "client"] as const) {
      await actAs(who);
      expect((await callRoute(priceRoute.PUT, { method: "PUT", body: input })).status).toBe(403);
    }
    await actAs("owner");
    const ok = await callRoute(priceRoute.PUT, { method: "PUT", body: input });
    expect(ok.status).toBe(200);
    expect(ok.json.priceList.version).toBe(2);
    expect((await callRoute(priceRoute.PUT, { method: "PUT", body: input })).status).toBe(409);
    const sheet = await callRoute(sheetRoute.GET, { params: { projectId: hollis } });
    expect(sheet.json.sheet.totals.cost.fabric).toBeCloseTo(sheet.json.sheet.totals.fabricAreaM2 * 13, 9);
  });

  it("answers a bad currency, a negative kerf and a repeated slab thickness with 400 and the fields", async () => {
    await actAs("owner");
    const bad = { ...input, currency: "euro", kerfM: -0.001, slab: { ...input.slab, prices: [input.slab.prices[0], input.slab.prices[0]] }, version: 2 };
    const res = await callRoute(priceRoute.PUT, { method: "PUT", body: bad });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toEqual(expect.arrayContaining(["currency", "kerfM", "slab.prices.1.thicknessM"]));
  });

  it("saves through the server action for the owner and refuses the engineer", async () => {
    await actAs("engineer");
    expect(await act(() => savePriceListAction({ ...input, version: 2 }))).toMatchObject({ ok: false, code: "forbidden" });
    await actAs("owner");
    expect(await act(() => savePriceListAction({ ...input, version: 2 }))).toMatchObject({ ok: true, data: { version: 3 } });
  });
});

describe("from the sizer's proposal to the build sheet", () => {
  it("adds the proposal to a new scenario, puts it on the build sheet, and the builder sees its items", async () => {
    await actAs("engineer");
    const panels = await scenarioByName(room, "Panels at reflection points");
    const limits = { maxDepthM: 0.6, verticalCorners: ["front-left", "front-right", "rear-left", "rear-right"] as const, ceilingEdges: [{ edge: "rear" as const, lengthM: 4.1 }], wallAreaM2: 2 };
    const proposal = sizeTreatment({
      room: { lengthM: 5.8, widthM: 4.1, heightM: 2.5 },
      surfaces: [{ areaM2: 2 * (5.8 + 4.1) * 2.5, finish: "painted-drywall-on-studs" }, { areaM2: 5.8 * 4.1, finish: "carpet-on-pad" }, { areaM2: 5.8 * 4.1, finish: "painted-drywall-on-studs" }],
      target: { kind: "small-room", lowerS: 0.2, upperS: 0.4 },
      objective: "count",
      limits: { ...limits, verticalCorners: [...limits.verticalCorners] },
    });
    const items = proposalItems(proposal.items, defaultCatalogue(), limits, 2.5);
    expect(items.length).toBeGreaterThan(0);
    const added = await act(() => addProposalAction(room, { into: { kind: "new", name: "Sized traps", copyFromScenarioId: panels.id }, items }));
    expect(added.ok).toBe(true);
    const stored = await loadItems(testDb(), [added.data.scenarioId]);
    // the copy's eight panels (four items) plus the proposal's items
    expect(stored.length).toBe(4 + items.length);
    expect(await scenarioVersion(added.data.scenarioId)).toBe(added.data.version);

    await actAs("builder");
    expect(await act(() => chooseBuildScenarioAction(added.data.scenarioId))).toMatchObject({ ok: false, code: "forbidden" });
    await actAs("engineer");
    expect(await act(() => chooseBuildScenarioAction(added.data.scenarioId))).toMatchObject({ ok: true });
    await actAs("builder");
    const sheet = await callRoute(sheetRoute.GET, { params: { projectId: hollis } });
    expect(sheet.json.rooms[0].scenario).toMatchObject({ id: added.data.scenarioId, chosen: true });
    expect(sheet.json.rooms[0].items.map((i: { id: string }) => i.id).sort()).toEqual(stored.map((i) => i.id).sort());
  });

  it("refuses the baseline as the scenario to build, and a proposal item that does not fit the room", async () => {
    await actAs("engineer");
    const baseline = await testDb().selectFrom("scenarios").select("id").where("room_id", "=", room).where("is_baseline", "=", true).executeTakeFirstOrThrow();
    expect(await act(() => chooseBuildScenarioAction(baseline.id))).toMatchObject({ ok: false, code: "bad_request" });
    const s = await scenarioByName(room, "Panels and corner traps");
    const tooLong = { ...PANEL_ITEM, name: "Too low", placements: [{ kind: "surface", surface: "left", uM: 0.1, vM: 1.2 }] };
    const r = await act(() => addProposalAction(room, { into: { kind: "existing", scenarioId: s.id, version: s.version }, items: [tooLong] }));
    expect(r.ok).toBe(false);
    expect(Object.keys(r.fields ?? {}).some((k) => k.startsWith("placements"))).toBe(true);
  });

  it("is forbidden to the builder and unseen by a client of another project", async () => {
    await actAs("builder");
    expect(await act(() => addProposalAction(room, { into: { kind: "new", name: "x", copyFromScenarioId: null }, items: [PANEL_ITEM] }))).toMatchObject({ ok: false, code: "forbidden" });
    await actAs("client2");
    expect(await act(() => addProposalAction(room, { into: { kind: "new", name: "x", copyFromScenarioId: null }, items: [PANEL_ITEM] }))).toMatchObject({ ok: false, code: "not_found" });
    void (await valeRoomId());
  });
});
