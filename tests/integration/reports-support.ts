// Helpers of the report integration tests: the demo room, its scenarios, PDF downloads, the outbox.
import { sql } from "kysely";
import * as pdfRoute from "@/app/api/v1/reports/revisions/[revisionId]/pdf/route";
import { testDb } from "./support/db";

export async function demoIds() {
  const db = testDb();
  const project = await db.selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
  const room = await db.selectFrom("rooms").select(["id", "name"]).where("project_id", "=", project.id).executeTakeFirstOrThrow();
  const scenarios = await db.selectFrom("scenarios").select(["id", "name", "is_baseline"]).where("room_id", "=", room.id).orderBy("is_baseline", "desc").orderBy("sort_order").execute();
  return { projectId: project.id, roomId: room.id, roomName: room.name, scenarios };
}

/** GET the PDF route as Next would; returns status and bytes (or the JSON error). */
export async function getPdf(revisionId: string): Promise<{ status: number; bytes: Buffer; type: string }> {
  const res = await pdfRoute.GET(new Request(`http://eigenroom.test/api/v1/reports/revisions/${revisionId}/pdf`), { params: Promise.resolve({ revisionId }) });
  return { status: res.status, bytes: Buffer.from(await res.arrayBuffer()), type: res.headers.get("content-type") ?? "" };
}

export async function outboxCount(): Promise<number> {
  const r = await sql<{ n: number }>`select count(*)::int as n from dev_outbox`.execute(testDb());
  return r.rows[0]!.n;
}

/** Waits for a message to `to` newer than `afterId` (the fake SMTP server writes asynchronously). */
export async function waitForMail(to: string, afterId: number, timeoutMs = 15_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const row = await testDb()
      .selectFrom("dev_outbox")
      .selectAll()
      .where("id", ">", afterId)
      .where(sql<boolean>`exists (select 1 from unnest(envelope_to) t where lower(t) = lower(${to}))`)
      .orderBy("id", "desc")
      .executeTakeFirst();
    if (row) return row;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} arrived`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

export async function lastOutboxId(): Promise<number> {
  const r = await sql<{ id: string | null }>`select max(id)::text as id from dev_outbox`.execute(testDb());
  return Number(r.rows[0]?.id ?? 0);
}
