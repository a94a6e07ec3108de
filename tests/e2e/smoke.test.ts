// The test app answers and its sign-in page renders in Chromium.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { appUrl, launchBrowser, newSession, screenshot } from "./support/browser";

describe("smoke: the app under test", () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it("GET /sign-in answers 200 with an HTML page", async () => {
    const res = await fetch(appUrl("/sign-in"), { redirect: "manual" });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type") ?? "").toMatch(/^text\/html/);
    // next.config.ts turns the framework banner header off.
    expect(res.headers.get("x-powered-by")).toBeNull();
  });

  it("the sign-in page shows a visible, enabled \"Sign in\" button in Chromium", async () => {
    const { context, page } = await newSession(browser);
    try {
      const response = await page.goto(appUrl("/sign-in"));
      expect(response?.status()).toBe(200);
      const button = page.getByRole("button", { name: "Sign in", exact: true });
      await button.waitFor({ state: "visible", timeout: 15_000 });
      expect(await button.count()).toBe(1);
      expect(await button.isEnabled()).toBe(true);
      await screenshot(page, "smoke-sign-in");
    } finally {
      await context.close();
    }
  });
});
