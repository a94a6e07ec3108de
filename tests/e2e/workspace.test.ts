// The room workspace in a real Chromium: an engineer creates a room in feet and inches, adds seats
// and a subwoofer, opens every tab, drags the subwoofer and sees the evenness map and the seat
// responses change, saves a build, creates a treated scenario and compares it with the baseline.
// The demo room's tabs are opened and timed; screenshots of every tab land in tests/e2e/screenshots/.
import fs from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { closeTestDb, resetTables, testDb } from "../integration/support/db";
import { appUrl, launchBrowser, newSession, screenshot, SCREENSHOT_DIR, signIn } from "./support/browser";

const engineer = DEMO_ACCOUNTS[1]!;
let browser: Browser;
const timings: Record<string, number> = {};

beforeAll(async () => {
  await resetTables();
  browser = await launchBrowser();
});

afterAll(async () => {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  fs.writeFileSync(path.join(SCREENSHOT_DIR, "workspace-timings.json"), JSON.stringify(timings, null, 2));
  console.log("workspace tab open times (ms):", timings);
  await browser?.close();
  await closeTestDb();
});

/** Browser errors of a page, printed (a failing worker or script shows up here). */
function watchErrors(page: Page, label: string) {
  page.on("console", (m) => m.type() === "error" && console.log(`[${label} console] ${m.text()}`));
  page.on("pageerror", (e) => console.log(`[${label} pageerror] ${e.message}`));
  page.on("requestfailed", (r) => !r.url().includes("_rsc=") && r.failure()?.errorText !== "net::ERR_ABORTED" && console.log(`[${label} requestfailed] ${r.url()} ${r.failure()?.errorText ?? ""}`));
}

/** A close-up PNG of one panel, beside the full-page screenshots. */
async function closeUp(page: Page, selector: string, name: string) {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.locator(selector).first().screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`) });
}

const tab = (page: Page, name: string) => page.getByRole("navigation", { name: "Room sections" }).getByRole("link", { name, exact: true });

/** The text of the evenness-map summary once a map has finished. */
async function mapSummary(page: Page): Promise<string> {
  const loc = page.getByTestId("flatness-summary");
  try {
    await loc.waitFor({ timeout: 30_000 });
  } catch (e) {
    await screenshot(page, "flatness-timeout");
    const status = await page.locator("#flatness-title").locator("xpath=../..").innerText().catch(() => "");
    throw new Error(`the evenness map did not finish; the panel says: ${status.slice(0, 400)}`, { cause: e });
  }
  return loc.innerText();
}

async function seatSpreads(page: Page): Promise<string> {
  return (await page.locator("[data-seat-spread]").allInnerTexts()).join(" | ");
}

async function drag(page: Page, selector: string, dx: number, dy: number) {
  // the marker's own hit circle (the group's box also holds its label), scrolled into the viewport:
  // mouse coordinates outside the viewport reach nothing
  const hit = page.locator(`${selector} > circle`).first();
  await hit.scrollIntoViewIfNeeded();
  await page.evaluate(() => window.scrollBy(0, 200));
  const box = await hit.boundingBox();
  if (!box) throw new Error(`${selector} is not on screen`);
  const x = box.x + box.width / 2, y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  for (let i = 1; i <= 8; i++) await page.mouse.move(x + (dx * i) / 8, y + (dy * i) / 8);
  await page.mouse.up();
}

describe("the demo media room opens on every tab", () => {
  it("shows the plan, the low end, the absorbers and the decay, each timed", async () => {
    const { context, page } = await newSession(browser);
    try {
      watchErrors(page, "demo");
      await signIn(page, engineer.email, engineer.password);
      const room = await testDb().selectFrom("rooms").select("id").where("name", "=", "Media room").executeTakeFirstOrThrow();
      const checks: [string, string, () => Promise<unknown>][] = [
        ["room", "demo-room", () => page.locator('g[data-kind="subwoofer"]').first().waitFor()],
        ["low-end", "demo-low-end", () => mapSummary(page)],
        ["absorbers", "demo-absorbers", () => page.getByText("Single-number ratings").waitFor()],
        ["decay", "demo-decay", () => page.getByTestId("deviation-table").waitFor()],
      ];
      for (const [id, shot, ready] of checks) {
        const t0 = Date.now();
        await page.goto(appUrl(`/rooms/${room.id}?tab=${id}`));
        await ready();
        timings[`demo ${id}`] = Date.now() - t0;
        await screenshot(page, shot);
      }
      // the demo has five seats, mains and two subwoofers, and the low end lists modes and seat spreads
      await page.goto(appUrl(`/rooms/${room.id}?tab=low-end`));
      await mapSummary(page);
      expect(await page.locator("[data-seat-spread]").count()).toBe(5);
      // the mode table filters by kind
      const rowsAll = await page.locator("table", { hasText: "Order nx ny nz" }).locator("tbody tr").count();
      await page.getByRole("checkbox", { name: /^oblique/ }).uncheck();
      await page.getByRole("checkbox", { name: /^tangential/ }).uncheck();
      const axialRows = await page.locator("table", { hasText: "Order nx ny nz" }).locator("tbody tr").count();
      expect(axialRows).toBeGreaterThan(0);
      expect(axialRows).toBeLessThan(rowsAll);
      expect(await page.locator("table", { hasText: "Order nx ny nz" }).locator("tbody").innerText()).not.toMatch(/tangential|oblique/);
      await screenshot(page, "demo-low-end-axial-only");
      await closeUp(page, 'section[aria-labelledby="flatness-title"]', "closeup-evenness-map");
      await closeUp(page, 'section[aria-labelledby="seat-response-title"]', "closeup-seat-responses");

      const t0 = Date.now();
      await page.goto(appUrl(`/rooms/${room.id}/compare`));
      await page.getByTestId("compare-summary").waitFor();
      timings["demo compare"] = Date.now() - t0;
      expect(await page.getByTestId("compare-summary").locator("tbody tr").count()).toBe(3);
      await screenshot(page, "demo-compare");
    } finally {
      await context.close();
    }
  });
});

describe("an engineer's new room, end to end", () => {
  it("creates a room in feet and inches, places seats and a subwoofer, drags it, treats the room and compares", async () => {
    const { context, page } = await newSession(browser);
    try {
      watchErrors(page, "new room");
      await signIn(page, engineer.email, engineer.password);
      const project = await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
      await page.goto(appUrl(`/projects/${project.id}/rooms/new`));
      await page.getByLabel("Room name").fill("Den");
      await page.getByRole("button", { name: "feet + inches" }).click();
      await page.getByLabel("Length, feet").fill("18");
      await page.getByLabel("Length, inches").fill("6");
      await page.getByLabel("Width, feet").fill("13");
      await page.getByLabel("Width, inches").fill("2");
      await page.getByLabel("Height, feet").fill("8");
      await page.getByLabel("Height, inches").fill("4");
      await page.getByRole("button", { name: "Create room" }).click();
      await page.waitForURL(/\/rooms\/[0-9a-f-]{36}$/);
      const roomId = new URL(page.url()).pathname.split("/")[2]!;
      const room = await testDb().selectFrom("rooms").selectAll().where("id", "=", roomId).executeTakeFirstOrThrow();
      expect(room.length_m).toBeCloseTo(18 * 0.3048 + 6 * 0.0254, 6);

      // this engineer works in feet and inches from here on
      await page.getByRole("group", { name: "Units" }).getByRole("button", { name: "ft·in" }).click();
      await expect.poll(() => page.getByRole("heading", { level: 1 }).locator("xpath=..").innerText(), { timeout: 10_000 }).toContain("18′ 6″ × 13′ 2″ × 8′ 4″");

      // an empty room says how to add a seat
      await expect.poll(() => page.getByText("No seats yet.").count()).toBe(1);
      await screenshot(page, "new-room-empty");

      // two seats and a subwoofer
      await page.getByRole("button", { name: "Seat", exact: true }).click();
      await expect.poll(() => page.locator('g[data-kind="seat"]').count()).toBe(1);
      await page.getByRole("button", { name: "Seat", exact: true }).click();
      await expect.poll(() => page.locator('g[data-kind="seat"]').count()).toBe(2);
      await page.getByRole("button", { name: "Subwoofer", exact: true }).click();
      await expect.poll(() => page.locator('g[data-kind="subwoofer"]').count()).toBe(1);
      const positions = () => testDb().selectFrom("room_positions").selectAll().where("room_id", "=", roomId).execute();
      await expect.poll(async () => (await positions()).length).toBe(3);

      // the keyboard moves a seat: focus it, arrow right twice (2 in each in feet and inches)
      const seat2 = (await positions()).find((p) => p.name === "Seat 2")!;
      await page.locator(`g[data-position-id="${seat2.id}"]`).focus();
      await page.keyboard.press("ArrowRight");
      await page.keyboard.press("ArrowRight");
      await expect.poll(async () => (await positions()).find((p) => p.id === seat2.id)!.x_m, { timeout: 10_000 }).toBeCloseTo(seat2.x_m + 2 * 0.0508, 2);
      await screenshot(page, "new-room-placed");

      // low end: the map and the seat responses, then drag the subwoofer on the map
      await tab(page, "Low end").click();
      await page.waitForURL(/tab=low-end/);
      const mapBefore = await mapSummary(page);
      const spreadsBefore = await seatSpreads(page);
      expect(spreadsBefore.split("|").length).toBe(2);
      await screenshot(page, "new-room-low-end");
      const sub = (await positions()).find((p) => p.kind === "subwoofer")!;
      await drag(page, `g[data-position-id="${sub.id}"]`, 260, -120);
      await expect.poll(() => seatSpreads(page), { timeout: 15_000 }).not.toBe(spreadsBefore);
      await expect.poll(() => mapSummary(page), { timeout: 30_000 }).not.toBe(mapBefore);
      await expect.poll(async () => (await positions()).find((p) => p.id === sub.id)!.x_m, { timeout: 10_000 }).toBeGreaterThan(sub.x_m + 0.5);
      await screenshot(page, "new-room-low-end-after-drag");

      // the "where to put a subwoofer" map, with its cancel
      await page.getByRole("button", { name: "Where to put a subwoofer" }).click();
      await mapSummary(page);
      await screenshot(page, "new-room-low-end-sub-map");

      // absorbers: design a stack and save it to the library
      await tab(page, "Absorbers").click();
      await page.getByText("Single-number ratings").waitFor();
      await page.getByLabel("Build name").fill("Den rear panel, 4 in wool");
      await page.getByRole("button", { name: "Save build" }).click();
      await expect.poll(() => page.getByText("is in the library").count(), { timeout: 10_000 }).toBe(1);
      await screenshot(page, "new-room-absorbers");
      await closeUp(page, 'form[aria-label="Layer designer"]', "closeup-layer-stack");
      expect(await testDb().selectFrom("builds").select("id").where("name", "=", "Den rear panel, 4 in wool").executeTakeFirst()).toBeTruthy();

      // decay: a treated scenario from the baseline, with six of the new panels on the rear wall
      await tab(page, "Decay").click();
      await page.getByTestId("deviation-table").waitFor();
      const baselineRow = await page.getByTestId("deviation-table").locator("tr", { hasText: "Predicted (s)" }).innerText();
      await screenshot(page, "new-room-decay-baseline");
      await page.getByRole("button", { name: "New from baseline" }).click();
      await page.getByLabel("Scenario name").fill("Rear panels");
      await page.getByRole("button", { name: "Create scenario" }).click();
      await expect.poll(() => page.getByRole("heading", { name: "Treatment in “Rear panels”" }).count(), { timeout: 10_000 }).toBe(1);
      await page.getByRole("button", { name: "Add from the library" }).click();
      await page.getByLabel("Build from the library").selectOption({ label: "Den rear panel, 4 in wool (porous panel)" });
      await page.getByLabel("Count").fill("6");
      await page.getByLabel("Unit cost").fill("85");
      await page.getByRole("button", { name: "Add item" }).click();
      await expect.poll(() => page.getByRole("cell", { name: "510.00" }).count(), { timeout: 10_000 }).toBeGreaterThan(0);
      await expect.poll(() => page.getByTestId("deviation-table").locator("tr", { hasText: "Predicted (s)" }).innerText(), { timeout: 10_000 }).not.toBe(baselineRow);
      await screenshot(page, "new-room-decay-treated");
      await closeUp(page, 'section[aria-labelledby="deviation-title"]', "closeup-deviation");
      await closeUp(page, 'section[aria-labelledby="items-title"]', "closeup-items");

      // compare with the baseline
      await page.getByRole("link", { name: "Compare scenarios" }).click();
      await page.waitForURL(/\/compare/);
      const summary = page.getByTestId("compare-summary");
      await summary.waitFor();
      await expect.poll(() => summary.locator("tbody tr").count()).toBe(2);
      expect(await summary.innerText()).toContain("Rear panels");
      expect(await summary.innerText()).toContain("510.00");
      await screenshot(page, "new-room-compare");
    } finally {
      await context.close();
    }
  });

  it("a stale save says someone else changed it and offers a reload", async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, engineer.email, engineer.password);
      const room = await testDb().selectFrom("rooms").select(["id", "version"]).where("name", "=", "Den").executeTakeFirstOrThrow();
      await page.goto(appUrl(`/rooms/${room.id}?tab=room`));
      await page.locator('g[data-kind="seat"]').first().waitFor();
      // someone else saves the room meanwhile
      await testDb().updateTable("rooms").set({ version: room.version + 1 }).where("id", "=", room.id).execute();
      await page.locator('g[data-kind="seat"]').first().focus();
      await page.keyboard.press("ArrowUp");
      await expect.poll(() => page.getByText("Someone else changed this room or scenario").count(), { timeout: 10_000 }).toBe(1);
      await screenshot(page, "conflict-banner");
      await page.getByRole("button", { name: "Reload" }).click();
      await expect.poll(() => page.getByText("Someone else changed this room or scenario").count(), { timeout: 10_000 }).toBe(0);
    } finally {
      await context.close();
    }
  });
});
