import { membraneResonanceHz, porousMaterial } from "@/lib/porous";
import type { Candidate, FillMaterial } from "./types";

function fill(id: string): FillMaterial {
  const m = porousMaterial(id);
  if (!m) throw new RangeError(`unknown porous material ${id}`);
  // typical σ and the middle of the density range of the generic material (lib/porous, from memory)
  return { flowResistivity: m.flowResistivity.typical, densityKgM3: (m.densityKgM3.min + m.densityKgM3.max) / 2, model: "miki" };
}

/** 9 mm fibreboard face sheet: 750 kg/m³ (from memory: medium-density fibreboard 700–800), 6.75 kg/m². */
export const MEMBRANE_SHEET = Object.freeze({ thicknessM: 0.009, densityKgM3: 750 });
/** 6 mm fibreboard with 8 mm holes for the perforated traps (geometry ours). */
export const PERFORATED_SHEET = Object.freeze({ thicknessM: 0.006, densityKgM3: 750, holeDiameterM: 0.008 });

/**
 * Cavity depth that tunes a membrane of surface mass m to f₀ by the handbook rule f₀ = 60/√(m·d)
 * (Everest & Pohlmann, Master Handbook of Acoustics): d = (60/f₀)²/m, rounded to the millimetre.
 * @example membraneCavityForHz(63, 6.75) // 0.134
 */
export function membraneCavityForHz(frequencyHz: number, massKgM2: number): number {
  return Math.round(((60 / frequencyHz) ** 2 / massKgM2) * 1000) / 1000;
}

/**
 * Open-area ratio that tunes a perforated panel over a cavity D to f₀ by f₀ = (c/2π)√(ε/(t′D)),
 * t′ = t + 0.8d (Everest & Pohlmann): ε = (2πf₀/c)²·t′·D, rounded to 0.0001.
 * @example perforationRatioForHz(125, 0.006, 0.008, 0.15) // 0.0098
 */
export function perforationRatioForHz(frequencyHz: number, plateThicknessM: number, holeDiameterM: number, cavityDepthM: number, speedOfSound = 343): number {
  const tEff = plateThicknessM + 0.8 * holeDiameterM;
  return Math.round(((2 * Math.PI * frequencyHz) / speedOfSound) ** 2 * tEff * cavityDepthM * 10_000) / 10_000;
}

/**
 * The default candidate catalogue, generated from generic builds (our own designs, generic materials
 * from lib/porous):
 * - floor-to-ceiling porous corner traps, depth 250/350/450 mm, light glass fibre or light mineral wool;
 * - wall–ceiling corner traps in 1.2 m segments, depth 250/350 mm, the same fills;
 * - framed porous panels 1200 × 600 mm, 100/150/200 mm light mineral wool with 0/100/200 mm air gap
 *   (frame depth at most 300 mm);
 * - membrane traps 1200 × 600 mm, 9 mm fibreboard tuned to 63, 80, 100 and 125 Hz, half-filled cavity;
 * - perforated-panel (Helmholtz) traps 1200 × 600 mm, 6 mm board with 8 mm holes over 150 mm, tuned to
 *   80, 100 and 125 Hz.
 * @example defaultCatalogue().length // 24
 */
export function defaultCatalogue(): Candidate[] {
  const out: Candidate[] = [];
  const fills = [
    ["gf16", "light glass fibre", fill("glass-fibre-16")],
    ["mw35", "light mineral wool", fill("mineral-wool-35")],
  ] as const;
  for (const depthM of [0.25, 0.35, 0.45]) {
    for (const [key, label, f] of fills) {
      out.push({ id: `corner-${Math.round(depthM * 1000)}-${key}`, name: `Floor-to-ceiling corner trap, ${Math.round(depthM * 1000)} mm deep, ${label}`, kind: "corner-trap", orientation: "floor-to-ceiling", depthM, fill: f });
    }
  }
  for (const depthM of [0.25, 0.35]) {
    for (const [key, label, f] of fills) {
      out.push({ id: `edge-${Math.round(depthM * 1000)}-${key}`, name: `Wall–ceiling corner trap, ${Math.round(depthM * 1000)} mm deep, ${label}, 1.2 m segment`, kind: "corner-trap", orientation: "wall-ceiling", depthM, segmentLengthM: 1.2, fill: f });
    }
  }
  const mw = fill("mineral-wool-35");
  for (const insulationThicknessM of [0.1, 0.15, 0.2]) {
    for (const airGapM of [0, 0.1, 0.2]) {
      if (insulationThicknessM + airGapM > 0.3 + 1e-9) continue;
      const t = Math.round(insulationThicknessM * 1000);
      const g = Math.round(airGapM * 1000);
      out.push({ id: `panel-${t}-gap-${g}`, name: `Porous panel 1200 × 600 mm, ${t} mm light mineral wool${g ? ` over a ${g} mm air gap` : ""}`, kind: "panel", faceWidthM: 0.6, faceHeightM: 1.2, insulationThicknessM, airGapM, fill: mw });
    }
  }
  const mass = MEMBRANE_SHEET.thicknessM * MEMBRANE_SHEET.densityKgM3;
  for (const hz of [63, 80, 100, 125]) {
    const cavityDepthM = membraneCavityForHz(hz, mass);
    out.push({
      id: `membrane-${hz}`,
      name: `Membrane trap 1200 × 600 mm, 9 mm board over ${Math.round(cavityDepthM * 1000)} mm, tuned to about ${Math.round(membraneResonanceHz({ massKgM2: mass, cavityDepthM }))} Hz`,
      kind: "membrane-trap",
      faceWidthM: 0.6,
      faceHeightM: 1.2,
      cavityDepthM,
      fillThicknessM: Math.min(0.05, cavityDepthM / 2),
      sheet: { ...MEMBRANE_SHEET },
      resistanceRatio: 0.2, // lib/porous guidance: panel absorbers with porous fill, r′ ≈ 0.1–0.25 (from memory)
      fill: mw,
    });
  }
  for (const hz of [80, 100, 125]) {
    const cavityDepthM = 0.15;
    const openAreaRatio = perforationRatioForHz(hz, PERFORATED_SHEET.thicknessM, PERFORATED_SHEET.holeDiameterM, cavityDepthM);
    out.push({
      id: `perforated-${hz}`,
      name: `Perforated-panel trap 1200 × 600 mm, 6 mm board, 8 mm holes (${(openAreaRatio * 100).toFixed(2)} % open) over 150 mm, tuned to about ${hz} Hz`,
      kind: "membrane-trap",
      faceWidthM: 0.6,
      faceHeightM: 1.2,
      cavityDepthM,
      fillThicknessM: 0.05,
      sheet: { thicknessM: PERFORATED_SHEET.thicknessM, densityKgM3: PERFORATED_SHEET.densityKgM3 },
      resistanceRatio: 0.5, // assumed: porous fill behind the holes; r′ = 1 is the matched optimum (lib/porous)
      fill: mw,
      perforation: { holeDiameterM: PERFORATED_SHEET.holeDiameterM, openAreaRatio },
    });
  }
  return out;
}
