/**
 * From a scenario's treatment items and the firm's price list to lib/build-sheet's job: each item's
 * absorber (lib/schemas/workspace ItemSpec) as a build the sheet can cut, identical builds merged
 * into one build type, the firm's stock sizes and prices, and the slab thickness chosen from the
 * price list. Pure TypeScript (no React, Next or db), shared by the page, the API and the tests.
 */
import { frameDepthM, type Build, type BuildSheetJob } from "@/lib/build-sheet";
import { porousMaterial } from "@/lib/porous";
import type { ItemSpec } from "@/lib/schemas/workspace";
import type { PriceListValues } from "@/lib/schemas/build-sheet";

/** Face sheet of a membrane or perforated trap: fibreboard of 750 kg/m³ (from memory: MDF 700–800 kg/m³). */
export const FACE_BOARD_DENSITY_KG_M3 = 750;
/** Fill density when an item does not name its material, kg/m³ (light mineral wool, lib/porous mineral-wool-35 mid-range). */
export const ASSUMED_FILL_DENSITY_KG_M3 = 35;

/** A price list for firms that have not set theirs: stock sizes only, every price 0 (so no cost is invented). */
export const EMPTY_PRICE_LIST: PriceListValues = {
  currency: "EUR",
  lumber: { thicknessM: 0.019, widthM: 0.15, densityKgM3: 500, basis: "per-board", pricePerM: 0, boards: [{ lengthM: 2.4, price: 0 }] },
  kerfM: 0.003,
  slab: { standard: "metric", lengthM: 1.2, widthM: 0.6, prices: [{ thicknessM: 0.05, price: 0 }] },
  fabric: { pricePerM2: 0, wrapM: 0.05 },
  sheet: { lengthM: 2.44, widthM: 1.22, price: 0 },
  fixings: { screwPrice: 0, cleatPrice: 0, bracketPrice: 0 },
};

function fillDensity(materialId: string | null | undefined): { densityKgM3: number; assumed: boolean } {
  const m = materialId ? porousMaterial(materialId) : undefined;
  return m ? { densityKgM3: (m.densityKgM3.min + m.densityKgM3.max) / 2, assumed: false } : { densityKgM3: ASSUMED_FILL_DENSITY_KG_M3, assumed: true };
}

/** What the sheet builds for one item, or why it cannot. */
export type ItemBuild = { ok: true; build: Build; notes: string[] } | { ok: false; reason: string };

/**
 * The build of an item's absorber. Porous panels: the porous layers' total thickness as the slab and
 * the air layers' total as the gap behind it; corner traps as they are; membranes: a fibreboard face of
 * mass m (thickness m / 750 kg/m³) over the cavity, half of it (at most 50 mm) filled; perforated
 * panels likewise with their holes.
 * @example itemBuild({ kind: 'corner-trap', depthM: 0.35, lengthM: 2.5, orientation: 'floor-to-ceiling', ... }).ok // true
 */
export function itemBuild(spec: ItemSpec): ItemBuild {
  switch (spec.kind) {
    case "porous-panel": {
      const porous = spec.layers.filter((l) => l.kind === "porous").reduce((s, l) => s + l.thicknessM, 0);
      const air = spec.layers.filter((l) => l.kind === "air").reduce((s, l) => s + l.thicknessM, 0);
      if (porous < 0.01) return { ok: false, reason: "no porous layer of at least 10 mm to cut from slabs" };
      if (spec.widthM > 3 || spec.heightM > 3 || spec.widthM < 0.1 || spec.heightM < 0.1) return { ok: false, reason: "face outside 0.1–3 m: build it to a drawing" };
      const d = fillDensity(spec.materialId);
      return {
        ok: true,
        build: { kind: "panel", faceWidthM: spec.widthM, faceHeightM: spec.heightM, insulationThicknessM: round(porous), airGapM: round(air), insulationDensityKgM3: d.densityKgM3 },
        notes: d.assumed ? [`fill density assumed ${ASSUMED_FILL_DENSITY_KG_M3} kg/m³ (no material named)`] : [],
      };
    }
    case "corner-trap": {
      const d = fillDensity(spec.materialId);
      return {
        ok: true,
        build: { kind: "corner-trap", depthM: spec.depthM, lengthM: spec.lengthM, orientation: spec.orientation, insulationDensityKgM3: d.densityKgM3 },
        notes: d.assumed ? [`fill density assumed ${ASSUMED_FILL_DENSITY_KG_M3} kg/m³ (no material named)`] : [],
      };
    }
    case "membrane":
    case "perforated": {
      if (spec.cavityDepthM > 0.5) return { ok: false, reason: "cavity deeper than 500 mm: build it to a drawing" };
      if (spec.widthM > 3 || spec.heightM > 3 || spec.widthM < 0.1 || spec.heightM < 0.1) return { ok: false, reason: "face outside 0.1–3 m: build it to a drawing" };
      const thicknessM = spec.kind === "membrane" ? round(spec.massKgM2 / FACE_BOARD_DENSITY_KG_M3) : spec.plateThicknessM;
      if (thicknessM < 0.001 || thicknessM > 0.05) return { ok: false, reason: `a face board of ${Math.round(thicknessM * 1000)} mm is outside 1–50 mm` };
      const cavity = Math.max(0.01, spec.cavityDepthM);
      return {
        ok: true,
        build: {
          kind: "membrane-trap",
          faceWidthM: spec.widthM,
          faceHeightM: spec.heightM,
          cavityDepthM: cavity,
          fillThicknessM: round(Math.min(0.05, cavity / 2)),
          faceSheetThicknessM: thicknessM,
          faceSheetDensityKgM3: FACE_BOARD_DENSITY_KG_M3,
          insulationDensityKgM3: ASSUMED_FILL_DENSITY_KG_M3,
          ...(spec.kind === "perforated" ? { perforation: { holeDiameterM: spec.holeDiameterM, openAreaRatio: spec.openAreaRatio } } : {}),
        },
        notes: [
          spec.kind === "membrane"
            ? `face: ${Math.round(thicknessM * 1000)} mm fibreboard (${spec.massKgM2} kg/m² at ${FACE_BOARD_DENSITY_KG_M3} kg/m³); loose light wool in half the cavity`
            : `face: ${Math.round(thicknessM * 1000)} mm board with ${Math.round(spec.holeDiameterM * 1000)} mm holes, ${(spec.openAreaRatio * 100).toFixed(2)} % open`,
        ],
      };
    }
  }
}

const round = (m: number) => Math.round(m * 10_000) / 10_000;

/** A short builder's description of a build. @example describeBuild(panel) // "Panel 600 × 1200 mm, 100 mm fill" */
export function describeBuild(b: Build): string {
  const mm = (m: number) => Math.round(m * 1000);
  switch (b.kind) {
    case "panel":
      return `Panel ${mm(b.faceWidthM)} × ${mm(b.faceHeightM)} mm, ${mm(b.insulationThicknessM)} mm fill${b.airGapM ? ` + ${mm(b.airGapM)} mm air gap` : ""}`;
    case "corner-trap":
      return `${b.orientation === "floor-to-ceiling" ? "Floor-to-ceiling" : "Wall–ceiling"} corner trap, ${mm(b.depthM)} mm deep, ${mm(b.lengthM)} mm long`;
    case "membrane-trap":
      return `${b.perforation ? "Perforated-panel" : "Membrane"} trap ${mm(b.faceWidthM)} × ${mm(b.faceHeightM)} mm, ${mm(b.cavityDepthM)} mm cavity`;
  }
}

/** The slab thickness the sheet uses: the thickest listed one that makes every rectangular fill whole layers, else the thinnest. */
export function chooseSlab(builds: readonly Build[], prices: PriceListValues["slab"]["prices"]): { thicknessM: number; price: number; reason: string } {
  const sorted = [...prices].sort((a, b) => b.thicknessM - a.thicknessM);
  const fills = builds.flatMap((b) => (b.kind === "panel" ? [b.insulationThicknessM] : b.kind === "membrane-trap" && b.fillThicknessM > 0 ? [b.fillThicknessM] : []));
  const whole = (t: number) => fills.every((f) => Math.abs(f / t - Math.round(f / t)) < 0.02 && Math.round(f / t) >= 1);
  const pick = sorted.find((p) => whole(p.thicknessM));
  if (pick) return { ...pick, reason: fills.length ? `the thickest listed slab that makes every fill whole layers` : `the thickest listed slab (corner traps stack slabs along their run)` };
  const thinnest = sorted[sorted.length - 1]!;
  return { ...thinnest, reason: "no listed thickness makes every fill whole layers: the thinnest, trimmed to fit" };
}

/** One build type of a job: the merged items. */
export interface JobGroup {
  key: string;
  label: string;
  build: Build;
  count: number;
  itemIds: string[];
  notes: string[];
}

/**
 * Items to a job's build types (identical builds merged in first-seen order) and the items that cannot
 * be cut from the sheet — among them frames deeper than the firm's lumber section is wide.
 */
export function groupItems(
  items: readonly { id: string; name: string; spec: ItemSpec; count: number }[],
  sectionWidthM = Infinity,
): { groups: JobGroup[]; skipped: { id: string; name: string; reason: string }[] } {
  const groups: JobGroup[] = [];
  const skipped: { id: string; name: string; reason: string }[] = [];
  for (const item of items) {
    const b = itemBuild(item.spec);
    if (!b.ok) {
      skipped.push({ id: item.id, name: item.name, reason: b.reason });
      continue;
    }
    const depth = frameDepthM(b.build);
    if (depth > sectionWidthM + 1e-6) {
      skipped.push({ id: item.id, name: item.name, reason: `its frame is ${Math.round(depth * 1000)} mm deep, more than the ${Math.round(sectionWidthM * 1000)} mm section on the price list: list a wider section, or build it to a drawing` });
      continue;
    }
    const key = JSON.stringify(b.build);
    const g = groups.find((x) => x.key === key);
    if (g) {
      g.count += item.count;
      g.itemIds.push(item.id);
      if (!g.label.split(" · ").includes(item.name)) g.label += ` · ${item.name}`;
      for (const n of b.notes) if (!g.notes.includes(n)) g.notes.push(n);
    } else groups.push({ key, label: item.name, build: b.build, count: item.count, itemIds: [item.id], notes: [...b.notes] });
  }
  return { groups, skipped };
}

/** The lib/build-sheet job for these build types at the firm's stock sizes and prices. */
export function jobOf(groups: readonly JobGroup[], list: PriceListValues): { job: BuildSheetJob; slab: ReturnType<typeof chooseSlab> } {
  const slab = chooseSlab(
    groups.map((g) => g.build),
    list.slab.prices,
  );
  const boards = list.lumber.boards.map((b) => ({ lengthM: b.lengthM, price: list.lumber.basis === "per-board" ? b.price : Math.round(b.lengthM * list.lumber.pricePerM * 100) / 100 }));
  const job: BuildSheetJob = {
    items: groups.map((g) => ({ label: g.label, build: g.build, count: g.count })),
    lumber: { thicknessM: list.lumber.thicknessM, widthM: list.lumber.widthM, densityKgM3: list.lumber.densityKgM3 },
    stockBoards: boards,
    kerfM: list.kerfM,
    slab: { lengthM: list.slab.lengthM, widthM: list.slab.widthM, thicknessM: slab.thicknessM, price: slab.price },
    fabric: { wrapM: list.fabric.wrapM, pricePerM2: list.fabric.pricePerM2 },
    sheet: { lengthM: list.sheet.lengthM, widthM: list.sheet.widthM, price: list.sheet.price },
    fixings: { screwPrice: list.fixings.screwPrice, cleatPrice: list.fixings.cleatPrice, bracketPrice: list.fixings.bracketPrice },
  };
  return { job, slab };
}
