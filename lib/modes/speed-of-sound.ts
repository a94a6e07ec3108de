import { checkNumber } from "./validate";

/**
 * Speed of sound in dry air from its temperature, m/s.
 *
 * c = 331.3 * sqrt(1 + T/273.15), T in degrees Celsius — ideal-gas law with c(0 C) = 331.3 m/s
 * (REFERENCES.md, "Air").
 *
 * @param temperatureC air temperature, degrees Celsius, in [-50, 60]
 * @returns speed of sound, m/s
 * @throws RangeError when temperatureC is outside [-50, 60] or not finite
 * @example speedOfSoundFromTemperature(20) // 343.21
 */
export function speedOfSoundFromTemperature(temperatureC: number): number {
  checkNumber(temperatureC, "temperatureC", -50, 60, "degrees C");
  // Ideal-gas speed of sound, c = 331.3 sqrt(1 + T/273.15) (REFERENCES.md)
  return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}
