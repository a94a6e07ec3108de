import { checkNumber } from "./validate";

/**
 * Airflow resistivity σ (Pa·s/m²) of a fibrous material from its bulk density and mean fibre diameter:
 * σ ≈ 3.18·10⁻⁹ · ρ^1.53 / d² (Bies & Hansen 1980, Applied Acoustics 13 — from memory, moderate
 * confidence; fitted for glass and mineral fibre blankets). An estimate: measure σ by ISO 9053 for design.
 * @param bulkDensityKgM3 ρ in kg/m³ (1…300); @param fibreDiameterM d in m (0.5…50 µm)
 * @example resistivityFromFibres(32, 7e-6) // ≈ 13 000 Pa·s/m²
 */
export function resistivityFromFibres(bulkDensityKgM3: number, fibreDiameterM: number): number {
  checkNumber(bulkDensityKgM3, "bulkDensityKgM3", 1, 300);
  checkNumber(fibreDiameterM, "fibreDiameterM", 0.5e-6, 50e-6);
  return (3.18e-9 * bulkDensityKgM3 ** 1.53) / (fibreDiameterM * fibreDiameterM); // Bies & Hansen (1980)
}

/**
 * Flow resistance of a sheet (Pa·s/m) from the resistivity of its material and its thickness: R = σ·t.
 * @param flowResistivity σ in Pa·s/m²; @param thicknessM t in m
 * @example sheetFlowResistance(200_000, 0.001) // 200
 */
export function sheetFlowResistance(flowResistivity: number, thicknessM: number): number {
  checkNumber(flowResistivity, "flowResistivity", 0, 1e8);
  checkNumber(thicknessM, "thicknessM", 0, 0.1);
  return flowResistivity * thicknessM; // definition of flow resistance of a uniform layer (ISO 9053)
}
