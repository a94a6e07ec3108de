// The fee and file flows in Chromium against the built app, the fake S3 and the fake payment provider
// that npm test starts: the owner sets the fee, the engineer raises the invoice and adds a photo (and
// is refused a disguised program), the client pays on the provider's hosted page and comes back paid.
import sharp from "sharp";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { launchBrowser, newSession, screenshot, signIn } from "./support/browser";

const [owner, engineer, , client] = DEMO_ACCOUNTS;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function as<T>(account: (typeof DEMO_ACCOUNTS)[number], work: (page: Page) => Promise<T>): Promise<T> {
  const { context, page } = await newSession(browser);
  try {
    await signIn(page, account.email, account.password);
    return await work(page);
  } finally {
    await context.close();
  }
}

async function openHollis(page: Page) {
  await page.goto("/projects");
  await page.getByRole("link", { name: "Hollis media room" }).first().click();
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
}

describe("engineering fee and room files in the browser", () => {
  it("the owner sets the fee on /settings/fees", async () => {
    await as(owner!, async (page) => {
      await page.goto("/settings/fees");
      await page.getByLabel("Per project").check();
      await page.getByLabel("Amount").fill("850");
      await page.getByLabel("Currency").selectOption("EUR");
      await page.getByLabel(/Report downloads wait for payment/).check();
      await page.getByRole("button", { name: "Save fee" }).click();
      await page.getByText("Fee saved: €850.00 per project").waitFor({ timeout: 15_000 });
      await screenshot(page, "fee-settings");
    });
  });

  it("the engineer raises the invoice and adds a photo; a program renamed .jpg is refused with its reason", async () => {
    await as(engineer!, async (page) => {
      await openHollis(page);
      await page.getByRole("button", { name: "Raise invoice for €850.00" }).click();
      await page.locator("[data-invoice]").getByText("Open", { exact: true }).waitFor({ timeout: 15_000 });
      await page.getByRole("link", { name: /Media room/ }).first().click();
      await page.waitForURL(/\/rooms\/[0-9a-f-]{36}/);
      const jpeg = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 180, g: 140, b: 110 } } }).jpeg().toBuffer();
      const input = page.locator('input[type="file"]');
      await input.setInputFiles({ name: "front wall.jpg", mimeType: "image/jpeg", buffer: jpeg });
      await page.locator('[data-file="front wall.jpg"] img').waitFor({ timeout: 20_000 });
      const exe = Buffer.alloc(2048);
      exe.write("MZ", 0, "latin1");
      await input.setInputFiles({ name: "holiday.jpg", mimeType: "image/jpeg", buffer: exe });
      await page.getByText("“holiday.jpg” is a Windows program, not a picture or a PDF").waitFor({ timeout: 15_000 });
      // The drop zone (react-dropzone) turns away a plainly wrong type at once, in the server's words …
      await input.setInputFiles({ name: "notes.txt", mimeType: "text/plain", buffer: Buffer.from("just some notes") });
      await page.getByText("“notes.txt” is not a JPEG image, PNG image or WebP image. Export it in one of those formats and try again.").waitFor({ timeout: 10_000 });
      // … and is reached from the keyboard: a focusable button that says what it takes.
      const zone = page.getByRole("button", { name: /^Add files: drop them here, or press Enter to choose/ });
      await zone.focus();
      expect(await zone.evaluate((el) => el === document.activeElement && el.getAttribute("tabindex") === "0")).toBe(true);
      await screenshot(page, "room-files");
      // A drawing of 12 MB passes the app's proxy whole (Next caps proxied bodies at 10 MB unless configured).
      await page.getByLabel("Add as").selectOption("drawing");
      const large = Buffer.alloc(12 * 1024 * 1024, 0x20);
      large.write("%PDF-1.4\n", 0, "latin1");
      large.write("\n%%EOF\n", large.length - 7, "latin1");
      await input.setInputFiles({ name: "large section.pdf", mimeType: "application/pdf", buffer: large });
      await page.locator('[data-file="large section.pdf"]').waitFor({ timeout: 60_000 });
      await screenshot(page, "room-files-large");
    });
  });

  it("the client pays on the provider's hosted page and comes back to a paid invoice", async () => {
    await as(client!, async (page) => {
      await openHollis(page);
      await page.getByRole("button", { name: "Pay €850.00" }).click();
      await page.waitForURL(/\/pay\/cs_test_/, { timeout: 20_000 });
      await screenshot(page, "checkout-page");
      await page.getByRole("button", { name: "Pay €850.00" }).click();
      await page.waitForURL(/\/projects\/[0-9a-f-]{36}\?paid=/, { timeout: 20_000 });
      await page.getByText(/Payment received for “Engineering fee — Hollis media room”/).waitFor({ timeout: 20_000 });
      expect(await page.locator("[data-invoice]").getByText("Paid", { exact: true }).count()).toBe(1);
      expect(await page.getByRole("button", { name: /^Pay / }).count()).toBe(0);
      await screenshot(page, "invoice-paid");
    });
  });
});
