import { fieldIncidenceGrid, randomIncidenceGrid, type AngleGrid } from "./incidence";
import { alphaFromImpedance, createStackBuffer, prepareStack, surfaceImpedanceInto } from "./layer-impedance";
import { DEFAULT_AIR, type AirProperties, type Incidence, type Layer, type SpectrumPoint } from "./types";
import { checkAir, checkFrequencies, checkIncidence, checkLayers } from "./validate";

/** Options of {@link absorptionSpectrum}. */
export interface SpectrumOptions {
  frequenciesHz: readonly number[];
  incidence: Incidence;
  air?: AirProperties;
}

/**
 * Absorption spectrum of a layer stack on a rigid wall (transfer of the surface impedance layer by
 * layer, extended reaction). Layers are listed front to back.
 *
 * - `alpha` = 1 − |R|² exactly as computed, not clamped: outside a model's fitted range it can dip
 *   slightly below 0, and `withinModelRange` is then false.
 * - `impedance` is Z at the front face (Pa·s/m) at the given angle, or at 0° for normal, random and field.
 * - random: Paris integral over 0–90°; field: 0–78°; both by 96-node Gauss–Legendre.
 *
 * Throws TypeError (wrong type, unknown kind/model/incidence) or RangeError (value out of
 * {@link LIMITS}, empty stack, a resistive sheet directly on the wall), naming the field.
 *
 * @param layers front to back, 1…12 layers
 * @param options frequencies in Hz (10…20 000), incidence, air (default ρ₀ 1.204 kg/m³, c 343 m/s)
 * @example
 * absorptionSpectrum(
 *   [{ kind: 'porous', thicknessM: 0.05, flowResistivity: 10_000, model: 'delany-bazley' }],
 *   { frequenciesHz: [500], incidence: 'normal', air: { densityKgM3: 1.213, speedOfSound: 342.2 } },
 * )[0].alpha // 0.4974
 */
export function absorptionSpectrum(layers: readonly Layer[], options: SpectrumOptions): SpectrumPoint[] {
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
  checkLayers(layers);
  checkFrequencies(options.frequenciesHz);
  checkIncidence(options.incidence);
  const air = options.air ?? DEFAULT_AIR;
  checkAir(air);
  return spectrumUnchecked(layers, options.frequenciesHz, options.incidence, air);
}

/**
 * {@link absorptionSpectrum} without the argument checks, for callers inside lib/porous that have
 * validated already (trap sizing calls this thousands of times).
 */
export function spectrumUnchecked(
  layers: readonly Layer[],
  frequenciesHz: readonly number[],
  incidence: Incidence,
  air: AirProperties,
): SpectrumPoint[] {
  const buf = createStackBuffer(layers.length);
  const z = { re: 0, im: 0 };
  const out: SpectrumPoint[] = new Array(frequenciesHz.length);
  let grid: AngleGrid | undefined;
  let sinT = 0;
  let cosT = 1;
  if (incidence === "random") grid = randomIncidenceGrid();
  else if (incidence === "field") grid = fieldIncidenceGrid();
  else if (incidence !== "normal") {
    const t = (incidence.angleDeg * Math.PI) / 180;
    sinT = Math.sin(t);
    cosT = Math.cos(t);
  }
  for (let f = 0; f < frequenciesHz.length; f++) {
    const frequencyHz = frequenciesHz[f]!;
    prepareStack(layers, frequencyHz, air, buf);
    let alpha: number;
    let impedance: { re: number; im: number };
    if (grid === undefined) {
      surfaceImpedanceInto(buf, sinT, z);
      impedance = { re: z.re, im: z.im };
      alpha = alphaFromImpedance(z.re, z.im, cosT, buf.rho0c);
    } else {
      surfaceImpedanceInto(buf, 0, z);
      impedance = { re: z.re, im: z.im };
      alpha = 0;
      const { sinTheta, cosTheta, weight } = grid;
      for (let i = 0; i < weight.length; i++) {
        surfaceImpedanceInto(buf, sinTheta[i]!, z);
        alpha += weight[i]! * alphaFromImpedance(z.re, z.im, cosTheta[i]!, buf.rho0c);
      }
    }
    out[f] = { frequencyHz, alpha, impedance, withinModelRange: buf.withinModelRange };
  }
  return out;
}
