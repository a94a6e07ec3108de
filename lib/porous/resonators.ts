import { DEFAULT_AIR, type AirProperties } from "./types";
import { checkAir, checkFrequencies, checkNumber } from "./validate";

/** Result of a resonant-absorber estimate. Every number here is an estimate, not a prediction. */
export interface ResonatorEstimate {
  estimate: true;
  method: string;
  /** f₀ of the lumped model, Hz */
  resonanceHz: number;
  /** quality factor Q = ω₀m/(ρ₀c(1 + r′)) of the loaded resonator */
  q: number;
  /** half-power bandwidth f₀/Q, Hz */
  bandwidthHz: number;
  /** α at f₀ = 4r′/(1 + r′)² */
  peakAlpha: number;
  /** true when k₀D < 0.5 at f₀, so treating the cavity as a lumped spring is fair (common practice) */
  lumpedCavityValid: boolean;
  points: { frequencyHz: number; alpha: number }[];
}

const METHOD =
  "estimate: lumped mass–spring–damper at normal incidence — mass m per unit area over a closed air cavity of depth D (stiffness ρ₀c²/D) with an assumed series resistance r′·ρ₀c; α = 4r′/((1 + r′)² + x²), x = (ωm − ρ₀c²/(ωD))/(ρ₀c) (textbook single-degree-of-freedom absorber, e.g. Kinsler et al., Fundamentals of Acoustics [from memory, high]); panel bending stiffness, cavity modes and the edge effect are not included, and r′ is an input, not predicted";

/**
 * Panel (membrane) absorber resonance by the handbook rule f₀ ≈ 60/√(m·d), m in kg/m², d in m
 * (Everest & Pohlmann, Master Handbook of Acoustics, panel absorbers). The 60 is (c/2π)√ρ₀ for air at
 * about 20 °C; a cavity filled with porous material lowers it (towards ≈ 50, isothermal spring — from memory).
 * @param massKgM2 panel surface mass, kg/m² (0.1…200); @param cavityDepthM air space behind, m (0.005…1)
 * @example membraneResonanceHz({ massKgM2: 10, cavityDepthM: 0.1 }) // 60
 */
export function membraneResonanceHz({ massKgM2, cavityDepthM }: { massKgM2: number; cavityDepthM: number }): number {
  checkNumber(massKgM2, "massKgM2", 0.1, 200);
  checkNumber(cavityDepthM, "cavityDepthM", 0.005, 1);
  return 60 / Math.sqrt(massKgM2 * cavityDepthM); // Everest & Pohlmann, Master Handbook of Acoustics
}

/**
 * Helmholtz resonator f₀ = (c/2π)√(S/(l′V)) with l′ = l + 1.7a, the end correction of a circular neck
 * of radius a flanged at both ends, 0.85a per end (Kinsler et al., Fundamentals of Acoustics [from
 * memory, high]; Everest & Pohlmann, Master Handbook of Acoustics).
 * @param neckAreaM2 S, m²; @param neckLengthM l, m; @param volumeM3 V, m³
 * @example helmholtzResonanceHz({ neckAreaM2: 7.854e-5, neckLengthM: 0.02, volumeM3: 0.001 }) // ≈ 90.6 Hz
 */
export function helmholtzResonanceHz(
  { neckAreaM2, neckLengthM, volumeM3 }: { neckAreaM2: number; neckLengthM: number; volumeM3: number },
  air: AirProperties = DEFAULT_AIR,
): number {
  checkNumber(neckAreaM2, "neckAreaM2", 1e-8, 1);
  checkNumber(neckLengthM, "neckLengthM", 0, 1);
  checkNumber(volumeM3, "volumeM3", 1e-7, 10);
  checkAir(air);
  const a = Math.sqrt(neckAreaM2 / Math.PI);
  const effective = neckLengthM + 1.7 * a; // l′ = l + 2·0.85a (both ends flanged)
  return (air.speedOfSound / (2 * Math.PI)) * Math.sqrt(neckAreaM2 / (effective * volumeM3)); // Helmholtz f₀
}

/** Geometry of a perforated panel over a cavity. */
export interface PerforatedPanel {
  /** open-area ratio ε (hole area / panel area), 0.001…0.5 */
  openAreaRatio: number;
  /** panel thickness t, m */
  plateThicknessM: number;
  /** hole diameter, m */
  holeDiameterM: number;
  /** cavity depth D, m */
  cavityDepthM: number;
}

function checkPerforated(p: PerforatedPanel): void {
  checkNumber(p.openAreaRatio, "openAreaRatio", 0.001, 0.5);
  checkNumber(p.plateThicknessM, "plateThicknessM", 0.0005, 0.1);
  checkNumber(p.holeDiameterM, "holeDiameterM", 0.0005, 0.05);
  checkNumber(p.cavityDepthM, "cavityDepthM", 0.005, 1);
}

/**
 * End-corrected neck length of a perforation, t′ = t + 0.8·d (d = hole diameter; Everest & Pohlmann,
 * Master Handbook of Acoustics, perforated panel absorbers [from memory]).
 * @example perforationEffectiveLengthM(0.006, 0.008) // 0.0124
 */
export function perforationEffectiveLengthM(plateThicknessM: number, holeDiameterM: number): number {
  return plateThicknessM + 0.8 * holeDiameterM; // t′ = t + 0.8d
}

/**
 * Perforated-panel (distributed Helmholtz) resonance f₀ = (c/2π)√(ε/(t′·D)), t′ = t + 0.8d
 * (Everest & Pohlmann, Master Handbook of Acoustics). Hole-interaction corrections at large ε are
 * not included.
 * @example perforatedPanelResonanceHz({ openAreaRatio: 0.05, plateThicknessM: 0.006, holeDiameterM: 0.008, cavityDepthM: 0.1 }) // ≈ 347 Hz
 */
export function perforatedPanelResonanceHz(panel: PerforatedPanel, air: AirProperties = DEFAULT_AIR): number {
  checkPerforated(panel);
  checkAir(air);
  const tEff = perforationEffectiveLengthM(panel.plateThicknessM, panel.holeDiameterM);
  return (air.speedOfSound / (2 * Math.PI)) * Math.sqrt(panel.openAreaRatio / (tEff * panel.cavityDepthM));
}

/**
 * Estimated normal-incidence absorption curve of a resonant absorber of acoustic mass m per unit area
 * over a closed cavity (see `method` in the result: an estimate with an assumed resistance).
 * Guidance (common practice, from memory): a panel absorber with porous material in its cavity peaks
 * at roughly α 0.3–0.6 in reverberation-room tests, i.e. r′ ≈ 0.1–0.25; r′ = 1 is the matched optimum.
 * @param massPerAreaKgM2 m, kg/m² (panel mass, or ρ₀t′/ε for a perforated panel)
 * @param cavityDepthM D, m; @param resistanceRatio r′, the series resistance over ρ₀c (0.01…10)
 * @param frequenciesHz where to evaluate (10…20 000 Hz)
 * @example resonatorAbsorptionEstimate({ massPerAreaKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 1, frequenciesHz: [60] }).peakAlpha // 1
 */
export function resonatorAbsorptionEstimate(
  {
    massPerAreaKgM2,
    cavityDepthM,
    resistanceRatio,
    frequenciesHz,
  }: { massPerAreaKgM2: number; cavityDepthM: number; resistanceRatio: number; frequenciesHz: readonly number[] },
  air: AirProperties = DEFAULT_AIR,
): ResonatorEstimate {
  checkNumber(massPerAreaKgM2, "massPerAreaKgM2", 1e-4, 200);
  checkNumber(cavityDepthM, "cavityDepthM", 0.005, 1);
  checkNumber(resistanceRatio, "resistanceRatio", 0.01, 10);
  checkFrequencies(frequenciesHz);
  checkAir(air);
  const rho0c = air.densityKgM3 * air.speedOfSound;
  const stiffness = (air.densityKgM3 * air.speedOfSound ** 2) / cavityDepthM; // closed cavity spring ρ₀c²/D, Pa/m
  const omega0 = Math.sqrt(stiffness / massPerAreaKgM2); // ω₀ = √(s/m)
  const r = resistanceRatio;
  const q = (omega0 * massPerAreaKgM2) / (rho0c * (1 + r)); // Q of the radiation-loaded resonator
  const points = frequenciesHz.map((frequencyHz) => {
    const omega = 2 * Math.PI * frequencyHz;
    const x = (omega * massPerAreaKgM2 - stiffness / omega) / rho0c;
    return { frequencyHz, alpha: (4 * r) / ((1 + r) ** 2 + x * x) }; // α = 1 − |R|² for Z = ρ₀c(r′ + jx)
  });
  const resonanceHz = omega0 / (2 * Math.PI);
  return {
    estimate: true,
    method: METHOD,
    resonanceHz,
    q,
    bandwidthHz: resonanceHz / q,
    peakAlpha: (4 * r) / (1 + r) ** 2,
    lumpedCavityValid: (omega0 / air.speedOfSound) * cavityDepthM < 0.5,
    points,
  };
}

/**
 * Panel (membrane) absorber estimate: {@link resonatorAbsorptionEstimate} with m = the panel's mass.
 * Its f₀ = (c/2π)√(ρ₀/(m·D)) is the physics behind the handbook's 60/√(m·d).
 * @example membraneAbsorberEstimate({ massKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 0.2, frequenciesHz: [40, 60, 90] }).resonanceHz // ≈ 59.9
 */
export function membraneAbsorberEstimate(
  p: { massKgM2: number; cavityDepthM: number; resistanceRatio: number; frequenciesHz: readonly number[] },
  air: AirProperties = DEFAULT_AIR,
): ResonatorEstimate {
  checkNumber(p.massKgM2, "massKgM2", 0.1, 200);
  return resonatorAbsorptionEstimate(
    { massPerAreaKgM2: p.massKgM2, cavityDepthM: p.cavityDepthM, resistanceRatio: p.resistanceRatio, frequenciesHz: p.frequenciesHz },
    air,
  );
}

/**
 * Perforated-panel absorber estimate: {@link resonatorAbsorptionEstimate} with the air mass in the
 * holes per unit panel area, m = ρ₀t′/ε (t′ = t + 0.8d).
 * @example perforatedPanelAbsorberEstimate({ openAreaRatio: 0.05, plateThicknessM: 0.006, holeDiameterM: 0.008, cavityDepthM: 0.1, resistanceRatio: 0.5, frequenciesHz: [350] }).resonanceHz // ≈ 347
 */
export function perforatedPanelAbsorberEstimate(
  p: PerforatedPanel & { resistanceRatio: number; frequenciesHz: readonly number[] },
  air: AirProperties = DEFAULT_AIR,
): ResonatorEstimate {
  checkPerforated(p);
  checkAir(air);
  const mass = (air.densityKgM3 * perforationEffectiveLengthM(p.plateThicknessM, p.holeDiameterM)) / p.openAreaRatio; // ρ₀t′/ε
  return resonatorAbsorptionEstimate(
    { massPerAreaKgM2: mass, cavityDepthM: p.cavityDepthM, resistanceRatio: p.resistanceRatio, frequenciesHz: p.frequenciesHz },
    air,
  );
}
