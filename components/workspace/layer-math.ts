import { absorptionSpectrum, layersSchema, rateLayers, type Incidence, type Layer } from "@/lib/porous";
import type { UnitSystem } from "@/lib/units/length";

/** What one layer row of the designer holds: strings as typed, in the person's units. */
export type LayerRow =
  | { kind: "porous"; materialId: string; thickness: string; flowResistivity: string; model: "delany-bazley" | "miki" }
  | { kind: "air"; materialId: ""; thickness: string; flowResistivity: ""; model: "miki" }
  | { kind: "resistive-sheet"; materialId: ""; thickness: ""; flowResistivity: string; model: "miki" };

/** Thickness unit of the designer: millimetres or inches. */
export const thicknessUnit = (u: UnitSystem) => (u === "metric" ? "mm" : "in");
const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.replace(",", ".")));
export const toMetres = (s: string, u: UnitSystem) => (u === "metric" ? num(s) / 1000 : num(s) * 0.0254);
export const fromMetres = (m: number, u: UnitSystem) => (u === "metric" ? String(+(m * 1000).toFixed(1)) : String(+(m / 0.0254).toFixed(2)));

/** Rows → lib/porous layers (SI); validation is left to layersSchema. */
export function rowsToLayers(rows: readonly LayerRow[], u: UnitSystem): Layer[] {
  return rows.map((r) =>
    r.kind === "porous"
      ? { kind: "porous", thicknessM: toMetres(r.thickness, u), flowResistivity: num(r.flowResistivity), model: r.model }
      : r.kind === "air"
        ? { kind: "air", thicknessM: toMetres(r.thickness, u) }
        : { kind: "resistive-sheet", flowResistance: num(r.flowResistivity) },
  );
}

export function layersToRows(layers: readonly Layer[], u: UnitSystem, materialId: string | null): LayerRow[] {
  let usedMaterial = false;
  return layers.map((l) => {
    if (l.kind === "porous") {
      const m = !usedMaterial && materialId ? materialId : "";
      usedMaterial = true;
      return { kind: "porous", materialId: m, thickness: fromMetres(l.thicknessM, u), flowResistivity: String(l.flowResistivity), model: l.model };
    }
    if (l.kind === "air") return { kind: "air", materialId: "", thickness: fromMetres(l.thicknessM, u), flowResistivity: "", model: "miki" };
    return { kind: "resistive-sheet", materialId: "", thickness: "", flowResistivity: String(l.flowResistance), model: "miki" };
  });
}

/** One-third-octave centres 50…5000 Hz (IEC 61260-1 nominal values) for the α curve. */
export const CURVE_HZ = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];

export type DesignResult =
  | { ok: true; layers: Layer[]; spectrum: ReturnType<typeof absorptionSpectrum>; rating: ReturnType<typeof rateLayers>; totalDepthM: number }
  | { ok: false; issues: { path: (string | number)[]; message: string }[] };

/** Validates the stack with the engine's schema, then computes its spectrum and ratings (pure). */
export function designStack(rows: readonly LayerRow[], u: UnitSystem, incidence: Incidence): DesignResult {
  const parsed = layersSchema.safeParse(rowsToLayers(rows, u));
  if (!parsed.success) return { ok: false, issues: parsed.error.issues.map((i) => ({ path: i.path as (string | number)[], message: i.message })) };
  try {
    const layers = parsed.data as Layer[];
    const spectrum = absorptionSpectrum(layers, { frequenciesHz: CURVE_HZ, incidence });
    const rating = rateLayers(layers);
    const totalDepthM = layers.reduce((s, l) => s + (l.kind === "resistive-sheet" ? 0 : l.thicknessM), 0);
    return { ok: true, layers, spectrum, rating, totalDepthM };
  } catch (e) {
    if (e instanceof RangeError || e instanceof TypeError) return { ok: false, issues: [{ path: [], message: e.message }] };
    throw e;
  }
}
