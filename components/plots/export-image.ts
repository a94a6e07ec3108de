import { INK, plotFileName } from "@/lib/plots";

/** Style properties copied from the live document onto exported SVG nodes. */
const STYLE_PROPS = ["font-family", "font-size", "font-weight", "font-style", "font-variant-numeric", "font-feature-settings", "letter-spacing"] as const;

const TITLE_BAND_PX = 30;

/**
 * A standalone SVG document of a plot's <svg>: computed font styles inlined on every text node, the
 * title drawn at the top, a paper background, and @font-face rules for the fonts in use (embedded as
 * data URLs when `embedFonts`, which a PNG needs: an SVG drawn onto a canvas cannot load fonts).
 */
export async function standaloneSvg(svg: SVGSVGElement, title: string, embedFonts: boolean): Promise<{ text: string; width: number; height: number }> {
  const width = svg.width.baseVal.value || svg.getBoundingClientRect().width;
  const innerHeight = svg.height.baseVal.value || svg.getBoundingClientRect().height;
  const height = innerHeight + TITLE_BAND_PX;
  const clone = svg.cloneNode(true) as SVGSVGElement;
  const live = [svg, ...svg.querySelectorAll("*")];
  const copies = [clone, ...clone.querySelectorAll("*")];
  live.forEach((node, i) => {
    const copy = copies[i] as SVGElement | undefined;
    if (!copy || !(node instanceof SVGElement) || !(node instanceof SVGTextElement || node === svg)) return;
    const cs = getComputedStyle(node);
    copy.setAttribute("style", STYLE_PROPS.map((p) => `${p}:${cs.getPropertyValue(p)}`).join(";"));
  });
  const family = getComputedStyle(svg).fontFamily;
  const ns = "http://www.w3.org/2000/svg";
  const root = document.createElementNS(ns, "svg");
  root.setAttribute("xmlns", ns);
  root.setAttribute("width", String(width));
  root.setAttribute("height", String(height));
  root.setAttribute("viewBox", `0 0 ${width} ${height}`);
  root.setAttribute("style", `font-family:${family};font-variant-numeric:tabular-nums`);
  const style = document.createElementNS(ns, "style");
  style.textContent = await fontFaceCss(family, embedFonts);
  root.appendChild(style);
  const bg = document.createElementNS(ns, "rect");
  bg.setAttribute("width", String(width));
  bg.setAttribute("height", String(height));
  bg.setAttribute("fill", INK.raised);
  root.appendChild(bg);
  const heading = document.createElementNS(ns, "text");
  heading.setAttribute("x", "12");
  heading.setAttribute("y", "20");
  heading.setAttribute("font-size", "14");
  heading.setAttribute("font-weight", "600");
  heading.setAttribute("fill", INK.ink);
  heading.textContent = title;
  root.appendChild(heading);
  clone.setAttribute("x", "0");
  clone.setAttribute("y", String(TITLE_BAND_PX));
  clone.removeAttribute("class");
  root.appendChild(clone);
  return { text: new XMLSerializer().serializeToString(root), width, height };
}

/** @font-face rules of the document whose family appears in `fontFamily`, optionally with embedded sources. */
async function fontFaceCss(fontFamily: string, embed: boolean): Promise<string> {
  const wanted = fontFamily.split(",").map((f) => f.trim().replace(/^["']|["']$/g, "").toLowerCase());
  const rules: string[] = [];
  for (const sheet of Array.from(document.styleSheets)) {
    let list: CSSRuleList;
    try {
      list = sheet.cssRules;
    } catch {
      continue; // a cross-origin sheet cannot be read
    }
    for (const rule of Array.from(list)) {
      if (!(rule instanceof CSSFontFaceRule)) continue;
      const fam = rule.style.getPropertyValue("font-family").trim().replace(/^["']|["']$/g, "").toLowerCase();
      if (!wanted.includes(fam)) continue;
      let css = rule.cssText;
      if (embed) {
        const m = /url\(["']?([^"')]+)["']?\)/.exec(css);
        if (m?.[1]) {
          try {
            const url = new URL(m[1], sheet.href ?? document.baseURI).href;
            const blob = await (await fetch(url)).blob();
            css = css.replace(m[0], `url("${await asDataUrl(blob)}")`);
          } catch {
            // keep the plain reference: the PNG then falls back to a system font
          }
        }
      }
      rules.push(css);
    }
  }
  return rules.join("\n");
}

function asDataUrl(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error);
    reader.readAsDataURL(blob);
  });
}

/** Starts a download of `blob` named `fileName`. */
export function download(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** Downloads the plot as an SVG file named from its title. */
export async function downloadSvg(svg: SVGSVGElement, title: string): Promise<void> {
  const { text } = await standaloneSvg(svg, title, false);
  download(new Blob([text], { type: "image/svg+xml;charset=utf-8" }), plotFileName(title, "svg"));
}

/** Downloads the plot as a PNG at `scale` × its size (2× by default), drawn from the standalone SVG. */
export async function downloadPng(svg: SVGSVGElement, title: string, scale = 2): Promise<void> {
  const { text, width, height } = await standaloneSvg(svg, title, true);
  const img = new Image();
  img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(text)}`;
  await img.decode();
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext("2d");
  if (!ctx) throw new Error("This browser cannot draw on a canvas");
  ctx.scale(scale, scale);
  ctx.drawImage(img, 0, 0, width, height);
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
  if (!blob) throw new Error("The PNG could not be created");
  download(blob, plotFileName(title, "png"));
}

/** Downloads CSV text (with a UTF-8 byte-order mark so spreadsheets read α and ° correctly). */
export function downloadCsv(csv: string, title: string): void {
  download(new Blob(["\uFEFF", csv], { type: "text/csv;charset=utf-8" }), plotFileName(title, "csv"));
}
