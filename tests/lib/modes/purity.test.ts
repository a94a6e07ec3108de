import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

// lib/modes must run unchanged in a browser Web Worker and on the server (DEVELOPERS.md, STYLE.md):
// only relative imports, zod and mathjs; no Node built-ins, no DOM, no Node globals.
const dir = fileURLToPath(new URL("../../../lib/modes/", import.meta.url));
const files = readdirSync(dir).filter((f) => f.endsWith(".ts"));

describe("lib/modes sources", () => {
  it("exist (the check below is not vacuous)", () => {
    expect(files.length).toBeGreaterThan(10);
    expect(files).toContain("index.ts");
  });
  for (const f of files) {
    it(`${f} imports only relative modules, zod and mathjs, and uses no Node or DOM globals`, () => {
      const src = readFileSync(dir + f, "utf8");
      const specifiers = [...src.matchAll(/\bfrom\s+"([^"]+)"/g), ...src.matchAll(/\bimport\s*\(\s*"([^"]+)"/g)].map((m) => m[1]!);
      for (const s of specifiers) expect(s.startsWith("./") || s === "zod" || s === "mathjs", `${f}: ${s}`).toBe(true);
      const code = src.replace(/\/\*[\s\S]*?\*\//g, "").replace(/\/\/.*$/gm, "");
      for (const g of ["process.", "Buffer", "require(", "window.", "document.", "globalThis.", "performance."]) expect(code.includes(g), `${f}: ${g}`).toBe(false);
    });
  }
});
