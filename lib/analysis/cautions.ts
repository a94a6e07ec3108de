import { porousMaterial } from "@/lib/porous";
import type { AnalysisItem, Caution } from "./types";

/** Mass of one unit above which a wall or ceiling fixing needs care, kg (common practice). */
export const HEAVY_UNIT_KG = 15;

const FIBRE_GENERIC =
  "If the fill is mineral or glass wool, its fibres irritate skin, eyes and airways: handle it with gloves, long sleeves, eye protection and a particulate mask, and keep it covered with fabric.";
const FIRE =
  "Check the fire classification of the fill, the facing and the frame against local building codes before installing.";

/**
 * Cautions for the screens and the build sheet, per item: fibres and fire classification of porous
 * fills (from the lib/porous material when the item names one), heavy units on walls or ceilings,
 * anything hung overhead, tall traps that can topple. Wording defers to local codes and licensed
 * professionals (DEVELOPERS.md, Safety).
 * @example itemCautions([{ id: 'a', name: 'Trap', spec: trapSpec, count: 4, ... }]).map((c) => c.code) // ['fibres', 'fire', 'topple']
 */
export function itemCautions(items: readonly AnalysisItem[]): Caution[] {
  const out: Caution[] = [];
  for (const item of items) {
    const s = item.spec;
    const porous = s.kind === "porous-panel" || s.kind === "corner-trap";
    if (porous) {
      const m = s.materialId ? porousMaterial(s.materialId) : undefined;
      if (m) out.push({ itemId: item.id, code: m.family === "mineral-wool" || m.family === "glass-fibre" ? "fibres" : "fire", message: m.caution });
      else out.push({ itemId: item.id, code: "fibres", message: FIBRE_GENERIC });
      if (!m || m.family === "mineral-wool" || m.family === "glass-fibre") out.push({ itemId: item.id, code: "fire", message: FIRE });
    }
    const overhead = item.placements.some((p) => (p.kind === "surface" && p.surface === "ceiling") || (p.kind === "corner" && p.corner.endsWith("-ceiling")));
    if (overhead || (s.kind === "corner-trap" && s.orientation === "wall-ceiling"))
      out.push({ itemId: item.id, code: "overhead", message: "Hangs over people: fix it into the structure (joists, not the ceiling board alone) with fixings rated for its weight; mind wiring and pipes before drilling." });
    if (item.unitMassKg !== null && item.unitMassKg > HEAVY_UNIT_KG && !(s.kind === "corner-trap" && s.orientation === "floor-to-ceiling"))
      out.push({ itemId: item.id, code: "heavy", message: `Each unit weighs about ${item.unitMassKg} kg: fix it to studs or masonry with fixings rated for the load, not to the wall board alone; follow local codes, or ask a licensed professional.` });
    if (s.kind === "corner-trap" && s.orientation === "floor-to-ceiling")
      out.push({ itemId: item.id, code: "topple", message: "A full-height trap is heavy and can topple: secure it to the walls; mind wiring and pipes before drilling." });
  }
  return out;
}
