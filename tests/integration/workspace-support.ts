// Helpers shared by the workspace integration tests (real test database, demo seed).
import { analyzeScenario } from "@/lib/analysis";
import { analysisItemOf, loadAnalysisRoom, loadItems, parseTarget } from "@/db/queries/analysis";
import { testDb } from "./support/db";

export async function hollisRoomId(): Promise<string> {
  const p = await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
  return (await testDb().selectFrom("rooms").select("id").where("project_id", "=", p.id).where("name", "=", "Media room").executeTakeFirstOrThrow()).id;
}

export async function valeRoomId(): Promise<string> {
  const p = await testDb().selectFrom("projects").select("id").where("name", "=", "Vale home studio").executeTakeFirstOrThrow();
  return (await testDb().selectFrom("rooms").select("id").where("project_id", "=", p.id).where("name", "=", "Mix room").executeTakeFirstOrThrow()).id;
}

export async function scenarioByName(roomId: string, name: string) {
  return testDb().selectFrom("scenarios").selectAll().where("room_id", "=", roomId).where("name", "=", name).executeTakeFirstOrThrow();
}

export async function roomVersion(roomId: string): Promise<number> {
  return (await testDb().selectFrom("rooms").select("version").where("id", "=", roomId).executeTakeFirstOrThrow()).version;
}

export async function scenarioVersion(id: string): Promise<number> {
  return (await testDb().selectFrom("scenarios").select("version").where("id", "=", id).executeTakeFirstOrThrow()).version;
}

/** A fresh lib/analysis computation from what the database holds now (no stored result read). */
export async function freshAnalysis(scenarioId: string) {
  const db = testDb();
  const s = await db.selectFrom("scenarios").select(["room_id", "target"]).where("id", "=", scenarioId).executeTakeFirstOrThrow();
  const room = await loadAnalysisRoom(db, s.room_id);
  const items = (await loadItems(db, [scenarioId])).map(analysisItemOf);
  return analyzeScenario(room, { target: parseTarget(s.target), items });
}

export async function counts() {
  const db = testDb();
  const n = async (t: "room_positions" | "scenarios" | "treatment_items" | "builds") => Number((await db.selectFrom(t).select(db.fn.countAll().as("n")).executeTakeFirstOrThrow()).n);
  return { positions: await n("room_positions"), scenarios: await n("scenarios"), items: await n("treatment_items"), builds: await n("builds") };
}

export const PANEL_ITEM = {
  name: "Test panels",
  spec: { kind: "porous-panel", layers: [{ kind: "porous", thicknessM: 0.1, flowResistivity: 10_000, model: "miki" }], materialId: "mineral-wool-35", widthM: 0.6, heightM: 1.2 },
  count: 4,
  placements: [{ kind: "surface", surface: "left", uM: 1.5, vM: 1.2 }],
  unitCost: 100,
  unitMassKg: 5,
};
