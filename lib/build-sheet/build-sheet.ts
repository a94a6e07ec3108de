import { BUILD_SHEET_CAUTIONS } from "./cautions";
import { PIECED_WASTE } from "./constants";
import { optimiseCuts, type CutPlan } from "./cut-list";
import { checkBuild, checkLumber } from "./frame";
import { buildQuantities, type BuildQuantities } from "./quantities";
import { piecesPerSheet, triangleLayersPerSlab } from "./stock";
import type { Build, BuildSheetJob, CutPiece } from "./types";
import { checkInteger, checkNumber } from "./validate";

/** One build group of a sheet (one build, `count` units). */
export interface BuildSheetGroup {
  label: string;
  build: Build;
  count: number;
  /** one unit's quantities */
  unit: BuildQuantities;
  /** frame pieces for the whole group */
  cutList: CutPiece[];
  /** insulation slabs for the group (offcuts are not shared between groups) */
  slabs: number;
  fabricAreaM2: number;
  faceSheets: number;
  screws: number;
  cleats: number;
  brackets: number;
  weightKg: number;
  notes: string[];
}

/** A job's build sheet. */
export interface BuildSheet {
  builds: BuildSheetGroup[];
  /** the job's boards, all groups' pieces packed together */
  cutPlan: CutPlan;
  totals: {
    boards: { lengthM: number; count: number }[];
    slabs: number;
    fabricAreaM2: number;
    faceSheets: number;
    screws: number;
    cleats: number;
    brackets: number;
    weightKg: number;
    cost: { boards: number; slabs: number; fabric: number; sheets: number; fixings: number; total: number };
  };
  cautions: readonly string[];
  notes: string[];
}

function slabsFor(unit: BuildQuantities, count: number, job: BuildSheetJob, notes: string[]): number {
  const slab = job.slab;
  const slabVolume = slab.lengthM * slab.widthM * slab.thicknessM;
  const fill = unit.fillPiece;
  if (fill.kind === "triangle") {
    const layers = Math.ceil(fill.lengthM / slab.thicknessM - 1e-9); // triangles stacked along the run
    const perSlab = triangleLayersPerSlab(fill.legM, slab);
    if (perSlab > 0) return Math.ceil((count * layers) / perSlab - 1e-9);
    notes.push(`fill legs ${Math.round(fill.legM * 1000)} mm exceed the slab's ${Math.round(Math.min(slab.lengthM, slab.widthM) * 1000)} mm side: the triangles are pieced; slabs counted by volume with ${PIECED_WASTE * 100} % waste (common practice)`);
    return Math.ceil((count * unit.insulationVolumeM3 * (1 + PIECED_WASTE)) / slabVolume - 1e-9);
  }
  if (fill.thicknessM === 0) return 0;
  const layers = Math.ceil(fill.thicknessM / slab.thicknessM - 1e-9);
  if (Math.abs(layers * slab.thicknessM - fill.thicknessM) > 1e-6) {
    notes.push(`fill ${Math.round(fill.thicknessM * 1000)} mm from ${layers} × ${Math.round(slab.thicknessM * 1000)} mm slabs: trim or compress the last layer`);
  }
  const perSlab = piecesPerSheet(fill.widthM, fill.heightM, slab);
  if (perSlab > 0) return Math.ceil((count * layers) / perSlab - 1e-9);
  notes.push(`fill ${Math.round(fill.widthM * 1000)} × ${Math.round(fill.heightM * 1000)} mm is larger than a slab: pieced; slabs counted by volume with ${PIECED_WASTE * 100} % waste (common practice)`);
  return Math.ceil((count * unit.insulationVolumeM3 * (1 + PIECED_WASTE)) / slabVolume - 1e-9);
}

/**
 * The build sheet of a job: per build group the cut list, insulation slabs, fabric with wrap allowance,
 * face sheets, fixings, finished weight and mounting note; the job's boards packed into stock lengths
 * (first-fit decreasing with kerf, all groups together); totals and the materials cost from the price
 * list (per board, per slab, per m² of fabric, per sheet, per fixing); and the safety cautions.
 * @example buildSheet({ items: [{ build: panel, count: 3 }], lumber: { thicknessM: 0.019, widthM: 0.1 }, stockBoards: [{ lengthM: 2.4, price: 6 }], kerfM: 0.003, slab: { lengthM: 1.2, widthM: 0.6, thicknessM: 0.05, price: 4 }, fabric: { wrapM: 0.05, pricePerM2: 10 } }).totals.boards // [{ lengthM: 2.4, count: 6 }]
 */
export function buildSheet(job: BuildSheetJob): BuildSheet {
  if (typeof job !== "object" || job === null) throw new TypeError("job must be an object");
  if (!Array.isArray(job.items) || job.items.length === 0) throw new RangeError("items must hold at least one build");
  if (job.items.length > 200) throw new RangeError(`items must hold at most 200 builds, got ${job.items.length}`);
  checkLumber(job.lumber);
  checkNumber(job.slab?.lengthM, "slab.lengthM", 0.1, 5);
  checkNumber(job.slab.widthM, "slab.widthM", 0.1, 5);
  checkNumber(job.slab.thicknessM, "slab.thicknessM", 0.005, 0.5);
  checkNumber(job.fabric?.wrapM, "fabric.wrapM", 0, 0.3);
  const prices = {
    slab: checkNumber(job.slab.price ?? 0, "slab.price", 0, 1e6),
    fabric: checkNumber(job.fabric.pricePerM2 ?? 0, "fabric.pricePerM2", 0, 1e6),
    sheet: checkNumber(job.sheet?.price ?? 0, "sheet.price", 0, 1e6),
    screw: checkNumber(job.fixings?.screwPrice ?? 0, "fixings.screwPrice", 0, 1e4),
    cleat: checkNumber(job.fixings?.cleatPrice ?? 0, "fixings.cleatPrice", 0, 1e4),
    bracket: checkNumber(job.fixings?.bracketPrice ?? 0, "fixings.bracketPrice", 0, 1e4),
  };
  const notes: string[] = [];
  const builds = job.items.map((item, i): BuildSheetGroup => {
    checkBuild(item.build, `items[${i}].build`);
    const count = checkInteger(item.count, `items[${i}].count`, 1, 1000);
    const unit = buildQuantities(item.build, { lumber: job.lumber, fabric: job.fabric });
    const groupNotes: string[] = [];
    const depth = item.build.kind === "panel" ? item.build.insulationThicknessM + (item.build.airGapM ?? 0) : item.build.kind === "membrane-trap" ? item.build.cavityDepthM : 0;
    if (depth > 0 && depth < job.lumber.widthM - 1e-6) groupNotes.push(`rip the rails to ${Math.round(depth * 1000)} mm wide`);
    let faceSheets = 0;
    if (item.build.kind === "membrane-trap") {
      if (!job.sheet) throw new RangeError(`sheet is required for items[${i}] (a membrane trap needs face-sheet stock)`);
      const per = piecesPerSheet(item.build.faceWidthM, item.build.faceHeightM, job.sheet);
      if (per === 0) throw new RangeError(`items[${i}].build face ${item.build.faceWidthM} × ${item.build.faceHeightM} m is larger than the sheet stock`);
      faceSheets = Math.ceil(count / per - 1e-9);
      if (unit.holes) groupNotes.push(`drill ${unit.holes.count} holes of ${Math.round(unit.holes.diameterM * 1000)} mm evenly over each face sheet`);
    }
    const slabs = slabsFor(unit, count, job, groupNotes);
    return {
      label: item.label ?? `${item.build.kind} ${i + 1}`,
      build: item.build,
      count,
      unit,
      cutList: unit.pieces.map((p) => ({ ...p, count: p.count * count })),
      slabs,
      fabricAreaM2: unit.fabricAreaM2 * count,
      faceSheets,
      screws: unit.screws * count,
      cleats: unit.cleats * count,
      brackets: unit.brackets * count,
      weightKg: unit.weightKg * count,
      notes: [...groupNotes, unit.mounting],
    };
  });
  const cutPlan = optimiseCuts(
    builds.flatMap((b) => b.cutList),
    job.stockBoards,
    job.kerfM,
  );
  const priceOfLength = (lengthM: number) => job.stockBoards.find((s) => s.lengthM === lengthM)?.price ?? 0;
  const sum = (f: (b: BuildSheetGroup) => number) => builds.reduce((s, b) => s + f(b), 0);
  const totals = {
    boards: cutPlan.countsByLength,
    slabs: sum((b) => b.slabs),
    fabricAreaM2: sum((b) => b.fabricAreaM2),
    faceSheets: sum((b) => b.faceSheets),
    screws: sum((b) => b.screws),
    cleats: sum((b) => b.cleats),
    brackets: sum((b) => b.brackets),
    weightKg: sum((b) => b.weightKg),
  };
  const cost = {
    boards: cutPlan.countsByLength.reduce((s, c) => s + c.count * priceOfLength(c.lengthM), 0),
    slabs: totals.slabs * prices.slab,
    fabric: totals.fabricAreaM2 * prices.fabric,
    sheets: totals.faceSheets * prices.sheet,
    fixings: totals.screws * prices.screw + totals.cleats * prices.cleat + totals.brackets * prices.bracket,
    total: 0,
  };
  cost.total = cost.boards + cost.slabs + cost.fabric + cost.sheets + cost.fixings;
  notes.push("fixing counts are rules of thumb (common practice): check them against the wall and the fixings' rated loads");
  return { builds, cutPlan, totals: { ...totals, cost }, cautions: BUILD_SHEET_CAUTIONS, notes };
}
