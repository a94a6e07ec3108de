import type { RoomSurface } from "@/lib/reverb";
import { SURFACE_IDS, surfaceExtentM } from "@/lib/schemas/workspace";
import type { AnalysisRoom } from "./types";

/** Surfaces smaller than this are left out (lib/reverb's smallest accepted area). */
const MIN_AREA_M2 = 0.001;

/**
 * The room's surfaces as lib/reverb `RoomSurface`s, octave bands: each of the six surfaces with its
 * area L·W, L·H or W·H, less the openings that carry a finish of their own, which are listed as
 * surfaces of their own (an opening without a finish keeps the surface's). Sabine area A = Σ S_i α_i
 * over the list (Kuttruff, Room Acoustics, ch. 5).
 * @example reverbSurfaces(room).reduce((s, x) => s + x.areaM2, 0) // 2(LW + LH + WH)
 * @throws RangeError when a surface is missing or listed twice
 */
export function reverbSurfaces(room: AnalysisRoom): RoomSurface[] {
  const out: RoomSurface[] = [];
  for (const id of SURFACE_IDS) {
    const found = room.surfaces.filter((s) => s.surface === id);
    if (found.length !== 1) throw new RangeError(`surfaces must hold ${id} exactly once (got ${found.length})`);
    const s = found[0]!;
    const ext = surfaceExtentM(id, room);
    let area = ext.uM * ext.vM;
    for (const [i, o] of s.openings.entries()) {
      if (!o.finishId) continue;
      const a = o.widthM * o.heightM;
      area -= a;
      if (a >= MIN_AREA_M2) out.push({ areaM2: a, finish: o.finishId, label: `${id} ${o.kind} ${i + 1}` });
    }
    if (area >= MIN_AREA_M2) out.push(s.finish.kind === "finish" ? { areaM2: area, finish: s.finish.finishId, label: id } : { areaM2: area, alpha: [...s.finish.alpha], label: id });
  }
  return out;
}
