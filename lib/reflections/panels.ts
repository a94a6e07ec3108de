import { checkNumber, checkRoom, SURFACE_NAMES, surfaceSize, type Room, type SurfaceId } from "./geometry";
import type { PlacedItem } from "./placement";
import type { Zone } from "./zones";

/** A suggested set of panels covering one zone. */
export interface SuggestedPanelSet {
  surface: SurfaceId;
  zone: Zone;
  /** the panel as mounted: width along u, height along v, m */
  panel: { widthM: number; heightM: number };
  columns: number;
  rows: number;
  count: number;
  /** on walls: height of the grid's centre and bottom edge above the floor, m; on the ceiling: its centre's v */
  centreHeightM: number;
  bottomHeightM: number;
  placements: PlacedItem[];
  /** true when the grid covers the whole zone */
  coversZone: boolean;
  note: string;
}

/**
 * Panels of a standard face size (default 1200 × 600 mm) covering each zone: a grid in the orientation
 * (as given or turned 90°) that needs fewer panels (ties: as given), centred on the zone and shifted to
 * stay inside the surface; when the surface is too small for the grid, the columns or rows are cut to
 * fit and the set no longer covers the zone. Floor zones get no panels: a rug or carpet covers them.
 * @example suggestPanels(room, [{ surface: 'left', uMinM: 1, uMaxM: 2.5, vMinM: 0.8, vMaxM: 1.6, speakerIds: ['L'], pointCount: 2 }])[0].count // 3
 */
export function suggestPanels(room: Room, zones: readonly Zone[], panel: { widthM: number; heightM: number } = { widthM: 1.2, heightM: 0.6 }): SuggestedPanelSet[] {
  checkRoom(room);
  checkNumber(panel.widthM, "panel.widthM", 0.1, 5);
  checkNumber(panel.heightM, "panel.heightM", 0.1, 5);
  if (!Array.isArray(zones as unknown)) throw new TypeError("zones must be an array");
  return zones.map((zone, zi) => {
    const size = surfaceSize(room, zone.surface);
    const zu = zone.uMaxM - zone.uMinM;
    const zv = zone.vMaxM - zone.vMinM;
    if (!(zu >= 0 && zv >= 0)) throw new RangeError(`zones[${zi}] has a negative extent`);
    const centreU = (zone.uMinM + zone.uMaxM) / 2;
    const centreV = (zone.vMinM + zone.vMaxM) / 2;
    if (zone.surface === "floor") {
      return {
        surface: zone.surface,
        zone,
        panel: { ...panel },
        columns: 0,
        rows: 0,
        count: 0,
        centreHeightM: centreV,
        bottomHeightM: 0,
        placements: [],
        coversZone: false,
        note: `floor: a thick rug or carpet over about ${zu.toFixed(1)} × ${zv.toFixed(1)} m centred at (${centreU.toFixed(2)}, ${centreV.toFixed(2)}) m covers this zone`,
      };
    }
    const eps = 1e-9;
    const options = [
      { w: panel.widthM, h: panel.heightM },
      { w: panel.heightM, h: panel.widthM },
    ].map((o) => {
      const columns = Math.max(1, Math.ceil(zu / o.w - eps));
      const rows = Math.max(1, Math.ceil(zv / o.h - eps));
      return { ...o, columns, rows, count: columns * rows };
    });
    const best = options[1]!.count < options[0]!.count ? options[1]! : options[0]!;
    const columns = Math.min(best.columns, Math.floor(size.uM / best.w + eps));
    const rows = Math.min(best.rows, Math.floor(size.vM / best.h + eps));
    const gridW = columns * best.w;
    const gridH = rows * best.h;
    const u0 = Math.min(Math.max(0, centreU - gridW / 2), size.uM - gridW);
    const v0 = Math.min(Math.max(0, centreV - gridH / 2), size.vM - gridH);
    const placements: PlacedItem[] = [];
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < columns; c++) {
        placements.push({ id: `${zone.surface}-${zi + 1}-${r * columns + c + 1}`, surface: zone.surface, uM: u0 + c * best.w, vM: v0 + r * best.h, widthM: best.w, heightM: best.h });
      }
    }
    const coversZone = u0 <= zone.uMinM + eps && u0 + gridW >= zone.uMaxM - eps && v0 <= zone.vMinM + eps && v0 + gridH >= zone.vMaxM - eps;
    const mm = (m: number) => Math.round(m * 1000);
    const where = zone.surface === "ceiling" ? `centred at (${(u0 + gridW / 2).toFixed(2)}, ${(v0 + gridH / 2).toFixed(2)}) m` : `centre ${(v0 + gridH / 2).toFixed(2)} m above the floor, bottom edge at ${v0.toFixed(2)} m`;
    return {
      surface: zone.surface,
      zone,
      panel: { widthM: best.w, heightM: best.h },
      columns,
      rows,
      count: columns * rows,
      centreHeightM: v0 + gridH / 2,
      bottomHeightM: v0,
      placements,
      coversZone,
      note: `${SURFACE_NAMES[zone.surface]}: ${columns * rows} panel(s) of ${mm(best.w)} × ${mm(best.h)} mm (${columns} across, ${rows} high), ${where}${coversZone ? "" : "; the surface is too small to cover the whole zone"}`,
    };
  });
}
