// Role × action matrix of reports: only engineers and owners draft, issue and send; the project's
// client reads issued revisions, approves and asks; builders and other clients see nothing (404);
// unsigned drafts are never visible to clients. Plus the invitation of a client without an account.
import { beforeAll, describe, expect, it } from "vitest";
import { approveReportAction, postReportCommentAction } from "@/app/(app)/projects/[projectId]/reports/actions";
import { issueReportAction, reportSettingsAction, saveReportDraftAction, sendReportAction } from "@/app/(app)/rooms/[roomId]/report/actions";
import * as commentsRoute from "@/app/api/v1/reports/[reportId]/comments/route";
import * as reportRoute from "@/app/api/v1/reports/[reportId]/route";
import * as approveRoute from "@/app/api/v1/reports/revisions/[revisionId]/approve/route";
import * as issueRoute from "@/app/api/v1/reports/revisions/[revisionId]/issue/route";
import * as sendRoute from "@/app/api/v1/reports/revisions/[revisionId]/send/route";
import * as reportsRoute from "@/app/api/v1/reports/route";
import * as openapiRoute from "@/app/api/v1/openapi.json/route";
import { actAs, callRoute, runAction, userIdOf, type DemoWho } from "../support/act-as";
import { demoIds, getPdf, lastOutboxId, waitForMail } from "./reports-support";
import { resetTables, testDb } from "./support/db";

const WHO: DemoWho[] = ["owner", "engineer", "builder", "client", "client2", "anonymous"];
let ids: Awaited<ReturnType<typeof demoIds>>;
let reportId = "";
let issued = "";

async function draft(): Promise<string> {
  await actAs("engineer");
  const r = await callRoute(reportsRoute.POST, { body: { roomId: ids.roomId, scenarioIds: [ids.scenarios.at(-1)!.id] } });
  expect(r.status).toBe(201);
  return r.json.revision.id;
}

beforeAll(async () => {
  await resetTables();
  ids = await demoIds();
  const d = await draft();
  expect((await callRoute(issueRoute.POST, { params: { revisionId: d }, body: {} })).status).toBe(200);
  issued = d;
  reportId = (await testDb().selectFrom("report_revisions").select("report_id").where("id", "=", d).executeTakeFirstOrThrow()).report_id;
}, 120_000);

type Row = { name: string; expect: Record<Exclude<DemoWho, "anonymous">, number>; call: () => Promise<{ status: number }> };
const rows: Row[] = [
  { name: "POST /reports (draft)", expect: { owner: 201, engineer: 201, builder: 403, client: 403, client2: 404 }, call: () => callRoute(reportsRoute.POST, { body: { roomId: ids.roomId, scenarioIds: [ids.scenarios.at(-1)!.id] } }) },
  {
    name: "GET /reports?projectId=hollis",
    expect: { owner: 200, engineer: 200, builder: 403, client: 200, client2: 404 },
    call: () => reportsRoute.GET(new Request(`http://eigenroom.test/api/v1/reports?projectId=${ids.projectId}`), { params: Promise.resolve({}) }),
  },
  { name: "GET /reports/:id", expect: { owner: 200, engineer: 200, builder: 404, client: 200, client2: 404 }, call: () => callRoute(reportRoute.GET, { params: { reportId } }) },
  { name: "GET issued PDF", expect: { owner: 200, engineer: 200, builder: 404, client: 200, client2: 404 }, call: () => getPdf(issued) },
  { name: "POST send (issued)", expect: { owner: 200, engineer: 200, builder: 404, client: 403, client2: 404 }, call: () => callRoute(sendRoute.POST, { params: { revisionId: issued }, body: {} }) },
  { name: "POST comment", expect: { owner: 201, engineer: 201, builder: 404, client: 201, client2: 404 }, call: () => callRoute(commentsRoute.POST, { params: { reportId }, body: { body: "matrix" } }) },
];

describe("report routes × roles", () => {
  for (const row of rows) {
    for (const who of WHO) {
      const expected = who === "anonymous" ? 401 : row.expect[who];
      it(`${row.name} as ${who} → ${expected}`, async () => {
        await actAs(who);
        expect((await row.call()).status).toBe(expected);
      }, 60_000);
    }
  }

  it("issue: staff may, everyone else gets 404 for the draft (they cannot know it exists)", async () => {
    for (const who of ["builder", "client", "client2"] as const) {
      const d = await draft();
      await actAs(who);
      expect((await callRoute(issueRoute.POST, { params: { revisionId: d }, body: {} })).status, who).toBe(404);
      expect((await getPdf(d)).status, `${who} preview`).toBe(404);
    }
    const d = await draft();
    await actAs("anonymous");
    expect((await callRoute(issueRoute.POST, { params: { revisionId: d }, body: {} })).status).toBe(401);
  });

  it("a client's list never holds a draft revision", async () => {
    await draft();
    await actAs("client");
    const res = await reportsRoute.GET(new Request(`http://eigenroom.test/api/v1/reports?projectId=${ids.projectId}`), { params: Promise.resolve({}) });
    const json = await res.json();
    const statuses = json.reports.flatMap((r: { revisions: { status: string }[] }) => r.revisions.map((v) => v.status));
    expect(statuses.length).toBeGreaterThan(0);
    expect(statuses).not.toContain("draft");
  });

  it("approve: only the project's client", async () => {
    const expected: Record<Exclude<DemoWho, "anonymous">, number> = { owner: 403, engineer: 403, builder: 404, client2: 404, client: 201 };
    for (const who of ["owner", "engineer", "builder", "client2", "client"] as const) {
      await actAs(who);
      expect((await callRoute(approveRoute.POST, { params: { revisionId: issued }, body: {} })).status, who).toBe(expected[who]);
    }
  });

  it("the endpoints are in the OpenAPI document, /verify as public", async () => {
    const doc = await (await openapiRoute.GET()).json();
    expect(Object.keys(doc.paths)).toEqual(expect.arrayContaining(["/reports", "/reports/{reportId}", "/reports/revisions/{revisionId}/issue", "/reports/revisions/{revisionId}/send", "/reports/revisions/{revisionId}/approve", "/verify"]));
    expect(doc.paths["/verify"].post.security).toEqual([]);
  });
});

describe("report server actions × roles", () => {
  it("saveReportDraftAction: staff ok, builder/client forbidden, client2 not found, anonymous to sign-in", async () => {
    const input = { roomId: ids.roomId, scenarioIds: [ids.scenarios.at(-1)!.id] };
    const out: Record<string, unknown> = {};
    for (const who of WHO) {
      await actAs(who);
      const r = (await runAction(() => saveReportDraftAction(input))) as { ok?: boolean; code?: string; redirect?: string };
      out[who] = r.redirect ? "redirect" : r.ok ? "ok" : r.code;
    }
    expect(out).toEqual({ owner: "ok", engineer: "ok", builder: "forbidden", client: "forbidden", client2: "not_found", anonymous: "redirect" });
  });

  it("issue/send actions refuse a client; settings only for the owner; bad input names the field", async () => {
    await actAs("client");
    expect(((await issueReportAction(ids.roomId, issued)) as { code: string }).code).toBe("forbidden");
    expect(((await sendReportAction(ids.roomId, issued, {})) as { code: string }).code).toBe("forbidden");
    await actAs("engineer");
    expect(((await reportSettingsAction(ids.roomId, { attachPdf: false })) as { code: string }).code).toBe("forbidden");
    const bad = (await saveReportDraftAction({ roomId: ids.roomId, scenarioIds: [] })) as { ok: boolean; fields?: Record<string, string[]> };
    expect(bad.ok).toBe(false);
    expect(bad.fields?.scenarioIds?.[0]).toMatch(/at least one/);
    await actAs("owner");
    expect((await reportSettingsAction(ids.roomId, { attachPdf: false })).ok).toBe(true);
  });

  it("with the attachment turned off, the mail carries the link only", async () => {
    const after = await lastOutboxId();
    await actAs("engineer");
    const r = await sendReportAction(ids.roomId, issued, {});
    expect(r.ok && r.data.attached).toBe(false);
    const mail = await waitForMail("client@larchmere.example", after);
    expect(mail.attachments).toEqual([]);
    expect(mail.text_body).toContain(`/api/v1/reports/portal/${ids.projectId}`);
  });

  it("approve and question actions for the client", async () => {
    await actAs("client");
    expect(((await approveReportAction(ids.projectId, issued, {})) as { code: string }).code).toBe("conflict"); // approved above
    expect((await postReportCommentAction(ids.projectId, reportId, { body: "From the portal" })).ok).toBe(true);
    await actAs("builder");
    expect(((await postReportCommentAction(ids.projectId, reportId, { body: "x" })) as { code: string }).code).toBe("not_found");
  });
});

describe("a client without an account", () => {
  it("gets an invitation with the first report, and the project is linked to them", async () => {
    const owner = await userIdOf("owner");
    const firmId = (await testDb().selectFrom("users").select("firm_id").where("id", "=", owner).executeTakeFirstOrThrow()).firm_id;
    const project = await testDb().insertInto("projects").values({ firm_id: firmId, name: "Marsh listening room", client_name: "Odile Marsh" }).returning("id").executeTakeFirstOrThrow();
    const room = await testDb().insertInto("rooms").values({ project_id: project.id, name: "Listening room", length_m: 5, width_m: 3.8, height_m: 2.6 }).returning("id").executeTakeFirstOrThrow();
    const baseline = await testDb().selectFrom("scenarios").select("id").where("room_id", "=", room.id).where("is_baseline", "=", true).executeTakeFirstOrThrow();
    await actAs("engineer");
    const d = await callRoute(reportsRoute.POST, { body: { roomId: room.id, scenarioIds: [baseline.id] } });
    expect(d.status).toBe(201);
    expect((await callRoute(issueRoute.POST, { params: { revisionId: d.json.revision.id }, body: {} })).status).toBe(200);
    expect((await callRoute(sendRoute.POST, { params: { revisionId: d.json.revision.id }, body: {} })).status).toBe(400);
    const after = await lastOutboxId();
    const s = await callRoute(sendRoute.POST, { params: { revisionId: d.json.revision.id }, body: { email: "odile.marsh@invented.example", name: "Odile Marsh" } });
    expect(s.status).toBe(200);
    expect(s.json.sent.invited).toBe(true);
    const invite = await waitForMail("odile.marsh@invented.example", after);
    const all = await testDb().selectFrom("dev_outbox").select(["subject", "text_body"]).where("id", ">", after).execute();
    expect(all.some((m) => m.text_body?.includes("/accept-invite?token="))).toBe(true);
    expect(all.some((m) => m.text_body?.includes(`/api/v1/reports/portal/${project.id}`))).toBe(true);
    expect(invite).toBeTruthy();
    const linked = await testDb().selectFrom("projects as p").innerJoin("users as u", "u.id", "p.client_user_id").select(["u.email", "u.role"]).where("p.id", "=", project.id).executeTakeFirstOrThrow();
    expect(linked).toEqual({ email: "odile.marsh@invented.example", role: "client" });
  }, 120_000);
});

describe("the portal link of report e-mails", () => {
  it("sends a signed-in person to the reports, anyone else through sign-in back there", async () => {
    const portal = await import("@/app/api/v1/reports/portal/[projectId]/route");
    const call = (projectId: string) => portal.GET(new Request(`http://eigenroom.test/api/v1/reports/portal/${projectId}`), { params: Promise.resolve({ projectId }) });
    await actAs("client");
    let res = await call(ids.projectId);
    expect(res.status).toBe(303);
    expect(new URL(res.headers.get("location")!).pathname).toBe(`/projects/${ids.projectId}/reports`);
    await actAs("anonymous");
    res = await call(ids.projectId);
    const to = new URL(res.headers.get("location")!);
    expect(to.pathname).toBe("/sign-in");
    expect(to.searchParams.get("next")).toBe(`/projects/${ids.projectId}/reports`);
    expect((await call("not-a-uuid")).status).toBe(404);
  });
});
