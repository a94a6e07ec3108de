import { unit } from "mathjs";

export type UnitSystem = "metric" | "imperial";

/** Feet and inches → metres through mathjs units (1 ft = 0.3048 m exactly, NIST SP 811). */
export function feetInchesToMetres(feet: number, inches: number): number {
  if (!Number.isFinite(feet) || !Number.isFinite(inches)) throw new RangeError("feet and inches must be finite numbers");
  return unit(feet, "ft").toNumber("m") + unit(inches, "inch").toNumber("m");
}

/** Metres → whole feet and inches (inches rounded to `inchStep`, carried into feet at 12). */
export function metresToFeetInches(metres: number, inchStep = 0.25): { feet: number; inches: number } {
  if (!Number.isFinite(metres) || metres < 0) throw new RangeError("metres must be a finite number ≥ 0");
  const totalInches = Math.round(unit(metres, "m").toNumber("inch") / inchStep) * inchStep;
  const feet = Math.floor(totalInches / 12 + 1e-9);
  return { feet, inches: Math.max(0, +(totalInches - feet * 12).toFixed(2)) };
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
