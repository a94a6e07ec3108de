// Responsive down to a tablet: at 768 px wide every main screen fits without sideways scrolling.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { closeTestDb, resetTables, testDb } from "../integration/support/db";
import { appUrl, launchBrowser, screenshot, signIn } from "./support/browser";

let browser: Browser;
let projectId: string;
let roomId: string;

beforeAll(async () => {
  await resetTables();
  browser = await launchBrowser();
  projectId = (await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow()).id;
  roomId = (await testDb().selectFrom("rooms").select("id").where("project_id", "=", projectId).executeTakeFirstOrThrow()).id;
});

afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe("a 768 px tablet", () => {
  it("shows every main screen without sideways scrolling", async () => {
    const context = await browser.newContext({ viewport: { width: 768, height: 1024 } });
    const page = await context.newPage();
    try {
      const engineer = DEMO_ACCOUNTS.find((a) => a.role === "engineer")!;
      await signIn(page, engineer.email, engineer.password);
      const screens: [string, string][] = [
        ["projects", "/projects"],
        ["project", `/projects/${projectId}`],
        ["room", `/rooms/${roomId}?tab=room`],
        ["low-end", `/rooms/${roomId}?tab=low-end`],
        ["absorbers", `/rooms/${roomId}?tab=absorbers`],
        ["decay", `/rooms/${roomId}?tab=decay`],
        ["design", `/rooms/${roomId}/design`],
        ["plan", `/rooms/${roomId}/plan`],
        ["build-sheet", `/projects/${projectId}/build-sheet`],
      ];
      const overflow: string[] = [];
      for (const [name, path] of screens) {
        await page.goto(appUrl(path));
        await page.waitForLoadState("networkidle");
        const { scroll, inner } = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, inner: window.innerWidth }));
        if (scroll > inner + 1) overflow.push(`${name}: ${scroll} px wide`);
        await screenshot(page, `tablet-${name}`);
      }
      expect(overflow).toEqual([]);
    } finally {
      await context.close();
    }
  });
});
