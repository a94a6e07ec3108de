import type { MaterialPrices } from "./types";

/**
 * Invented demo prices in the firm's currency units, for the default catalogue: 19 mm softwood at
 * 700 per m³ (a 2.4 m board of 19 × 100 mm ≈ 3.2), fill at 60 per m³ (a 1200 × 600 × 100 mm slab
 * ≈ 4.3), fabric 12 per m², 9 mm board 8 per m², screws 0.05, cleats and brackets 2 each.
 */
export const DEFAULT_PRICES: Readonly<MaterialPrices> = Object.freeze({
  lumberPerM3: 700,
  insulationPerM3: 60,
  fabricPerM2: 12,
  sheetPerM2: 8,
  screwEach: 0.05,
  cleatEach: 2,
  bracketEach: 2,
});
