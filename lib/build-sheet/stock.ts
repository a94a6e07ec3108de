import type { StockRect } from "./types";
import { checkNumber, LENGTH_EPS_M } from "./validate";

/**
 * How many rectangles of `pieceA × pieceB` a stock sheet yields when cut in a plain grid, the better of
 * the two orientations (guillotine grid; mixed layouts are not tried).
 * @example piecesPerSheet(1.162, 0.562, { lengthM: 1.2, widthM: 0.6 }) // 1
 */
export function piecesPerSheet(pieceA: number, pieceB: number, sheet: StockRect): number {
  checkNumber(pieceA, "pieceA", 0.001, 10);
  checkNumber(pieceB, "pieceB", 0.001, 10);
  checkNumber(sheet.lengthM, "sheet.lengthM", 0.05, 10);
  checkNumber(sheet.widthM, "sheet.widthM", 0.05, 10);
  const fit = (a: number, b: number) => Math.floor(sheet.lengthM / a + LENGTH_EPS_M) * Math.floor(sheet.widthM / b + LENGTH_EPS_M);
  return Math.max(fit(pieceA, pieceB), fit(pieceB, pieceA));
}

/**
 * Right-isosceles triangles of legs `legM` cut from one slab: two per leg × leg square on the diagonal,
 * squares in a grid (0 when a leg is longer than the slab's shorter side: the fill must be pieced).
 * @example triangleLayersPerSlab(0.3 * Math.SQRT2, { lengthM: 1.2, widthM: 0.6 }) // 4
 */
export function triangleLayersPerSlab(legM: number, slab: StockRect): number {
  return 2 * piecesPerSheet(legM, legM, slab);
}
