import { z } from "zod";

/** Body of POST /reports: the draft of a room's report. */
export const reportDraftSchema = z
  .object({
    roomId: z.uuid("Choose a room"),
    scenarioIds: z.array(z.uuid("Choose scenarios of this room")).min(1, "Choose at least one scenario").max(6, "At most six scenarios in one report").describe("Scenarios to include; the last is the recommendation"),
    paperSize: z.enum(["A4", "LETTER"]).default("A4").describe("A4 or US Letter"),
    note: z.string().trim().max(2000, "The note must be at most 2000 characters").default("").describe("A note from the engineer printed in the summary"),
  })
  .describe("Save the draft of a room's report (creates the report and its number on first use)");
export type ReportDraftBody = z.infer<typeof reportDraftSchema>;

/** Body of POST /reports/revisions/{id}/send. */
export const reportSendSchema = z
  .object({
    email: z.email("Enter the client's e-mail address").max(254).transform((s) => s.toLowerCase()).optional(),
    name: z.string().trim().min(1, "Enter the client's name").max(120).optional(),
  })
  .refine((v) => (v.email === undefined) === (v.name === undefined), { message: "Give both the client's e-mail address and name, or neither", path: ["email"] })
  .describe("Send an issued revision to the project's client; e-mail and name only when the project has no client account yet");

export const reportCommentSchema = z.object({ body: z.string().trim().min(1, "Write your question or answer").max(4000, "At most 4000 characters") }).describe("A question (client) or an answer (engineer)");
export const reportApproveSchema = z.object({ note: z.string().trim().max(1000, "At most 1000 characters").default("") }).describe("Approve the recommendation of an issued revision");
export const reportSettingsSchema = z.object({ attachPdf: z.boolean() }).describe("Whether report e-mails carry the signed PDF");

export const REPORT_NUMBER = /^ER-\d{4}-\d{4,}$/i;
export const reportVerifySchema = z
  .object({
    reportNumber: z.string().trim().regex(REPORT_NUMBER, "A report number looks like ER-2026-0001"),
    sha256: z.string().trim().regex(/^[0-9a-fA-F]{64}$/, "The SHA-256 is 64 hexadecimal characters"),
  })
  .describe("Check a report by its number and the SHA-256 of the file");

/** Largest PDF the public check accepts, bytes. */
export const MAX_VERIFY_BYTES = 20 * 1024 * 1024;
