import { buildQuantities, type Build } from "@/lib/build-sheet";
import { cornerTrapAbsorption, membraneAbsorberEstimate, panelAbsorption, perforatedPanelAbsorberEstimate, type AirProperties, type Layer } from "@/lib/porous";
import type { Candidate, EvaluatedCandidate, MaterialPrices, Placement, SizerLimits } from "./types";

/** Frame lumber the sizer prices: 19 mm thick, as wide as the frame is deep (common practice). */
const LUMBER_THICKNESS_M = 0.019;
const FABRIC = { wrapM: 0.05 };
/** Points per octave band averaged for a resonator's narrow peak. */
const RESONATOR_POINTS = 9;

export function placementOf(c: Candidate): Placement {
  if (c.kind === "corner-trap") return c.orientation === "floor-to-ceiling" ? "vertical-corner" : "ceiling-edge";
  return "wall";
}

function toBuild(c: Candidate, roomHeightM: number): Build {
  switch (c.kind) {
    case "corner-trap":
      return { kind: "corner-trap", depthM: c.depthM, lengthM: c.orientation === "floor-to-ceiling" ? roomHeightM : c.segmentLengthM, orientation: c.orientation, insulationDensityKgM3: c.fill.densityKgM3 };
    case "panel":
      return { kind: "panel", faceWidthM: c.faceWidthM, faceHeightM: c.faceHeightM, insulationThicknessM: c.insulationThicknessM, airGapM: c.airGapM, insulationDensityKgM3: c.fill.densityKgM3 };
    case "membrane-trap":
      return {
        kind: "membrane-trap",
        faceWidthM: c.faceWidthM,
        faceHeightM: c.faceHeightM,
        cavityDepthM: c.cavityDepthM,
        fillThicknessM: c.fillThicknessM,
        faceSheetThicknessM: c.sheet.thicknessM,
        faceSheetDensityKgM3: c.sheet.densityKgM3,
        insulationDensityKgM3: c.fill.densityKgM3,
        ...(c.perforation ? { perforation: c.perforation } : {}),
      };
  }
}

/** How far a candidate stands out from its wall, m: a corner trap its leg D·√2, a panel slab + gap, a trap cavity + sheet. */
export function projectionOf(c: Candidate): number {
  if (c.kind === "corner-trap") return c.depthM * Math.SQRT2;
  if (c.kind === "panel") return c.insulationThicknessM + c.airGapM;
  return c.cavityDepthM + c.sheet.thicknessM;
}

function unitAbsorption(c: Candidate, roomHeightM: number, exactHz: readonly number[], air: AirProperties): { areas: number[]; method: string } {
  if (c.kind === "corner-trap") {
    const lengthM = c.orientation === "floor-to-ceiling" ? roomHeightM : c.segmentLengthM;
    const r = cornerTrapAbsorption({ depthM: c.depthM, lengthM, orientation: c.orientation, flowResistivity: c.fill.flowResistivity, model: c.fill.model, frequenciesHz: exactHz }, air);
    return { areas: r.bands.map((b) => b.absorptionAreaM2), method: "lib/porous cornerTrapAbsorption: random-incidence α of the fill over the face (strip model), diffraction edge effect not included" };
  }
  if (c.kind === "panel") {
    const layers: Layer[] = [{ kind: "porous", thicknessM: c.insulationThicknessM, flowResistivity: c.fill.flowResistivity, model: c.fill.model }];
    if (c.airGapM > 0) layers.push({ kind: "air", thicknessM: c.airGapM });
    const r = panelAbsorption({ widthM: c.faceWidthM, heightM: c.faceHeightM, layers, frequenciesHz: exactHz }, air);
    return { areas: r.bands.map((b) => b.absorptionAreaM2), method: "lib/porous panelAbsorption: random-incidence α of the layer stack × face area, diffraction edge effect not included" };
  }
  // resonators: the estimate's α averaged over the octave band (narrow peaks), × face area
  const ratio = 2 ** (1 / 2);
  const faceM2 = c.faceWidthM * c.faceHeightM;
  const areas = exactHz.map((f) => {
    const freqs = Array.from({ length: RESONATOR_POINTS }, (_, i) => (f / ratio) * ratio ** ((2 * i) / (RESONATOR_POINTS - 1)));
    const est = c.perforation
      ? perforatedPanelAbsorberEstimate({ openAreaRatio: c.perforation.openAreaRatio, plateThicknessM: c.sheet.thicknessM, holeDiameterM: c.perforation.holeDiameterM, cavityDepthM: c.cavityDepthM, resistanceRatio: c.resistanceRatio, frequenciesHz: freqs }, air)
      : membraneAbsorberEstimate({ massKgM2: c.sheet.thicknessM * c.sheet.densityKgM3, cavityDepthM: c.cavityDepthM, resistanceRatio: c.resistanceRatio, frequenciesHz: freqs }, air);
    return (est.points.reduce((s, p) => s + p.alpha, 0) / est.points.length) * faceM2;
  });
  return {
    areas,
    method: `lib/porous ${c.perforation ? "perforatedPanelAbsorberEstimate" : "membraneAbsorberEstimate"}: lumped normal-incidence estimate with an assumed resistance r′ = ${c.resistanceRatio}, averaged over each octave band and used as a Sabine α over the face — an estimate, not a prediction`,
  };
}

function unitCost(build: Build, prices: MaterialPrices): { cost: number; weightKg: number } {
  const depth = build.kind === "panel" ? build.insulationThicknessM + (build.airGapM ?? 0) : build.kind === "membrane-trap" ? build.cavityDepthM : 0.1;
  const lumber = { thicknessM: LUMBER_THICKNESS_M, widthM: Math.max(depth, 0.05) };
  const q = buildQuantities(build, { lumber, fabric: FABRIC });
  const cost =
    q.frameVolumeM3 * prices.lumberPerM3 +
    q.insulationVolumeM3 * prices.insulationPerM3 +
    q.fabricAreaM2 * prices.fabricPerM2 +
    q.sheetAreaM2 * prices.sheetPerM2 +
    q.screws * prices.screwEach +
    q.cleats * prices.cleatEach +
    q.brackets * prices.bracketEach;
  return { cost, weightKg: q.weightKg };
}

/**
 * Evaluates every candidate for a room: its build (lib/build-sheet), projection from the wall, the
 * absorption area of one unit per octave band (lib/porous engines at the room's air), the unit cost at
 * the material prices (pro rata, lib/build-sheet quantities) and weight, how many fit the limits, and
 * whether the depth limit allows it.
 */
export function evaluateCandidates(
  catalogue: readonly Candidate[],
  ctx: { roomHeightM: number; exactHz: readonly number[]; air: AirProperties; prices: MaterialPrices; limits: SizerLimits },
): EvaluatedCandidate[] {
  const seen = new Set<string>();
  return catalogue.map((c, i) => {
    if (typeof c !== "object" || c === null || typeof c.id !== "string" || c.id.length === 0) throw new TypeError(`catalogue[${i}].id must be a non-empty string`);
    if (seen.has(c.id)) throw new RangeError(`catalogue[${i}].id '${c.id}' is used twice`);
    seen.add(c.id);
    const placement = placementOf(c);
    const build = toBuild(c, ctx.roomHeightM);
    const projectionM = projectionOf(c);
    const { cost, weightKg } = unitCost(build, ctx.prices);
    const { areas, method } = unitAbsorption(c, ctx.roomHeightM, ctx.exactHz, ctx.air);
    const wallAreaM2 = placement === "wall" && c.kind !== "corner-trap" ? c.faceWidthM * c.faceHeightM : 0;
    let capacity: number;
    if (placement === "vertical-corner") capacity = ctx.limits.verticalCorners.length;
    else if (placement === "ceiling-edge") {
      const seg = (c as { segmentLengthM: number }).segmentLengthM;
      capacity = ctx.limits.ceilingEdges.reduce((s, e) => s + Math.floor(e.lengthM / seg + 1e-9), 0);
    } else capacity = Math.floor(ctx.limits.wallAreaM2 / wallAreaM2 + 1e-9);
    const allowed = projectionM <= ctx.limits.maxDepthM + 1e-9;
    return {
      id: c.id,
      name: c.name,
      kind: c.kind,
      placement,
      build,
      depthM: c.kind === "corner-trap" ? c.depthM : projectionM,
      projectionM,
      wallAreaM2,
      capacity,
      unitCost: cost,
      unitWeightKg: weightKg,
      unitAbsorptionM2: areas,
      method,
      allowed,
      ...(allowed ? {} : { excludedBecause: `stands ${Math.round(projectionM * 1000)} mm from the wall, more than the ${Math.round(ctx.limits.maxDepthM * 1000)} mm allowed` }),
    };
  });
}
