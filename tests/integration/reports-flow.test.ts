// The report flow on the demo room, on the real test database and the fake SMTP server: draft,
// issue (render + sign), independent signature check, the public check (valid / tampered /
// unknown), e-mail with link and attachment, supersede, approval, questions and the audit log.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import * as commentsRoute from "@/app/api/v1/reports/[reportId]/comments/route";
import * as eventsRoute from "@/app/api/v1/reports/[reportId]/events/route";
import * as reportRoute from "@/app/api/v1/reports/[reportId]/route";
import * as approveRoute from "@/app/api/v1/reports/revisions/[revisionId]/approve/route";
import * as issueRoute from "@/app/api/v1/reports/revisions/[revisionId]/issue/route";
import * as sendRoute from "@/app/api/v1/reports/revisions/[revisionId]/send/route";
import * as reportsRoute from "@/app/api/v1/reports/route";
import * as verifyRoute from "@/app/api/v1/verify/route";
import { compareScenarios } from "@/db/queries/scenarios";
import { bandLabel, fixed } from "@/lib/report";
import { checkPdfSignature, sha256Hex } from "@/lib/signing";
import { actAs, callRoute, userIdOf } from "../support/act-as";
import { demoIds, getPdf, lastOutboxId, waitForMail } from "./reports-support";
import { resetTables, testDb } from "./support/db";

let ids: Awaited<ReturnType<typeof demoIds>>;
let reportId = "";
let rev1 = "";
let rev2 = "";
let pdf1: Buffer = Buffer.alloc(0);

async function verifyBytes(bytes: Buffer) {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(bytes)], { type: "application/pdf" }), "report.pdf");
  const res = await verifyRoute.POST(new Request("http://eigenroom.test/api/v1/verify", { method: "POST", body: form }));
  return { status: res.status, json: await res.json() };
}
async function verifyJson(body: unknown) {
  const res = await verifyRoute.POST(new Request("http://eigenroom.test/api/v1/verify", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) }));
  return { status: res.status, json: await res.json() };
}
const text = (pdf: Buffer) => {
  const f = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "er-it-")), "r.pdf");
  fs.writeFileSync(f, pdf);
  return execFileSync("pdftotext", ["-layout", f, "-"], { encoding: "utf8" }).replace(/[\u00a0\u202f]/g, " ").replace(/\s+/g, " ");
};

beforeAll(async () => {
  await resetTables();
  ids = await demoIds();
  expect(ids.scenarios.length).toBeGreaterThanOrEqual(2);
});

describe("report flow on the demo room", () => {
  it("an engineer saves a draft: the report gets its number; the client sees nothing of it", async () => {
    await actAs("engineer");
    const treated = ids.scenarios.filter((s) => !s.is_baseline).map((s) => s.id);
    const res = await callRoute(reportsRoute.POST, { body: { roomId: ids.roomId, scenarioIds: treated, paperSize: "A4" } });
    expect(res.status).toBe(201);
    expect(res.json.revision.status).toBe("draft");
    expect(res.json.revision.revision).toBe(1);
    rev1 = res.json.revision.id;
    reportId = res.json.revision.reportId;
    const report = await testDb().selectFrom("reports").select("number").where("id", "=", reportId).executeTakeFirstOrThrow();
    expect(report.number).toMatch(/^ER-\d{4}-0001$/);

    await actAs("client");
    expect((await callRoute(reportsRoute.GET as never, {})).status).toBe(400); // no projectId
    const list = await reportsRoute.GET(new Request(`http://eigenroom.test/api/v1/reports?projectId=${ids.projectId}`), { params: Promise.resolve({}) });
    expect((await list.json()).reports).toEqual([]);
    expect((await getPdf(rev1)).status).toBe(404);
    expect((await callRoute(reportRoute.GET, { params: { reportId } })).status).toBe(404);
  });

  it("the draft preview renders for staff, marked as a draft and unsigned", async () => {
    await actAs("engineer");
    const p = await getPdf(rev1);
    expect(p.status).toBe(200);
    expect(p.type).toBe("application/pdf");
    expect(checkPdfSignature(p.bytes).status).toBe("unsigned");
    expect(text(p.bytes)).toMatch(/DRAFT/);
  }, 60_000);

  it("issuing signs the file; the independent check passes; the text holds the screen's figures", async () => {
    await actAs("engineer");
    const res = await callRoute(issueRoute.POST, { params: { revisionId: rev1 }, body: {} });
    expect(res.status).toBe(200);
    expect(res.json.revision.status).toBe("issued");
    expect(res.json.revision.signerName).toBe("Tomas Okafor");
    const row = await testDb().selectFrom("report_revisions").select(["pdf", "sha256", "page_count"]).where("id", "=", rev1).executeTakeFirstOrThrow();
    pdf1 = row.pdf!;
    expect(row.sha256).toBe(sha256Hex(pdf1));
    const check = checkPdfSignature(pdf1);
    expect(check.status).toBe("intact");
    expect(check.status === "intact" && check.signer.fingerprintSha256).toBe(res.json.revision.certificateFingerprint);

    // The same numbers as the comparison screen (compareScenarios → stored lib/analysis results).
    const actor = { userId: await userIdOf("engineer"), firmId: "", role: "engineer" as const, email: "", name: "", unitSystem: "metric" as const };
    actor.firmId = (await testDb().selectFrom("users").select("firm_id").where("id", "=", actor.userId).executeTakeFirstOrThrow()).firm_id;
    const recId = ids.scenarios.filter((s) => !s.is_baseline).at(-1)!.id;
    const [rec] = await compareScenarios(testDb(), actor, ids.roomId, [recId]);
    const t = text(pdf1);
    const rv = rec!.results.reverb!;
    rv.bandsHz.forEach((f, i) => expect(t, `${f} Hz`).toContain(`${bandLabel(f).replace("\u00a0", " ")} ${fixed(rv.untreated.eyringS[i]!, 2)} ${fixed(rv.treated.eyringS[i]!, 2)}`));
    const main = rec!.results.lowFrequency?.seats.find((s) => s.isMain);
    if (main) expect(t).toContain(`${fixed(main.spreadDb, 1)} dB`);
    expect(t).toContain(`Page ${row.page_count} of ${row.page_count}`);
  }, 120_000);

  it("an issued revision cannot be changed, not even in SQL", async () => {
    await expect(testDb().updateTable("report_revisions").set({ note: "changed" }).where("id", "=", rev1).execute()).rejects.toThrow(/immutable/);
    await expect(testDb().deleteFrom("report_revisions").where("id", "=", rev1).execute()).rejects.toThrow(/cannot be deleted/);
    await actAs("engineer");
    expect((await callRoute(issueRoute.POST, { params: { revisionId: rev1 }, body: {} })).status).toBe(409);
  });

  it("the public check: the file is valid; one changed byte is tampered; a stranger's file is unknown", async () => {
    await actAs("anonymous");
    const ok = await verifyBytes(pdf1);
    expect(ok.status).toBe(200);
    expect(ok.json.status).toBe("valid");
    expect(ok.json.report.room).toBe(ids.roomName);
    expect(ok.json.report.signer).toBe("Tomas Okafor");
    expect(ok.json.report.superseded).toBe(false);
    const bad = Buffer.from(pdf1);
    const at = Math.floor(bad.length / 3);
    bad[at] = bad[at]! ^ 0x01;
    expect((await verifyBytes(bad)).json.status).toBe("tampered");
    const stranger = Buffer.from("%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n");
    expect((await verifyBytes(stranger)).json.status).toBe("unknown");
    const number = (await testDb().selectFrom("reports").select("number").where("id", "=", reportId).executeTakeFirstOrThrow()).number;
    expect((await verifyJson({ reportNumber: number, sha256: sha256Hex(pdf1) })).json.status).toBe("valid");
    expect((await verifyJson({ reportNumber: number, sha256: "0".repeat(64) })).json.status).toBe("tampered");
    expect((await verifyJson({ reportNumber: "ER-1999-9999", sha256: "0".repeat(64) })).json.status).toBe("unknown");
    expect((await verifyJson({ reportNumber: "nope", sha256: "x" })).status).toBe(400);
    expect((await verifyBytes(Buffer.from("MZ not a pdf"))).status).toBe(400);
  });

  it("sending e-mails the client a portal link with the signed PDF attached", async () => {
    const after = await lastOutboxId();
    await actAs("engineer");
    const res = await callRoute(sendRoute.POST, { params: { revisionId: rev1 }, body: {} });
    expect(res.status).toBe(200);
    expect(res.json.sent).toMatchObject({ to: "client@larchmere.example", invited: false, attached: true });
    const mail = await waitForMail("client@larchmere.example", after);
    expect(mail.subject).toMatch(/ER-\d{4}-0001, revision 1/);
    expect(mail.text_body).toContain(`/api/v1/reports/portal/${ids.projectId}`);
    expect(mail.html_body).toContain(`/api/v1/reports/portal/${ids.projectId}`);
    expect(mail.attachments).toEqual([expect.objectContaining({ contentType: "application/pdf", filename: expect.stringMatching(/-rev1\.pdf$/), size: pdf1.length })]);
  });

  it("the client downloads the signed file (logged) and approves; a second approval is refused", async () => {
    await actAs("client");
    const p = await getPdf(rev1);
    expect(p.status).toBe(200);
    expect(sha256Hex(p.bytes)).toBe(sha256Hex(pdf1));
    const a = await callRoute(approveRoute.POST, { params: { revisionId: rev1 }, body: { note: "Go ahead" } });
    expect(a.status).toBe(201);
    expect(a.json.approval.userName).toBe("Priya Hollis");
    expect((await callRoute(approveRoute.POST, { params: { revisionId: rev1 }, body: {} })).status).toBe(409);
  });

  it("a question e-mails the engineer; the answer e-mails the client", async () => {
    let after = await lastOutboxId();
    await actAs("client");
    const q = await callRoute(commentsRoute.POST, { params: { reportId }, body: { body: "Can the traps be painted?" } });
    expect(q.status).toBe(201);
    expect(q.json.comment.kind).toBe("question");
    expect((await waitForMail("engineer@larchmere.example", after)).text_body).toContain("Can the traps be painted?");
    after = await lastOutboxId();
    await actAs("engineer");
    const ans = await callRoute(commentsRoute.POST, { params: { reportId }, body: { body: "Yes, with a breathable paint on the fabric frame only." } });
    expect(ans.json.comment.kind).toBe("answer");
    expect((await waitForMail("client@larchmere.example", after)).subject).toMatch(/^Answer on ER-/);
    await actAs("client");
    const thread = await callRoute(commentsRoute.GET, { params: { reportId } });
    expect(thread.json.comments.map((c: { kind: string }) => c.kind)).toEqual(["question", "answer"]);
  });

  it("a new revision supersedes the first, which stays downloadable, marked, and checkable", async () => {
    await actAs("engineer");
    const d = await callRoute(reportsRoute.POST, { body: { roomId: ids.roomId, scenarioIds: [ids.scenarios.at(-1)!.id], paperSize: "LETTER", note: "Letter size for the client's printer." } });
    expect(d.json.revision.revision).toBe(2);
    rev2 = d.json.revision.id;
    expect((await callRoute(issueRoute.POST, { params: { revisionId: rev2 }, body: {} })).status).toBe(200);
    const r = await callRoute(reportRoute.GET, { params: { reportId } });
    expect(r.json.report.revisions.map((v: { revision: number; status: string }) => [v.revision, v.status])).toEqual([
      [2, "issued"],
      [1, "superseded"],
    ]);
    await actAs("client");
    expect((await getPdf(rev1)).status).toBe(200);
    expect((await callRoute(approveRoute.POST, { params: { revisionId: rev1 }, body: {} })).status).toBe(409);
    const v = await verifyBytes(pdf1);
    expect(v.json.status).toBe("valid");
    expect(v.json.report).toMatchObject({ revision: 1, superseded: true, newestRevision: 2 });
  }, 120_000);

  it("the audit log holds every step, with who did it", async () => {
    await actAs("engineer");
    const res = await callRoute(eventsRoute.GET, { params: { reportId } });
    const kinds = res.json.events.map((e: { kind: string }) => e.kind);
    for (const k of ["drafted", "issued", "sent", "downloaded", "approved", "question", "answer", "superseded"]) expect(kinds, k).toContain(k);
    expect(res.json.events.find((e: { kind: string }) => e.kind === "approved").actorName).toBe("Priya Hollis");
    await actAs("client");
    expect((await callRoute(eventsRoute.GET, { params: { reportId } })).status).toBe(403);
  });
});
