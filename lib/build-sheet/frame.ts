import { CENTRE_RAIL_ABOVE_M, CORNER_RAIL_SPACING_M } from "./constants";
import type { Build, CutPiece, Lumber } from "./types";
import { checkNumber, LENGTH_EPS_M } from "./validate";

/** Depth of the frame (rails on edge) of a build, m: panel slab + gap, membrane cavity; a corner trap's face frame lies flat (0). */
export function frameDepthM(build: Build): number {
  if (build.kind === "panel") return build.insulationThicknessM + (build.airGapM ?? 0);
  if (build.kind === "membrane-trap") return build.cavityDepthM;
  return 0;
}

/** Checks the numbers of a build against sane bounds, naming the field. */
export function checkBuild(build: Build, field = "build"): void {
  if (typeof build !== "object" || build === null) throw new TypeError(`${field} must be an object`);
  switch (build.kind) {
    case "panel":
      checkNumber(build.faceWidthM, `${field}.faceWidthM`, 0.1, 3);
      checkNumber(build.faceHeightM, `${field}.faceHeightM`, 0.1, 3);
      checkNumber(build.insulationThicknessM, `${field}.insulationThicknessM`, 0.01, 0.5);
      checkNumber(build.airGapM ?? 0, `${field}.airGapM`, 0, 0.5);
      checkNumber(build.insulationDensityKgM3, `${field}.insulationDensityKgM3`, 5, 300);
      return;
    case "corner-trap":
      checkNumber(build.depthM, `${field}.depthM`, 0.05, 1);
      checkNumber(build.lengthM, `${field}.lengthM`, 0.1, 10);
      if (build.orientation !== "floor-to-ceiling" && build.orientation !== "wall-ceiling") {
        throw new TypeError(`${field}.orientation must be 'floor-to-ceiling' or 'wall-ceiling', got ${String(build.orientation)}`);
      }
      checkNumber(build.insulationDensityKgM3, `${field}.insulationDensityKgM3`, 5, 300);
      return;
    case "membrane-trap":
      checkNumber(build.faceWidthM, `${field}.faceWidthM`, 0.1, 3);
      checkNumber(build.faceHeightM, `${field}.faceHeightM`, 0.1, 3);
      checkNumber(build.cavityDepthM, `${field}.cavityDepthM`, 0.01, 0.5);
      checkNumber(build.fillThicknessM, `${field}.fillThicknessM`, 0, build.cavityDepthM);
      checkNumber(build.faceSheetThicknessM, `${field}.faceSheetThicknessM`, 0.001, 0.05);
      checkNumber(build.faceSheetDensityKgM3, `${field}.faceSheetDensityKgM3`, 100, 3000);
      checkNumber(build.insulationDensityKgM3, `${field}.insulationDensityKgM3`, 5, 300);
      if (build.perforation) {
        checkNumber(build.perforation.holeDiameterM, `${field}.perforation.holeDiameterM`, 0.001, 0.05);
        checkNumber(build.perforation.openAreaRatio, `${field}.perforation.openAreaRatio`, 0.001, 0.5);
      }
      return;
    default:
      throw new TypeError(`${field}.kind must be 'panel', 'corner-trap' or 'membrane-trap', got ${String((build as { kind?: unknown }).kind)}`);
  }
}

/** Checks a lumber section. */
export function checkLumber(lumber: Lumber, field = "lumber"): void {
  if (typeof lumber !== "object" || lumber === null) throw new TypeError(`${field} must be an object`);
  checkNumber(lumber.thicknessM, `${field}.thicknessM`, 0.005, 0.1);
  checkNumber(lumber.widthM, `${field}.widthM`, 0.01, 0.5);
  checkNumber(lumber.densityKgM3 ?? 500, `${field}.densityKgM3`, 100, 1500);
}

/**
 * Frame pieces of one unit of a build (hand-framing rules, common practice):
 * - panel / membrane trap: a box of rails on edge, the two sides run the face height H, the two ends fit
 *   between them (W − 2t); one centre rail (W − 2t) when H exceeds 1.2 m; a panel with an air gap gets two
 *   retaining slats (W − 2t) that hold the slab at the front.
 * - corner trap: a face frame laid flat — two stiles of the run length ℓ at the face edges and face rails
 *   (2D − 2t) at both ends and at most every 1.2 m between.
 * The frame depth (slab + gap, or the cavity) must not exceed the lumber's width: the rails are used on
 * edge, ripped down when wider.
 * @param build the build; @param lumber section thickness t × width, m
 * @example framePieces({ kind: 'panel', faceWidthM: 0.6, faceHeightM: 1.2, insulationThicknessM: 0.1, insulationDensityKgM3: 40 }, { thicknessM: 0.019, widthM: 0.1 })
 *   // [{ label: 'side', lengthM: 1.2, count: 2 }, { label: 'end', lengthM: 0.562, count: 2 }]
 */
export function framePieces(build: Build, lumber: Lumber): CutPiece[] {
  checkBuild(build);
  checkLumber(lumber);
  const t = lumber.thicknessM;
  if (build.kind === "corner-trap") {
    const rail = 2 * build.depthM - 2 * t; // face width 2D between the two stiles
    if (rail <= LENGTH_EPS_M) throw new RangeError(`build.depthM (${build.depthM} m) leaves no room for face rails between two ${t} m stiles`);
    const rails = Math.ceil(build.lengthM / CORNER_RAIL_SPACING_M - 1e-9) + 1;
    return [
      { label: "stile", lengthM: build.lengthM, count: 2 },
      { label: "face rail", lengthM: rail, count: rails },
    ];
  }
  const depth = frameDepthM(build);
  if (depth > lumber.widthM + LENGTH_EPS_M) {
    throw new RangeError(`lumber.widthM (${lumber.widthM} m) is narrower than the frame depth ${depth.toFixed(3)} m: choose a wider section`);
  }
  const inner = build.faceWidthM - 2 * t;
  if (inner <= LENGTH_EPS_M) throw new RangeError(`build.faceWidthM (${build.faceWidthM} m) leaves no room between two ${t} m sides`);
  const pieces: CutPiece[] = [
    { label: "side", lengthM: build.faceHeightM, count: 2 },
    { label: "end", lengthM: inner, count: 2 },
  ];
  if (build.faceHeightM > CENTRE_RAIL_ABOVE_M + LENGTH_EPS_M) pieces.push({ label: "centre rail", lengthM: inner, count: 1 });
  if (build.kind === "panel" && (build.airGapM ?? 0) > 0) pieces.push({ label: "retaining slat", lengthM: inner, count: 2 });
  return pieces;
}
