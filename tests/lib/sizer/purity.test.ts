import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

// DEVELOPERS.md / STYLE.md: lib/<topic> imports nothing from React, Next, db/ or the DOM, and nothing
// Node-only, so the same code runs in a Web Worker, a route handler and a PDF renderer.
const ROOT = join(__dirname, "..", "..", "..");
// lib/schemas holds the zod schemas shared by forms and the API: pure as well.
const ALLOWED = /^(\.\/|\.\.\/|@\/lib\/(porous|reverb|modes|complex|build-sheet|reflections|sizer)$|@\/lib\/schemas\/[\w-]+$|zod$)/;

describe("lib/sizer, lib/reflections, lib/build-sheet — portable imports only", () => {
  for (const dir of ["lib/sizer", "lib/reflections", "lib/build-sheet"]) {
    it(`${dir} imports only its siblings, the other pure topics and zod; uses no DOM or Node globals`, () => {
      const files = readdirSync(join(ROOT, dir)).filter((f) => f.endsWith(".ts"));
      expect(files).toContain("index.ts");
      expect(files).toContain("schemas.ts");
      for (const file of files) {
        const text = readFileSync(join(ROOT, dir, file), "utf8");
        for (const m of text.matchAll(/from\s+"([^"]+)"/g)) expect(m[1], `${dir}/${file}`).toMatch(ALLOWED);
        expect(text, `${dir}/${file}`).not.toMatch(/\b(window|document|process|Buffer|require)\b[.(]/);
      }
    });
  }
});
