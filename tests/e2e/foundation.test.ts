// The foundation in a real Chromium: every demo role signs in and sees its navigation; an engineer
// creates a project and a room (in feet and inches); a client sees only their own project; a
// password is reset through the development outbox. Screenshots of every screen land in
// tests/e2e/screenshots/.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { resetTables, closeTestDb, testDb } from "../integration/support/db";
import { appUrl, closeOutbox, findLink, latestOutboxId, latestOutboxMessage, launchBrowser, newSession, screenshot, signIn } from "./support/browser";

const account = (i: number) => DEMO_ACCOUNTS[i]!;
let browser: Browser;

beforeAll(async () => {
  // The integration tests ran against the same database: start from the seeded demo again.
  await resetTables();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await closeOutbox();
  await closeTestDb();
});

async function navLabels(page: Page): Promise<string[]> {
  return (await page.getByRole("navigation", { name: "Main" }).getByRole("link").allInnerTexts()).map((s) => s.trim());
}

describe("each demo role sees its own navigation", () => {
  const cases: [number, string[], string][] = [
    [0, ["Projects", "Team", "Fees", "Prices", "Outbox"], "owner"],
    [1, ["Projects", "Team"], "engineer"],
    [2, ["My jobs"], "builder"],
    [3, ["My projects"], "client"],
  ];
  for (const [i, nav, role] of cases) {
    it(`${role} → ${nav.join(", ")}`, async () => {
      const { context, page } = await newSession(browser);
      try {
        await signIn(page, account(i).email, account(i).password);
        expect(new URL(page.url()).pathname).toBe("/projects");
        expect(await navLabels(page)).toEqual(nav);
        await screenshot(page, `projects-${role}`);
      } finally {
        await context.close();
      }
    });
  }

  it("a wrong password stays on the sign-in page with one clear message", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, account(1).email, "not-the-password", { expectSuccess: false });
      await expect.poll(() => page.getByRole("alert").first().innerText()).toContain("do not match");
      await screenshot(page, "sign-in-refused");
    } finally {
      await context.close();
    }
  });
});

describe("an engineer's first project", () => {
  it("creates a project, then a room entered in feet and inches", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, account(1).email, account(1).password);
      await page.getByRole("link", { name: "New project" }).first().click();
      await page.waitForURL("**/projects/new");
      await page.getByLabel("Project name").fill("Orchard listening room");
      await page.getByLabel("Client", { exact: true }).fill("Dara Whitcombe");
      await page.getByLabel("Site address").fill("9 Kestrel Mews, Lowbridge");
      await screenshot(page, "project-new");
      await page.getByRole("button", { name: "Create project" }).click();
      await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
      await expect.poll(() => page.getByRole("heading", { level: 1 }).innerText()).toBe("Orchard listening room");
      await screenshot(page, "project-empty");

      await page.getByRole("link", { name: "Add room" }).first().click();
      await page.waitForURL("**/rooms/new");
      await page.getByLabel("Room name").fill("Listening room");
      await page.getByRole("button", { name: "feet + inches" }).click();
      await page.getByLabel("Length, feet").fill("19");
      await page.getByLabel("Length, inches").fill("0");
      await page.getByLabel("Width, feet").fill("13");
      await page.getByLabel("Width, inches").fill("6");
      await page.getByLabel("Height, feet").fill("8");
      await page.getByLabel("Height, inches").fill("2");
      await screenshot(page, "room-new-imperial");
      await page.getByRole("button", { name: "Create room" }).click();
      await page.waitForURL(/\/rooms\/[0-9a-f-]{36}$/);
      await expect.poll(() => page.getByRole("heading", { level: 1 }).innerText()).toBe("Listening room");
      await screenshot(page, "room-page");

      // Stored in metres: 19 ft = 5.7912 m, 13 ft 6 in = 4.1148 m, 8 ft 2 in = 2.4892 m (1 ft = 0.3048 m exactly).
      const room = await testDb().selectFrom("rooms").selectAll().where("name", "=", "Listening room").executeTakeFirstOrThrow();
      expect(room.length_m).toBeCloseTo(5.7912, 6);
      expect(room.width_m).toBeCloseTo(4.1148, 6);
      expect(room.height_m).toBeCloseTo(2.4892, 6);
    } finally {
      await context.close();
    }
  });

  it("refuses an absurd room size with a message at the field and saves nothing", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, account(1).email, account(1).password);
      const project = await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
      const before = await testDb().selectFrom("rooms").select(testDb().fn.countAll().as("n")).executeTakeFirstOrThrow();
      await page.goto(appUrl(`/projects/${project.id}/rooms/new`));
      await page.getByLabel("Room name").fill("Impossible");
      await page.getByRole("button", { name: "metres" }).click();
      await page.getByLabel("Length in metres").fill("-3");
      await page.getByLabel("Width in metres").fill("4");
      await page.getByLabel("Height in metres").fill("250");
      await page.getByRole("button", { name: "Create room" }).click();
      await expect.poll(() => page.locator("#lengthM-error").innerText()).toMatch(/at least 0.5 m/);
      await expect.poll(() => page.locator("#heightM-error").innerText()).toMatch(/at most 100 m/);
      await screenshot(page, "room-new-errors");
      const after = await testDb().selectFrom("rooms").select(testDb().fn.countAll().as("n")).executeTakeFirstOrThrow();
      expect(Number(after.n)).toBe(Number(before.n));
    } finally {
      await context.close();
    }
  });
});

describe("a client sees only their own project", () => {
  it("lists one project and gets a not-found page for another client's project", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, account(3).email, account(3).password);
      const rows = await page.locator("tbody tr").count();
      expect(rows).toBe(1);
      expect(await page.locator("tbody").innerText()).toContain("Hollis media room");
      const other = await testDb().selectFrom("projects").select("id").where("name", "=", "Vale home studio").executeTakeFirstOrThrow();
      const response = await page.goto(appUrl(`/projects/${other.id}`));
      expect(response?.status()).toBe(404);
      await expect.poll(() => page.getByRole("heading", { level: 1 }).innerText()).toBe("Nothing here");
      await screenshot(page, "client-not-found");
      const api = await page.request.get(appUrl(`/api/v1/projects/${other.id}`));
      expect(api.status()).toBe(404);
      expect((await api.json()).error.code).toBe("not_found");
    } finally {
      await context.close();
    }
  });
});

describe("owner screens", () => {
  it("shows the team and the development outbox", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, account(0).email, account(0).password);
      await page.getByRole("link", { name: "Team" }).click();
      await page.waitForURL("**/members");
      await expect.poll(() => page.locator("tbody tr").count()).toBeGreaterThanOrEqual(5);
      await screenshot(page, "members");
      await page.getByRole("link", { name: "Outbox" }).click();
      await page.waitForURL("**/dev/outbox");
      await screenshot(page, "outbox");
    } finally {
      await context.close();
    }
  });
});

describe("password reset through the outbox", () => {
  it("sends a link, sets a new password, and signs in with it", async () => {
    const builder = account(2);
    const { context, page } = await newSession(browser);
    try {
      const after = await latestOutboxId();
      await page.goto(appUrl("/forgot-password"));
      await page.getByLabel("Email").fill(builder.email);
      await page.getByRole("button", { name: "Send the link" }).click();
      await expect.poll(() => page.getByRole("status").first().innerText()).toContain("on its way");
      await screenshot(page, "forgot-password-sent");
      const message = await latestOutboxMessage(builder.email, { afterId: after });
      const link = findLink(message, "/reset-password");
      await page.goto(link);
      await page.getByLabel("New password").fill("builder-new-pass-1");
      await page.getByLabel("Repeat the password").fill("builder-new-pass-1");
      await screenshot(page, "reset-password");
      await page.getByRole("button", { name: "Save and sign in" }).click();
      await page.waitForURL("**/projects");
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL("**/sign-in");
      await signIn(page, builder.email, "builder-new-pass-1");
      expect(await navLabels(page)).toEqual(["My jobs"]);
    } finally {
      await context.close();
    }
  });
});
