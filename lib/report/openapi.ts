import type { EndpointDoc } from "@/lib/api/openapi";
import { reportApproveSchema, reportCommentSchema, reportDraftSchema, reportSendSchema, reportVerifySchema } from "./schemas";

/** Report, portal and verification endpoints (app/api/v1/reports, app/api/v1/verify). */
export const REPORT_ENDPOINTS: EndpointDoc[] = [
  { method: "get", path: "/reports", summary: "Reports of a project (?projectId=); clients see issued revisions only", tag: "Reports", success: 200 },
  { method: "post", path: "/reports", summary: "Save the draft of a room's report (owner, engineer)", tag: "Reports", body: reportDraftSchema, success: 201 },
  { method: "get", path: "/reports/{reportId}", summary: "One report with its revisions", tag: "Reports", success: 200 },
  { method: "get", path: "/reports/{reportId}/events", summary: "Audit log of a report (owner, engineer)", tag: "Reports", success: 200 },
  { method: "get", path: "/reports/{reportId}/comments", summary: "Question-and-answer thread", tag: "Reports", success: 200 },
  { method: "post", path: "/reports/{reportId}/comments", summary: "Ask (client) or answer (owner, engineer); the other side is e-mailed", tag: "Reports", body: reportCommentSchema, success: 201 },
  { method: "get", path: "/reports/revisions/{revisionId}/pdf", summary: "Signed PDF of an issued revision (records a download); a draft's unsigned preview for staff", tag: "Reports", success: 200 },
  { method: "post", path: "/reports/revisions/{revisionId}/issue", summary: "Render, sign and issue the draft (owner, engineer); supersedes the previous revision", tag: "Reports", success: 200 },
  { method: "post", path: "/reports/revisions/{revisionId}/send", summary: "E-mail an issued revision to the client (owner, engineer); invites a client without an account", tag: "Reports", body: reportSendSchema, success: 200 },
  { method: "post", path: "/reports/revisions/{revisionId}/approve", summary: "Approve the recommendation (the project's client)", tag: "Reports", body: reportApproveSchema, success: 201 },
  { method: "get", path: "/reports/portal/{projectId}", summary: "The link in report e-mails: signed-in members go to the project's reports, others to sign-in and back", tag: "Reports", success: 302 },
  { method: "post", path: "/verify", summary: "Public check of a report: multipart `file` (PDF) or JSON { reportNumber, sha256 } → valid / tampered / unknown", tag: "Reports", body: reportVerifySchema, success: 200, public: true },
];
