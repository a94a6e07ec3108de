import { spectrumUnchecked } from "./absorption-spectrum";
import { astmC423Ratings } from "./astm-c423";
import { weightedAbsorption, type WeightedAbsorption } from "./iso11654";
import { DEFAULT_AIR, type AirProperties, type Layer } from "./types";
import { checkAir, checkLayers } from "./validate";

/** Nominal one-third-octave centres used by ISO 11654 and ASTM C423, 200…5000 Hz. */
export const RATING_NOMINAL_HZ = Object.freeze([200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000]);

/**
 * Exact one-third-octave mid-band frequencies 200…5000 Hz: fm = 1000·G^(x/3), G = 10^(3/10),
 * x = −7…7 (IEC 61260-1:2014, base-ten system).
 * @example RATING_EXACT_HZ[7] // 1000
 */
export const RATING_EXACT_HZ: readonly number[] = Object.freeze(
  Array.from({ length: 15 }, (_, i) => 1000 * 10 ** ((3 / 10) * ((i - 7) / 3))), // IEC 61260-1 eq. for fm, b = 3
);

/** One band of {@link rateLayers}. */
export interface RatingBand {
  nominalHz: number;
  frequencyHz: number;
  alpha: number;
  withinModelRange: boolean;
}

/** Result of {@link rateLayers} and {@link rateThirdOctaves}. */
export interface AbsorberRating {
  iso11654: WeightedAbsorption;
  nrc: number;
  saa: number;
}

/**
 * Random-incidence α of a stack at the 15 exact one-third-octave mid-band frequencies 200…5000 Hz,
 * the input of the single-number ratings. α is taken at the mid-band frequency (not band-averaged).
 * @param layers front to back on a rigid wall; @param air optional air properties
 * @example ratingThirdOctaves([{ kind: 'porous', thicknessM: 0.05, flowResistivity: 15_000, model: 'miki' }])[7].alpha // ≈ 0.874
 */
export function ratingThirdOctaves(layers: readonly Layer[], air: AirProperties = DEFAULT_AIR): RatingBand[] {
  checkLayers(layers);
  checkAir(air);
  return spectrumUnchecked(layers, RATING_EXACT_HZ, "random", air).map((p, i) => ({
    nominalHz: RATING_NOMINAL_HZ[i]!,
    frequencyHz: p.frequencyHz,
    alpha: p.alpha,
    withinModelRange: p.withinModelRange,
  }));
}

/**
 * ISO 11654 (αp, αw, indicators, class) and ASTM C423 (NRC, SAA) ratings of 15 one-third-octave α.
 * @param thirdOctaveAlpha α at 200…5000 Hz
 * @example rateThirdOctaves(new Array(15).fill(0.95)).iso11654.absorptionClass // 'A'
 */
export function rateThirdOctaves(thirdOctaveAlpha: readonly number[]): AbsorberRating {
  return { iso11654: weightedAbsorption(thirdOctaveAlpha), ...astmC423Ratings(thirdOctaveAlpha) };
}

/**
 * Rates a layer stack from its modelled random-incidence α (an infinite layer, no edge effect): a
 * model estimate of what ISO 354 + ISO 11654 / ASTM C423 would give, not a measurement.
 * @param layers front to back; @param air optional air properties
 * @example rateLayers([{ kind: 'porous', thicknessM: 0.05, flowResistivity: 15_000, model: 'delany-bazley' }]).nrc // 0.7 (αw 0.60 MH, class C)
 */
export function rateLayers(
  layers: readonly Layer[],
  air: AirProperties = DEFAULT_AIR,
): AbsorberRating & { thirdOctaves: RatingBand[] } {
  const thirdOctaves = ratingThirdOctaves(layers, air);
  return { thirdOctaves, ...rateThirdOctaves(thirdOctaves.map((b) => b.alpha)) };
}

/**
 * Handles a parsed `absorberRatingRequestSchema` body: a stack is rated from its modelled
 * random-incidence α; measured one-third-octave α are rated as given.
 * @example rateAbsorber({ thirdOctaveAlpha: new Array(15).fill(0.85) }).iso11654.alphaW // 0.85
 */
export function rateAbsorber(
  request: { layers: readonly Layer[]; air?: AirProperties } | { thirdOctaveAlpha: readonly number[] },
): AbsorberRating & { thirdOctaves?: RatingBand[] } {
  if ("thirdOctaveAlpha" in request) return rateThirdOctaves(request.thirdOctaveAlpha);
  return rateLayers(request.layers, request.air ?? DEFAULT_AIR);
}
