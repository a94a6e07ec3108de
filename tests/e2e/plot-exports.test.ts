// Every plot exports: on the Decay tab the RT plot downloads as a PNG image, an SVG drawing and its
// data as CSV, in a real Chromium. Also: a malformed percent-encoded API path answers JSON 400.
import { readFileSync } from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { closeTestDb, resetTables, testDb } from "../integration/support/db";
import { appUrl, launchBrowser, newSession, signIn } from "./support/browser";

let browser: Browser;
let roomId: string;

beforeAll(async () => {
  await resetTables();
  browser = await launchBrowser();
  const project = await testDb().selectFrom("projects").select("id").where("name", "=", "Hollis media room").executeTakeFirstOrThrow();
  roomId = (await testDb().selectFrom("rooms").select("id").where("project_id", "=", project.id).executeTakeFirstOrThrow()).id;
});

afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

async function download(page: Page, label: RegExp): Promise<{ name: string; bytes: Buffer }> {
  const [file] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: label }).first().click()]);
  return { name: file.suggestedFilename(), bytes: readFileSync((await file.path())!) };
}

describe("plot exports", () => {
  it("downloads the RT plot as PNG, SVG and CSV", async () => {
    const { context, page } = await newSession(browser);
    try {
      const engineer = DEMO_ACCOUNTS.find((a) => a.role === "engineer")!;
      await signIn(page, engineer.email, engineer.password);
      await page.goto(appUrl(`/rooms/${roomId}?tab=decay`));
      await page.getByRole("button", { name: /as CSV$/ }).first().waitFor();

      const csv = await download(page, /as CSV$/);
      expect(csv.name).toMatch(/\.csv$/);
      const text = csv.bytes.toString("utf8").replace(/^\uFEFF/, "");
      const lines = text.trim().split(/\r?\n/);
      expect(lines.length).toBeGreaterThanOrEqual(9); // a header and the eight octave bands at least
      expect(lines[0]).toMatch(/Hz/);

      const svg = await download(page, /as SVG drawing$/);
      expect(svg.name).toMatch(/\.svg$/);
      expect(svg.bytes.toString("utf8")).toMatch(/<svg[\s>]/);

      const png = await download(page, /as PNG image$/);
      expect(png.name).toMatch(/\.png$/);
      expect([...png.bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature (ISO/IEC 15948)
      expect(png.bytes.length).toBeGreaterThan(5_000);
    } finally {
      await context.close();
    }
  });
});

describe("API paths", () => {
  it("answers a malformed percent-encoded path with JSON 400, not a plain-text 500", async () => {
    const res = await fetch(appUrl("/api/v1/rooms/%FF"));
    expect(res.status).toBe(400);
    expect((await res.json()).error.code).toBe("bad_request");
    const unknown = await fetch(appUrl("/api/v1/no-such-thing"));
    expect(unknown.status).toBe(404);
    expect((await unknown.json()).error.code).toBe("not_found");
  });
});
