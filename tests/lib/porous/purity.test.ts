import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

// DEVELOPERS.md / STYLE.md: lib/<topic> imports nothing from React, Next, db/ or the DOM, and nothing
// Node-only, so the same code runs in a Web Worker, a route handler and a PDF renderer.
const ROOT = join(__dirname, "..", "..", "..");
const ALLOWED = /^(\.\/|\.\.\/|@\/lib\/(porous|reverb|complex)$|zod$)/;

describe("lib/porous, lib/reverb, lib/complex — portable imports only", () => {
  for (const dir of ["lib/porous", "lib/reverb", "lib/complex"]) {
    it(`${dir} imports only its siblings, the other pure topics and zod; uses no DOM or Node globals`, () => {
      for (const file of readdirSync(join(ROOT, dir)).filter((f) => f.endsWith(".ts"))) {
        const text = readFileSync(join(ROOT, dir, file), "utf8");
        for (const m of text.matchAll(/from\s+"([^"]+)"/g)) expect(m[1], `${dir}/${file}`).toMatch(ALLOWED);
        expect(text, `${dir}/${file}`).not.toMatch(/\b(window|document|process|Buffer|require)\b[.(]/);
      }
    });
  }
});
