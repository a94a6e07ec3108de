import type { AnalysisItem, AnalysisRoom } from "@/lib/analysis";

/** Geometry of the room's plan (seen from above, front wall at the top), in pt. */
export interface PlanGeometry {
  width: number;
  height: number;
  room: { x: number; y: number; width: number; height: number };
  /** panels and resonators on walls (bars), floor and ceiling (rectangles), traps in corners (triangles) */
  items: { itemIndex: number; label: string; kind: "wall" | "floor" | "ceiling" | "corner" | "edge"; path: string; labelX: number; labelY: number }[];
  seats: { x: number; y: number; label: string; isMain: boolean }[];
  sources: { x: number; y: number; label: string; kind: "main-speaker" | "subwoofer" }[];
  /** dimension labels */
  lengthLabel: { x: number; y: number; text: string };
  widthLabel: { x: number; y: number; text: string };
  frontLabel: { x: number; y: number; text: string };
}

const r = (v: number) => Math.round(v * 100) / 100;

/**
 * Lays out a plan of the room: y (width, left wall to right wall) runs to the right, x (length, front
 * wall to rear wall) runs down the page; seats, sources and placed treatment items on top. Items are
 * numbered from 1 in the order given (the treatment table uses the same numbers).
 * @param maxWidthPt, maxHeightPt the box the plan must fit, pt
 * @example planGeometry(room, [], 400, 300).room.width // ≤ 400 − margins
 */
export function planGeometry(room: AnalysisRoom, items: readonly AnalysisItem[], maxWidthPt: number, maxHeightPt: number): PlanGeometry {
  if (!(maxWidthPt > 60 && maxHeightPt > 60)) throw new RangeError("maxWidthPt and maxHeightPt must exceed 60 pt");
  const margin = { left: 34, right: 14, top: 24, bottom: 22 };
  const s = Math.min((maxWidthPt - margin.left - margin.right) / room.widthM, (maxHeightPt - margin.top - margin.bottom) / room.lengthM);
  const rw = room.widthM * s, rh = room.lengthM * s;
  const ox = margin.left, oy = margin.top;
  const px = (yM: number) => r(ox + yM * s); // width axis → page x
  const py = (xM: number) => r(oy + xM * s); // length axis → page y
  const wall = 5;
  const out: PlanGeometry["items"] = [];
  items.forEach((item, i) => {
    const label = String(i + 1);
    const spec = item.spec;
    for (const p of item.placements) {
      if (p.kind === "surface") {
        if (spec.kind === "corner-trap") continue;
        const w = spec.widthM, h = spec.heightM;
        let path = "", lx = 0, ly = 0, kind: PlanGeometry["items"][number]["kind"] = "wall";
        switch (p.surface) {
          case "front":
          case "rear": {
            const y0 = p.surface === "front" ? py(0) : py(room.lengthM) - wall;
            path = `M${px(p.uM - w / 2)},${r(y0)}h${r(w * s)}v${wall}h${r(-w * s)}Z`;
            lx = px(p.uM);
            ly = p.surface === "front" ? y0 + wall + 8 : y0 - 3;
            break;
          }
          case "left":
          case "right": {
            const x0 = p.surface === "left" ? px(0) : px(room.widthM) - wall;
            path = `M${r(x0)},${py(p.uM - w / 2)}h${wall}v${r(w * s)}h${-wall}Z`;
            lx = p.surface === "left" ? x0 + wall + 5 : x0 - 5;
            ly = py(p.uM) + 3;
            break;
          }
          case "floor":
          case "ceiling": {
            kind = p.surface;
            path = `M${px(p.vM - h / 2)},${py(p.uM - w / 2)}h${r(h * s)}v${r(w * s)}h${r(-h * s)}Z`;
            lx = px(p.vM);
            ly = py(p.uM) + 3;
            break;
          }
        }
        out.push({ itemIndex: i, label, kind, path, labelX: r(lx), labelY: r(ly) });
      } else if (spec.kind === "corner-trap") {
        const d = Math.max(spec.depthM * s, 6);
        const c = p.corner;
        if (c === "front-left" || c === "front-right" || c === "rear-left" || c === "rear-right") {
          const cx = c.endsWith("left") ? px(0) : px(room.widthM);
          const cy = c.startsWith("front") ? py(0) : py(room.lengthM);
          const dx = c.endsWith("left") ? d : -d;
          const dy = c.startsWith("front") ? d : -d;
          out.push({ itemIndex: i, label, kind: "corner", path: `M${r(cx)},${r(cy)}h${r(dx)}L${r(cx)},${r(cy + dy)}Z`, labelX: r(cx + dx * 0.9), labelY: r(cy + dy * 0.9 + 3) });
        } else {
          // wall–ceiling edge: a dashed strip along the edge, as long as the trap
          const len = spec.lengthM * s;
          let path = "", lx = 0, ly = 0;
          if (c === "front-ceiling" || c === "rear-ceiling") {
            const y0 = c === "front-ceiling" ? py(0) : py(room.lengthM) - d;
            const x0 = px(room.widthM / 2) - len / 2;
            path = `M${r(x0)},${r(y0)}h${r(len)}v${r(d)}h${r(-len)}Z`;
            lx = x0 + len / 2;
            ly = y0 + d / 2 + 3;
          } else {
            const x0 = c === "left-ceiling" ? px(0) : px(room.widthM) - d;
            const y0 = py(room.lengthM / 2) - len / 2;
            path = `M${r(x0)},${r(y0)}h${r(d)}v${r(len)}h${r(-d)}Z`;
            lx = x0 + d / 2;
            ly = y0 + len / 2 + 3;
          }
          out.push({ itemIndex: i, label, kind: "edge", path, labelX: r(lx), labelY: r(ly) });
        }
      }
    }
  });
  return {
    width: r(ox + rw + margin.right),
    height: r(oy + rh + margin.bottom),
    room: { x: ox, y: oy, width: r(rw), height: r(rh) },
    items: out,
    seats: room.seats.map((seat, i) => ({ x: px(seat.yM), y: py(seat.xM), label: `S${i + 1}`, isMain: seat.isMain })),
    sources: room.sources.map((src, i) => ({ x: px(src.yM), y: py(src.xM), label: `${src.kind === "subwoofer" ? "W" : "M"}${room.sources.slice(0, i + 1).filter((x) => x.kind === src.kind).length}`, kind: src.kind })),
    lengthLabel: { x: r(ox - 8), y: r(oy + rh / 2), text: `${room.lengthM.toFixed(2)} m` },
    widthLabel: { x: r(ox + rw / 2), y: r(oy + rh + 15), text: `${room.widthM.toFixed(2)} m` },
    frontLabel: { x: r(ox + rw / 2), y: r(oy - 8), text: "FRONT" },
  };
}
