// Report delivery in a real Chromium: the engineer issues (signs) and sends the demo room's report;
// the client opens the link from the development outbox, signs in, downloads the signed PDF (checked
// independently here), approves; the engineer sees the approval; the public check says "Genuine".
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { checkPdfSignature } from "@/lib/signing";
import { closeTestDb, resetTables, testDb } from "../integration/support/db";
import { appUrl, closeOutbox, findLink, latestOutboxId, latestOutboxMessage, launchBrowser, newSession, screenshot, signIn } from "./support/browser";

const engineer = DEMO_ACCOUNTS[1]!;
const client = DEMO_ACCOUNTS[3]!;
let browser: Browser;
let roomId = "";
let projectId = "";
let downloaded = "";

beforeAll(async () => {
  await resetTables();
  const project = await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
  projectId = project.id;
  roomId = (await testDb().selectFrom("rooms").select("id").where("project_id", "=", project.id).executeTakeFirstOrThrow()).id;
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await closeOutbox();
  await closeTestDb();
});

describe("report delivery", () => {
  it("the engineer saves a draft, issues (signs) and sends it; the client gets the e-mail", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, engineer.email, engineer.password);
      await page.goto(appUrl(`/rooms/${roomId}/report`));
      await page.getByRole("button", { name: "Save draft" }).click();
      await page.getByRole("link", { name: "Open preview (PDF)" }).waitFor({ timeout: 20_000 });
      await screenshot(page, "reports-compose-draft");
      const before = await latestOutboxId();
      await page.getByRole("button", { name: "Issue and sign" }).click();
      await page.getByRole("heading", { name: /^Send revision 1$/ }).waitFor({ timeout: 60_000 });
      await expect(page.locator('tr[data-status="issued"]').count()).resolves.toBe(1);
      await page.getByRole("button", { name: "Send to client" }).click();
      const mail = await latestOutboxMessage(client.email, { afterId: before, timeoutMs: 30_000 });
      expect(mail.subject).toMatch(/your room report ER-\d{4}-\d{4}, revision 1/);
      expect(mail.attachments.some((a) => a.contentType === "application/pdf")).toBe(true);
      expect(findLink(mail, `/api/v1/reports/portal/${projectId}`)).toBeTruthy();
      await screenshot(page, "reports-compose-issued");
    } finally {
      await context.close();
    }
  });

  it("the client opens the link, signs in, downloads the signed PDF and approves", async () => {
    const mail = await latestOutboxMessage(client.email);
    const link = findLink(mail, `/api/v1/reports/portal/${projectId}`);
    const { context, page } = await newSession(browser);
    try {
      await page.goto(link);
      expect(new URL(page.url()).pathname).toBe("/sign-in");
      expect(new URL(page.url()).searchParams.get("next")).toBe(`/projects/${projectId}/reports`);
      await page.getByLabel("Email", { exact: true }).fill(client.email);
      await page.getByLabel("Password", { exact: true }).fill(client.password);
      await page.getByRole("button", { name: "Sign in", exact: true }).click();
      // The sign-in action redirects to the page the link asked for (a client-side navigation).
      await expect.poll(() => new URL(page.url()).pathname, { timeout: 20_000 }).toBe(`/projects/${projectId}/reports`);
      await page.getByRole("heading", { name: "Reports", exact: true }).waitFor();
      await expect(page.locator('tr[data-status="draft"]').count()).resolves.toBe(0);
      const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download PDF" }).first().click()]);
      downloaded = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "er-e2e-")), "report.pdf");
      await download.saveAs(downloaded);
      const bytes = fs.readFileSync(downloaded);
      expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
      expect(checkPdfSignature(bytes).status).toBe("intact");
      await page.getByRole("button", { name: /Approve the recommendation/ }).click();
      await page.getByText("You approved revision 1.").waitFor({ timeout: 20_000 });
      await screenshot(page, "reports-client-portal");
    } catch (error) {
      await screenshot(page, "reports-client-failed").catch(() => undefined);
      throw new Error(`${(error as Error).message}\n(page at ${page.url()})`);
    } finally {
      await context.close();
    }
  });

  it("the engineer sees the approval and the audit log", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, engineer.email, engineer.password);
      await page.goto(appUrl(`/projects/${projectId}/reports`));
      const row = page.locator('tr[data-status="issued"]');
      await expect(row.innerText()).resolves.toMatch(/Priya Hollis/);
      for (const kind of ["issued", "sent", "viewed", "downloaded", "approved"]) {
        expect(await page.locator(`tr[data-event="${kind}"]`).count(), kind).toBeGreaterThan(0);
      }
      await screenshot(page, "reports-engineer-audit");
    } finally {
      await context.close();
    }
  });

  it("the public check page says the downloaded file is genuine", async () => {
    const { context, page } = await newSession(browser);
    try {
      await page.goto(appUrl("/verify"));
      await page.getByLabel("The report's PDF").setInputFiles(downloaded);
      await page.getByRole("button", { name: "Check the file" }).click();
      const status = page.locator('[data-verdict]');
      await status.waitFor({ timeout: 20_000 });
      expect(await status.getAttribute("data-verdict")).toBe("valid");
      await expect(status.innerText()).resolves.toMatch(/Genuine[\s\S]*Media room/);
      await screenshot(page, "reports-verify");
    } finally {
      await context.close();
    }
  });
});
