import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { openApiDocument } from "@/lib/api/openapi";

const apiRoot = path.resolve(__dirname, "../../app/api/v1");

/** Every route.ts under app/api/v1 as "METHOD /path" (Next's [param] → {param}). */
function routeFiles(dir = apiRoot): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) out.push(...routeFiles(full));
    else if (name === "route.ts") {
      const rel = "/" + path.relative(apiRoot, dir).split(path.sep).join("/");
      if (rel.includes("[...")) continue; // the JSON 404 catch-all
      const p = rel.replace(/\[(\w+)\]/g, "{$1}");
      const src = readFileSync(full, "utf8");
      for (const m of src.matchAll(/export (?:const|async function|function) (GET|POST|PUT|PATCH|DELETE)\b/g)) out.push(`${m[1]} ${p}`);
    }
  }
  return out.sort();
}

describe("openApiDocument", () => {
  const doc = openApiDocument() as { paths: Record<string, Record<string, { requestBody?: unknown }>>; components: { schemas: Record<string, unknown> } };

  it("documents exactly the route handlers that exist", () => {
    const documented = Object.entries(doc.paths)
      .flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m.toUpperCase()} ${p}`))
      .sort();
    expect(documented).toEqual(routeFiles());
  });

  it("resolves every $ref inside the document", () => {
    const refs = [...JSON.stringify(doc).matchAll(/"\$ref":"#\/components\/schemas\/([^"]+)"/g)].map((m) => m[1]!);
    for (const r of refs) expect(doc.components.schemas, r).toHaveProperty(r);
    expect(JSON.stringify(doc)).not.toContain("#/$defs/");
  });

  it("gives every POST/PATCH with a body its JSON schema", () => {
    expect(doc.paths["/projects"]?.post?.requestBody).toBeDefined();
    expect(doc.paths["/absorbers/spectrum"]?.post?.requestBody).toBeDefined();
  });
});
