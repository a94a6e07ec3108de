/**
 * Static preview of every plot, for looking at them without building the app: renders the gallery to
 * static markup (react-dom/server), compiles the Tailwind classes it uses with the app's globals.css,
 * embeds the shipped fonts, and screenshots the page in Debian's Chromium (playwright-core), in colour,
 * in greyscale and with print media, at a desktop and a narrow width.
 *
 *   npx tsx components/plots/preview/render-preview.tsx [outDir=/tmp/eigenroom-plots]
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { compile } from "@tailwindcss/node";
import { chromium } from "playwright-core";
import { renderToStaticMarkup } from "react-dom/server";
import { PlotGallery } from "./gallery";
import { sampleData } from "./sample-data";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");
const outDir = process.argv[2] ?? "/tmp/eigenroom-plots";

async function tailwindCss(html: string): Promise<string> {
  const appDir = path.join(root, "app");
  const source = readFileSync(path.join(appDir, "globals.css"), "utf8");
  const compiler = await compile(source, { base: appDir, onDependency: () => {} });
  const candidates = new Set<string>();
  for (const m of html.matchAll(/class="([^"]*)"/g)) for (const c of m[1]!.split(/\s+/)) if (c) candidates.add(c);
  return compiler.build([...candidates]);
}

function fontFaces(): string {
  const font = (file: string) => `url(data:font/woff2;base64,${readFileSync(path.join(root, "app/fonts", file)).toString("base64")}) format("woff2")`;
  return `
@font-face { font-family: "Inter"; src: ${font("inter-latin-wght-normal.woff2")}; font-weight: 100 900; font-display: block; }
@font-face { font-family: "Inter Greek"; src: ${font("inter-greek-wght-normal.woff2")}; font-weight: 100 900; font-display: block; unicode-range: U+0370-03FF, U+1F00-1FFF; }
@font-face { font-family: "Source Serif"; src: ${font("source-serif-4-latin-wght-normal.woff2")}; font-weight: 200 900; font-display: block; }
:root { --font-inter: "Inter"; --font-inter-greek: "Inter Greek"; --font-serif: "Source Serif"; }`;
}

async function main() {
  mkdirSync(outDir, { recursive: true });
  const data = sampleData();
  const pages: { name: string; width: number; plotWidth: number }[] = [
    { name: "desktop", width: 1120, plotWidth: 1054 },
    { name: "narrow", width: 520, plotWidth: 454 },
  ];
  const userDataDir = mkdtempSync(path.join(tmpdir(), "eigenroom-plots-chromium-"));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    viewport: { width: 1120, height: 900 },
  });
  try {
    for (const p of pages) {
      const body = renderToStaticMarkup(<PlotGallery data={data} fallbackWidth={p.plotWidth} />);
      const css = await tailwindCss(body);
      const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Plot preview (${p.name})</title>
<style>${fontFaces()}</style><style>${css}</style><style>body{font-family:var(--font-inter),system-ui,sans-serif;margin:0;padding:32px}</style></head>
<body class="font-sans"><main style="max-width:${p.plotWidth + 34}px">${body}</main></body></html>`;
      const file = path.join(outDir, `${p.name}.html`);
      writeFileSync(file, html);
      const page = await context.newPage();
      await page.setViewportSize({ width: p.width, height: 900 });
      await page.goto(`file://${file}`);
      await page.evaluate(() => document.fonts.ready.then(() => undefined));
      const figures = page.locator("figure");
      const count = await figures.count();
      for (let i = 0; i < count; i++) await figures.nth(i).screenshot({ path: path.join(outDir, `${p.name}-${i + 1}.png`) });
      await page.addStyleTag({ content: "html { filter: grayscale(1); }" });
      for (let i = 0; i < count; i++) await figures.nth(i).screenshot({ path: path.join(outDir, `${p.name}-${i + 1}-grey.png`) });
      await page.emulateMedia({ media: "print" });
      await page.screenshot({ path: path.join(outDir, `${p.name}-print.png`), fullPage: true });
      await page.close();
      console.log(`${p.name}: ${count} figures → ${outDir}`);
    }
  } finally {
    await context.close();
    rmSync(userDataDir, { recursive: true, force: true });
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
