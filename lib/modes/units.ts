/**
 * Length conversion at the edges of the module (forms and screens): feet and inches <-> metres through
 * mathjs units (1 ft = 0.3048 m, 1 in = 0.0254 m exactly, international yard and pound agreement 1959).
 * Inside the module everything is SI.
 */
import { create, unitDependencies } from "mathjs";
import { checkInteger, checkNumber } from "./validate";

const math = create({ unitDependencies: unitDependencies! });
const MAX_FEET = 1000;

/**
 * Feet (and optional inches) to metres.
 *
 * @param feet length in feet, 0 <= feet <= 1000 (may be fractional)
 * @param inches extra inches, 0 <= inches <= 12000 (default 0)
 * @returns metres
 * @throws RangeError for a negative, huge or non-finite value
 * @example feetInchesToMetres(12, 6) // 3.81
 */
export function feetInchesToMetres(feet: number, inches = 0): number {
  checkNumber(feet, "feet", 0, MAX_FEET, "ft");
  checkNumber(inches, "inches", 0, MAX_FEET * 12, "in");
  return math.unit(feet, "ft").toNumber("m") + math.unit(inches, "inch").toNumber("m");
}

/**
 * Metres to whole feet and remaining inches (0 <= inches < 12).
 *
 * @param metres length, m, 0 <= metres <= 304.8
 * @example metresToFeetInches(3.81) // { feet: 12, inches: 6 }
 */
export function metresToFeetInches(metres: number): { feet: number; inches: number } {
  checkNumber(metres, "metres", 0, MAX_FEET * 0.3048, "m");
  const totalInches = math.unit(metres, "m").toNumber("inch");
  let feet = Math.floor(totalInches / 12 + 1e-12);
  let inches = totalInches - feet * 12;
  if (inches < 0) { feet -= 1; inches += 12; }
  return { feet, inches };
}

/**
 * A length as "F ft I in" with `inchDecimals` decimals on the inches; a rounded 12 in carries into the feet.
 *
 * @param metres length, m
 * @param options.inchDecimals decimals on the inches, 0..3 (default 1)
 * @example formatFeetInches(2.4) // "7 ft 10.5 in"
 */
export function formatFeetInches(metres: number, options: { inchDecimals?: number } = {}): string {
  const decimals = options.inchDecimals ?? 1;
  checkInteger(decimals, "inchDecimals", 0, 3);
  const totalInches = Number(math.unit(checkNumber(metres, "metres", 0, MAX_FEET * 0.3048, "m"), "m").toNumber("inch").toFixed(decimals));
  const feet = Math.floor(totalInches / 12 + 1e-9);
  const inches = Math.max(0, totalInches - feet * 12);
  return `${feet} ft ${inches.toFixed(decimals)} in`;
}

/**
 * A length for an engineer's screen in the chosen system: "3.81 m" or "12 ft 6.0 in".
 *
 * @example formatLength(3.81, "imperial") // "12 ft 6.0 in"
 */
export function formatLength(metres: number, system: "metric" | "imperial"): string {
  if (system !== "metric" && system !== "imperial") throw new TypeError(`system must be "metric" or "imperial" (got ${String(system)})`);
  if (system === "imperial") return formatFeetInches(metres);
  return `${checkNumber(metres, "metres", 0, MAX_FEET * 0.3048, "m").toFixed(2)} m`;
}
