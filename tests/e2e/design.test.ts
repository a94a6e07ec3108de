// Treatment design to build sheet in a real Chromium: an engineer sizes bass traps for the demo room,
// adds the proposal to a new scenario and puts it on the build sheet; a builder opens the build sheet
// and marks an item built; the engineer sees the mark. Page open times are measured; screenshots of the
// design page, the plan, the build sheet (screen and print) and the price list land in
// tests/e2e/screenshots/.
import fs from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { closeTestDb, resetTables, testDb } from "../integration/support/db";
import { appUrl, launchBrowser, newSession, screenshot, SCREENSHOT_DIR, signIn } from "./support/browser";

const [owner, engineer, builder] = [DEMO_ACCOUNTS[0]!, DEMO_ACCOUNTS[1]!, DEMO_ACCOUNTS[2]!];
let browser: Browser;
const timings: Record<string, number> = {};
let roomId: string;
let projectId: string;

function watchErrors(page: Page, label: string) {
  page.on("pageerror", (e) => console.log(`[${label} pageerror] ${e.message}`));
  page.on("console", (m) => m.type() === "error" && console.log(`[${label} console] ${m.text()}`));
}

beforeAll(async () => {
  await resetTables();
  browser = await launchBrowser();
  const p = await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
  projectId = p.id;
  roomId = (await testDb().selectFrom("rooms").select("id").where("project_id", "=", p.id).executeTakeFirstOrThrow()).id;
});

afterAll(async () => {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  fs.writeFileSync(path.join(SCREENSHOT_DIR, "design-timings.json"), JSON.stringify(timings, null, 2));
  console.log("design page open times (ms):", timings);
  await browser?.close();
  await closeTestDb();
});

describe("from the sizer to the builder's mark", () => {
  it("an engineer sizes traps, adds them to a scenario and sends it to the build sheet; a builder marks an item built; the engineer sees it", async () => {
    const eng = await newSession(browser);
    watchErrors(eng.page, "engineer");
    const page = eng.page;
    await signIn(page, engineer.email, engineer.password);

    // the project page links to the build sheet
    await page.goto(appUrl(`/projects/${projectId}`));
    await page.getByTestId("build-sheet-link").waitFor();

    let t0 = Date.now();
    await page.goto(appUrl(`/rooms/${roomId}/design`));
    await page.getByTestId("sizer-items").waitFor({ timeout: 30_000 });
    await page.getByTestId("room-net").waitFor({ timeout: 30_000 });
    timings["design page (sizer and reflections shown)"] = Date.now() - t0;
    expect(await page.getByTestId("sizer-caveat").innerText()).toMatch(/Schroeder frequency/);
    expect(await page.getByTestId("sizer-reasons").locator("li").count()).toBeGreaterThan(0);

    // a change of objective is answered live
    const before = await page.getByTestId("sizer-items").innerText();
    t0 = Date.now();
    await page.getByLabel(/Least depth/).check();
    await page.waitForFunction((old) => document.querySelector('[data-testid="sizer-items"]')?.textContent !== old && document.querySelector('[data-testid="sizer-result"]')?.getAttribute("aria-busy") === "false", before.replace(/\n/g, ""), { timeout: 15_000 }).catch(() => undefined);
    timings["sizer answer after a change (incl. 200 ms debounce)"] = Date.now() - t0;
    const elapsed = await page.getByTestId("sizer-elapsed").innerText();
    console.log("sizer:", elapsed);
    await screenshot(page, "design-page");
    await page.locator("section", { has: page.getByRole("heading", { name: "Why this set" }) }).first().screenshot({ path: path.join(SCREENSHOT_DIR, "design-reasons.png") });
    await page.getByTestId("room-net").screenshot({ path: path.join(SCREENSHOT_DIR, "design-room-net.png") });

    // add the proposal to a new scenario (a copy of the sized one)
    const add = page.getByTestId("add-proposal");
    await add.getByLabel("Name of the new scenario").fill("Sized in the browser");
    await add.getByRole("button", { name: /^Add to scenario/ }).click();
    await add.getByRole("status").waitFor({ timeout: 20_000 });
    expect(await add.getByRole("status").innerText()).toMatch(/Added \d+ item/);
    const created = await testDb().selectFrom("scenarios").select(["id"]).where("room_id", "=", roomId).where("name", "=", "Sized in the browser").executeTakeFirstOrThrow();
    const items = await testDb().selectFrom("treatment_items").select(["name", "kind"]).where("scenario_id", "=", created.id).execute();
    expect(items.some((i) => i.name.startsWith("Floor-to-ceiling corner trap") || i.kind !== "porous-panel")).toBe(true);

    // the plan of that scenario, then put it on the build sheet
    t0 = Date.now();
    await add.getByRole("link", { name: "Open the treatment plan" }).click();
    await page.getByTestId("plan-items").waitFor();
    timings["treatment plan"] = Date.now() - t0;
    await page.getByRole("button", { name: "Build this scenario" }).click();
    await page.getByText("This scenario is on the project's build sheet.").waitFor({ timeout: 15_000 });
    await screenshot(page, "design-plan");

    // the builder
    const bld = await newSession(browser);
    watchErrors(bld.page, "builder");
    await signIn(bld.page, builder.email, builder.password);
    t0 = Date.now();
    await bld.page.goto(appUrl(`/projects/${projectId}/build-sheet`));
    await bld.page.getByTestId("job-totals").waitFor();
    timings["build sheet (builder)"] = Date.now() - t0;
    expect(await bld.page.getByText(`scenario “Sized in the browser”`).count()).toBeGreaterThan(0);
    expect(await bld.page.getByTestId("cautions").innerText()).toMatch(/respirator/);
    const firstItem = bld.page.getByTestId("progress-table").locator("tbody tr").first();
    const itemName = await firstItem.getAttribute("data-item");
    await firstItem.getByRole("button", { name: /^Mark .* built$/ }).click();
    await firstItem.getByTestId("built-cell").getByText(/by Rafe Lindqvist/).waitFor({ timeout: 15_000 });
    await screenshot(bld.page, "build-sheet");
    await bld.page.emulateMedia({ media: "print" });
    await screenshot(bld.page, "build-sheet-print");
    const pdf = await bld.page.pdf({ format: "A4", printBackground: true, margin: { top: "12mm", bottom: "12mm", left: "12mm", right: "12mm" } });
    fs.writeFileSync(path.join(SCREENSHOT_DIR, "build-sheet.pdf"), pdf);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    await bld.page.emulateMedia({ media: "screen" });
    await bld.context.close();

    // the engineer sees the builder's mark, and cannot mark
    t0 = Date.now();
    await page.goto(appUrl(`/projects/${projectId}/build-sheet`));
    await page.getByTestId("job-totals").waitFor();
    timings["build sheet (engineer)"] = Date.now() - t0;
    const row = page.getByTestId("progress-table").locator(`tbody tr[data-item="${itemName}"]`).first();
    expect(await row.getByTestId("built-cell").innerText()).toMatch(/by Rafe Lindqvist/);
    expect(await page.getByRole("button", { name: /^Mark / }).count()).toBe(0);
    await page.goto(appUrl(`/rooms/${roomId}/plan`));
    expect((await page.getByTestId("plan-progress").allInnerTexts()).some((t) => t.startsWith("built "))).toBe(true);
    await eng.context.close();

    // the owner's price list
    const own = await newSession(browser);
    await signIn(own.page, owner.email, owner.password);
    t0 = Date.now();
    await own.page.goto(appUrl("/settings/prices"));
    await own.page.getByRole("button", { name: "Save the price list" }).waitFor();
    timings["price list"] = Date.now() - t0;
    await own.page.getByLabel(/^Fabric per m²/).fill("12.5");
    await own.page.getByRole("button", { name: "Save the price list" }).click();
    await own.page.getByText(/version 2/).waitFor({ timeout: 15_000 });
    await screenshot(own.page, "price-list");
    await own.context.close();
  });
});
