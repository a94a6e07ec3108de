/** Atmosphere for {@link airAttenuationDbPerM}. */
export interface Atmosphere {
  temperatureC: number;
  relativeHumidityPct: number;
  pressureKPa?: number;
}

function check(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== "number") throw new TypeError(`${field} must be a number`);
  if (!Number.isFinite(value) || value < min || value > max) throw new RangeError(`${field} must be within ${min}…${max}, got ${value}`);
  return value;
}

/**
 * Pure-tone atmospheric absorption coefficient in dB/m by ISO 9613-1:1993 (eqs. 3–5 and B.1–B.3):
 * oxygen and nitrogen relaxation frequencies from the molar concentration of water vapour.
 * The standard states ±10 % for 0.05 < h < 5 % mol, 253 < T < 323 K, p < 200 kPa.
 * @param frequencyHz f in Hz (10…20 000)
 * @param atmosphere temperature −20…50 °C, relative humidity 0…100 %, pressure 50…110 kPa
 * @example airAttenuationDbPerM(1000, { temperatureC: 20, relativeHumidityPct: 50 }) // 0.00466
 */
export function airAttenuationDbPerM(frequencyHz: number, atmosphere: Atmosphere): number {
  const f = check(frequencyHz, "frequencyHz", 10, 20_000);
  if (typeof atmosphere !== "object" || atmosphere === null) throw new TypeError("atmosphere must be an object");
  const tC = check(atmosphere.temperatureC, "temperatureC", -20, 50);
  const hr = check(atmosphere.relativeHumidityPct, "relativeHumidityPct", 0, 100);
  const pa = check(atmosphere.pressureKPa ?? 101.325, "pressureKPa", 50, 110);
  const pr = 101.325; // reference pressure, kPa
  const T = tC + 273.15;
  const T0 = 293.15; // reference temperature, K
  const T01 = 273.16; // triple-point isotherm, K
  const C = -6.8346 * (T01 / T) ** 1.261 + 4.6151; // ISO 9613-1 eq. B.3
  const psatOverPr = 10 ** C; // ISO 9613-1 eq. B.2
  const h = (hr * psatOverPr) / (pa / pr); // molar concentration of water vapour, % — eq. B.1
  const frO = (pa / pr) * (24 + (4.04e4 * h * (0.02 + h)) / (0.391 + h)); // eq. 3
  const frN = (pa / pr) * (T / T0) ** -0.5 * (9 + 280 * h * Math.exp(-4.17 * ((T / T0) ** (-1 / 3) - 1))); // eq. 4
  const f2 = f * f;
  return (
    8.686 *
    f2 *
    (1.84e-11 * (pr / pa) * (T / T0) ** 0.5 +
      (T / T0) ** -2.5 *
        ((0.01275 * Math.exp(-2239.1 / T)) / (frO + f2 / frO) + (0.1068 * Math.exp(-3352.0 / T)) / (frN + f2 / frN)))
  ); // eq. 5, dB/m
}

/**
 * Intensity attenuation coefficient m (1/m) from an attenuation in dB/m: m = a/(10·lg e)
 * (CONTRACTS.md; the m of the 4mV term).
 * @example intensityAttenuationPerM(0.00466) // 0.001073
 */
export function intensityAttenuationPerM(dbPerM: number): number {
  check(dbPerM, "dbPerM", 0, 10);
  return dbPerM / (10 * Math.LOG10E); // m = a / (10 log10 e)
}
