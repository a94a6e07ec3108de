import type { BuildSheet } from "./build-sheet";
import { checkNumber } from "./validate";

/** Output units of a printed sheet. */
export type UnitSystem = "metric" | "imperial";

const M_PER_IN = 0.0254; // exact, international yard and pound agreement (1959)
const M2_PER_FT2 = 0.09290304; // (0.3048 m)²
const KG_PER_LB = 0.45359237; // exact, 1959 agreement

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * A length for a builder: whole millimetres, or inches to the nearest 1/16 in with a reduced fraction.
 * @example presentLength(0.562, 'imperial') // "22 1/8 in"
 */
export function presentLength(metres: number, units: UnitSystem): string {
  checkNumber(metres, "metres", 0, 1000);
  if (units === "metric") return `${Math.round(metres * 1000)} mm`;
  const sixteenths = Math.round(metres / M_PER_IN * 16);
  const whole = Math.floor(sixteenths / 16);
  const rest = sixteenths % 16;
  if (rest === 0) return `${whole} in`;
  const g = gcd(rest, 16);
  return `${whole > 0 ? `${whole} ` : ""}${rest / g}/${16 / g} in`;
}

/** An area: m² or ft², one decimal. @example presentArea(1.35, 'imperial') // "14.5 ft²" */
export function presentArea(m2: number, units: UnitSystem): string {
  return units === "metric" ? `${m2.toFixed(2)} m²` : `${(m2 / M2_PER_FT2).toFixed(1)} ft²`;
}

/** A mass: kg or lb, one decimal. @example presentMass(6.37, 'imperial') // "14.0 lb" */
export function presentMass(kg: number, units: UnitSystem): string {
  return units === "metric" ? `${kg.toFixed(1)} kg` : `${(kg / KG_PER_LB).toFixed(1)} lb`;
}

/**
 * The sheet with every length, area and weight as text in the chosen units (conversion only here, at
 * the edge); counts, costs, notes and cautions unchanged.
 * @example presentBuildSheet(sheet, 'imperial').totals.weight // "14.0 lb"
 */
export function presentBuildSheet(sheet: BuildSheet, units: UnitSystem) {
  if (units !== "metric" && units !== "imperial") throw new TypeError(`units must be 'metric' or 'imperial', got ${String(units)}`);
  return {
    units,
    builds: sheet.builds.map((b) => ({
      label: b.label,
      count: b.count,
      cutList: b.cutList.map((p) => ({ label: p.label, count: p.count, length: presentLength(p.lengthM, units) })),
      fill:
        b.unit.fillPiece.kind === "rect"
          ? `${presentLength(b.unit.fillPiece.widthM, units)} × ${presentLength(b.unit.fillPiece.heightM, units)} × ${presentLength(b.unit.fillPiece.thicknessM, units)}`
          : `triangles with ${presentLength(b.unit.fillPiece.legM, units)} legs, stacked over ${presentLength(b.unit.fillPiece.lengthM, units)}`,
      slabs: b.slabs,
      fabricCut: b.unit.fabric ? `${presentLength(b.unit.fabric.widthM, units)} × ${presentLength(b.unit.fabric.heightM, units)}` : null,
      fabricArea: presentArea(b.fabricAreaM2, units),
      faceSheets: b.faceSheets,
      screws: b.screws,
      cleats: b.cleats,
      brackets: b.brackets,
      unitWeight: presentMass(b.unit.weightKg, units),
      weight: presentMass(b.weightKg, units),
      notes: b.notes,
    })),
    boards: sheet.cutPlan.boards.map((board) => ({
      stock: presentLength(board.stockLengthM, units),
      cuts: board.cuts.map((c) => `${c.label} ${presentLength(c.lengthM, units)}`),
      offcut: presentLength(board.offcutM, units),
    })),
    totals: {
      boards: sheet.totals.boards.map((b) => ({ stock: presentLength(b.lengthM, units), count: b.count })),
      slabs: sheet.totals.slabs,
      fabricArea: presentArea(sheet.totals.fabricAreaM2, units),
      faceSheets: sheet.totals.faceSheets,
      screws: sheet.totals.screws,
      cleats: sheet.totals.cleats,
      brackets: sheet.totals.brackets,
      weight: presentMass(sheet.totals.weightKg, units),
      cost: sheet.totals.cost,
    },
    cautions: sheet.cautions,
    notes: sheet.notes,
  };
}
