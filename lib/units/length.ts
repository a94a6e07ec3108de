import { unit } from "mathjs";
import { feetInchesToMetres, metresToFeetInches as exactFeetInches } from "@/lib/modes";

// The conversions themselves live in lib/modes (units at the module's edge); this file adds what the
// screens need on top: rounding to a carpenter's fraction of an inch, areas and volumes.
export { feetInchesToMetres };

export type UnitSystem = "metric" | "imperial";

/** Metres → whole feet and inches, the inches rounded to `inchStep` and carried into feet at 12. */
export function metresToFeetInches(metres: number, inchStep = 0.25): { feet: number; inches: number } {
  const { feet, inches } = exactFeetInches(metres);
  const rounded = Math.round(inches / inchStep) * inchStep;
  return rounded >= 12 ? { feet: feet + 1, inches: 0 } : { feet, inches: +rounded.toFixed(2) };
}

/**
 * A length for people: "5.80 m" or "19′ 0¼″".
 * @example formatLength(3.81, "imperial") // "12′ 6″"
 */
export function formatLength(metres: number, system: UnitSystem, digits = 2): string {
  if (system === "metric") return `${metres.toFixed(digits)} m`;
  const { feet, inches } = metresToFeetInches(metres);
  const whole = Math.floor(inches);
  const frac = inches - whole;
  const fracText = frac === 0.25 ? "¼" : frac === 0.5 ? "½" : frac === 0.75 ? "¾" : "";
  return `${feet}′ ${whole}${fracText}″`;
}

/** Area in m² or ft². */
export function formatArea(squareMetres: number, system: UnitSystem): string {
  return system === "metric" ? `${squareMetres.toFixed(1)} m²` : `${unit(squareMetres, "m^2").toNumber("ft^2").toFixed(0)} ft²`;
}

/** Volume in m³ or ft³. */
export function formatVolume(cubicMetres: number, system: UnitSystem): string {
  return system === "metric" ? `${cubicMetres.toFixed(1)} m³` : `${unit(cubicMetres, "m^3").toNumber("ft^3").toFixed(0)} ft³`;
}
