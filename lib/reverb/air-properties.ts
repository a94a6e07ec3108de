import { speedOfSoundFromTemperature } from "../modes/speed-of-sound";

function checkTemperature(temperatureC: number): void {
  if (typeof temperatureC !== "number") throw new TypeError("temperatureC must be a number");
  if (!Number.isFinite(temperatureC) || temperatureC < -20 || temperatureC > 50) {
    throw new RangeError(`temperatureC must be within −20…50 °C, got ${temperatureC}`);
  }
}

/**
 * Speed of sound in air, c = 331.3·√(1 + ϑ/273.15) m/s (REFERENCES.md; ideal-gas dry air).
 * @param temperatureC ϑ in °C (−20…50)
 * @example speedOfSound(20) // 343.2
 */
export function speedOfSound(temperatureC: number): number {
  checkTemperature(temperatureC);
  return speedOfSoundFromTemperature(temperatureC); // one formula for the whole product (lib/modes)
}

/**
 * Density of dry air, ρ₀ = p/(R·T), R = 287.05 J/(kg·K) (ideal gas; REFERENCES.md).
 * @param temperatureC ϑ in °C (−20…50); @param pressureKPa p in kPa (default 101.325)
 * @example airDensity(20) // 1.204
 */
export function airDensity(temperatureC: number, pressureKPa = 101.325): number {
  checkTemperature(temperatureC);
  if (typeof pressureKPa !== "number" || !Number.isFinite(pressureKPa) || pressureKPa < 50 || pressureKPa > 110) {
    throw new RangeError(`pressureKPa must be within 50…110, got ${pressureKPa}`);
  }
  return (pressureKPa * 1000) / (287.05 * (temperatureC + 273.15)); // ρ = p/(287.05·T)
}
