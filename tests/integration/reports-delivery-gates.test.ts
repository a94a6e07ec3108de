// Where reports meet uploads and fees: a photo the engineer chose appears in the report, and a firm
// that makes downloads wait for the fee holds the client's download until an invoice is paid.
import { execFileSync } from "node:child_process";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as issueRoute from "@/app/api/v1/reports/revisions/[revisionId]/issue/route";
import * as reportsRoute from "@/app/api/v1/reports/route";
import { saveFeeSettingsAction } from "@/app/(app)/settings/fees/actions";
import { lucia } from "@/lib/auth/lucia";
import type { Actor } from "@/lib/auth/actor";
import { curateRoomFile, uploadRoomFile } from "@/lib/storage/room-files";
import { objectStorage } from "@/lib/storage/storage";
import { startFakeS3, type FakeS3Handle } from "@/scripts/services/fake-s3";
import { actAs, callRoute, userIdOf } from "../support/act-as";
import { demoIds, getPdf } from "./reports-support";
import { resetTables, testDb } from "./support/db";

let s3: FakeS3Handle;
let dir: string;
let ids: Awaited<ReturnType<typeof demoIds>>;

async function engineer(): Promise<Actor> {
  const id = await userIdOf("engineer");
  const { user } = await lucia.validateSession((await lucia.createSession(id, {})).id);
  return { userId: id, firmId: user!.firmId, role: "engineer", email: user!.email, name: user!.name, unitSystem: user!.unitSystem };
}

beforeAll(async () => {
  await resetTables();
  dir = await mkdtemp(path.join(tmpdir(), "eigenroom-s3-"));
  s3 = await startFakeS3({ port: 0, dir, bucket: "eigenroom-gates", log: () => {} });
  Object.assign(process.env, { S3_ENDPOINT: s3.endpoint, S3_BUCKET: "eigenroom-gates", S3_ACCESS_KEY_ID: s3.accessKeyId, S3_SECRET_ACCESS_KEY: s3.secretAccessKey, S3_REGION: "us-east-1" });
  ids = await demoIds();
});

afterAll(async () => {
  await s3?.stop();
  if (dir) await rm(dir, { recursive: true, force: true });
});

async function issueReport(): Promise<string> {
  await actAs("engineer");
  const treated = ids.scenarios.filter((s) => !s.is_baseline).map((s) => s.id);
  const draft = await callRoute(reportsRoute.POST, { body: { roomId: ids.roomId, scenarioIds: treated, paperSize: "A4" } });
  expect(draft.status, JSON.stringify(draft.json)).toBe(201);
  const revisionId: string = draft.json.revision.id;
  const issued = await callRoute(issueRoute.POST, { params: { revisionId }, body: {} });
  expect(issued.status, JSON.stringify(issued.json)).toBe(200);
  return revisionId;
}

describe("report photos and the fee gate", () => {
  let revisionId: string;

  it("a photo chosen for the report is drawn in the issued PDF (pdfimages, poppler-utils)", async () => {
    const raw = Buffer.alloc(320 * 240 * 3, 180);
    const jpeg = new Uint8Array(await sharp(raw, { raw: { width: 320, height: 240, channels: 3 } }).jpeg().toBuffer());
    const actor = await engineer();
    const file = await uploadRoomFile(testDb(), objectStorage(), actor, ids.roomId, { name: "front-wall.jpg", kind: "photo", bytes: jpeg, caption: "Front wall before treatment" });
    await curateRoomFile(testDb(), actor, ids.roomId, file.id, { includeInReport: true });
    revisionId = await issueReport();
    const pdf = await getPdf(revisionId);
    expect(pdf.status).toBe(200);
    const out = path.join(dir, "report.pdf");
    await writeFile(out, pdf.bytes);
    const images = execFileSync("pdfimages", ["-list", out], { encoding: "utf8" }).trim().split("\n").slice(2);
    expect(images.length).toBeGreaterThanOrEqual(1);
    expect(execFileSync("pdftotext", [out, "-"], { encoding: "utf8" })).toContain("Front wall before treatment");
  }, 60_000);

  it("holds the client's download while the fee is unpaid and releases it once an invoice is paid", async () => {
    await actAs("owner");
    expect((await saveFeeSettingsAction({ basis: "per-project", amount: "850.00", currency: "EUR", downloadsWaitForPayment: true })).ok).toBe(true);
    await actAs("client");
    const held = await getPdf(revisionId);
    expect(held.status).toBe(403);
    expect(JSON.parse(held.bytes.toString()).error.message).toMatch(/once the engineering fee is paid/);
    await actAs("engineer");
    expect((await getPdf(revisionId)).status).toBe(200); // staff are never held
    await testDb()
      .insertInto("invoices")
      .values({ firm_id: (await engineer()).firmId, project_id: ids.projectId, amount_minor: 85000, currency: "EUR", status: "paid", description: "Engineering fee", paid_at: new Date() } as never)
      .execute();
    await actAs("client");
    expect((await getPdf(revisionId)).status).toBe(200);
  });
});
