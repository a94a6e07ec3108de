/**
 * The asymptotic (smoothed) number of modes below a frequency and its derivative, the modal density.
 */
import type { RectRoom } from "./types";
import { checkFrequency, checkRoom, checkSpeedOfSound } from "./validate";

/** Volume V, total surface S and total edge length L = 4 (Lx + Ly + Lz) of the room. */
function geometry(room: RectRoom): { V: number; S: number; L: number } {
  const { lengthM: a, widthM: b, heightM: h } = room;
  return { V: a * b * h, S: 2 * (a * b + a * h + b * h), L: 4 * (a + b + h) };
}

/**
 * Asymptotic number of modes with frequency below f.
 *
 * N(f) = 4 pi V f^3 / (3 c^3) + pi S f^2 / (4 c^2) + L f / (8 c) (Kuttruff, Room Acoustics; REFERENCES.md)
 *
 * @param room dimensions, m
 * @param frequencyHz Hz
 * @param speedOfSound m/s, default 343
 * @throws TypeError / RangeError naming the field for bad arguments
 * @returns expected count of modes (a real number)
 * @example asymptoticModeCount({ lengthM: 5, widthM: 4, heightM: 3 }, 300) // 229.9
 */
export function asymptoticModeCount(room: RectRoom, frequencyHz: number, speedOfSound = 343): number {
  checkRoom(room);
  checkFrequency(frequencyHz, "frequencyHz");
  checkSpeedOfSound(speedOfSound);
  const { V, S, L } = geometry(room);
  const f = frequencyHz, c = speedOfSound;
  // Kuttruff, Room Acoustics: N(f) = 4 pi V f^3/(3c^3) + pi S f^2/(4c^2) + L f/(8c)
  return (4 * Math.PI * V * f ** 3) / (3 * c ** 3) + (Math.PI * S * f ** 2) / (4 * c ** 2) + (L * f) / (8 * c);
}

/**
 * Modal density: expected modes per hertz at f.
 *
 * dN/df = 4 pi V f^2 / c^3 + pi S f / (2 c^2) + L / (8 c) (derivative of Kuttruff's N(f))
 *
 * @example modalDensity({ lengthM: 5, widthM: 4, heightM: 3 }, 100) // 0.33 modes per Hz
 */
export function modalDensity(room: RectRoom, frequencyHz: number, speedOfSound = 343): number {
  checkRoom(room);
  checkFrequency(frequencyHz, "frequencyHz");
  checkSpeedOfSound(speedOfSound);
  const { V, S, L } = geometry(room);
  const f = frequencyHz, c = speedOfSound;
  // d/df of Kuttruff's N(f)
  return (4 * Math.PI * V * f ** 2) / c ** 3 + (Math.PI * S * f) / (2 * c ** 2) + L / (8 * c);
}
