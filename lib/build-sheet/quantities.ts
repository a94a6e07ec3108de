import {
  BRACKET_SPACING_M,
  DEFAULT_FABRIC_MASS_KG_M2,
  DEFAULT_WOOD_DENSITY_KG_M3,
  KG_PER_CLEAT,
  SCREWS_PER_JOINT,
  SHEET_SCREW_SPACING_M,
} from "./constants";
import { fabricCutSize } from "./fabric";
import { frameDepthM, framePieces } from "./frame";
import type { Build, CutPiece, Fabric, Lumber } from "./types";

/** Materials, fixings and weight of one unit of a build. */
export interface BuildQuantities {
  pieces: CutPiece[];
  /** total length of frame pieces, m */
  frameLengthM: number;
  /** frame wood volume, m³ (rails on edge ripped to the frame depth; a corner trap's face frame flat) */
  frameVolumeM3: number;
  /** fill: width × height of one layer piece (panel / membrane), or the triangle's legs (corner trap), m */
  fillPiece: { kind: "rect"; widthM: number; heightM: number; thicknessM: number } | { kind: "triangle"; legM: number; lengthM: number };
  insulationVolumeM3: number;
  fabric: { widthM: number; heightM: number } | null;
  fabricAreaM2: number;
  /** face sheet area of a membrane / perforated trap, m² */
  sheetAreaM2: number;
  holes: { count: number; diameterM: number } | null;
  screws: number;
  /** wall cleats or hangers for panels and membrane traps */
  cleats: number;
  /** angle brackets for corner traps */
  brackets: number;
  weightKg: number;
  mounting: string;
}

/**
 * Quantities of one unit of a build: frame pieces, fill volume, fabric, face sheet, fixings (rules of
 * thumb, common practice), finished weight and a mounting note.
 * Weight = frame wood volume × wood density + fill volume × fill density + fabric area × fabric mass
 *   + face sheet volume × its density (perforations removed) — plain sums of volume × density.
 * Fixings: 2 screws per frame joint; a face sheet screwed every 150 mm round its edge; wall cleats
 *   max(2, ceil(weight / 10 kg)); corner-trap brackets per surface max(1 or 2, ceil(ℓ / spacing)),
 *   spacing 1.2 m for a floor-standing trap (tip restraint), 0.6 m overhead (common practice).
 * @example buildQuantities({ kind: 'panel', faceWidthM: 0.6, faceHeightM: 1.2, insulationThicknessM: 0.1, insulationDensityKgM3: 40 }, { lumber: { thicknessM: 0.019, widthM: 0.1 }, fabric: { wrapM: 0.05 } }).weightKg // ≈ 6.37
 */
export function buildQuantities(build: Build, materials: { lumber: Lumber; fabric: Fabric }): BuildQuantities {
  const pieces = framePieces(build, materials.lumber);
  const t = materials.lumber.thicknessM;
  const wood = materials.lumber.densityKgM3 ?? DEFAULT_WOOD_DENSITY_KG_M3;
  const fabricMass = materials.fabric.massKgM2 ?? DEFAULT_FABRIC_MASS_KG_M2;
  const frameLengthM = pieces.reduce((s, p) => s + p.lengthM * p.count, 0);
  const joints = pieces.reduce((s, p) => s + (p.label === "side" || p.label === "stile" ? 0 : 2 * p.count), 0); // each rail has two ends

  if (build.kind === "corner-trap") {
    const legM = build.depthM * Math.SQRT2;
    const frameVolumeM3 = frameLengthM * t * materials.lumber.widthM; // face frame laid flat
    const insulationVolumeM3 = build.depthM * build.depthM * build.lengthM; // section area = leg²/2 = D²
    const fabric = fabricCutSize(2 * build.depthM, build.lengthM, 0, materials.fabric.wrapM);
    const spacing = BRACKET_SPACING_M[build.orientation];
    const perSurface = Math.max(build.orientation === "wall-ceiling" ? 2 : 1, Math.ceil(build.lengthM / spacing - 1e-9));
    const weightKg = frameVolumeM3 * wood + insulationVolumeM3 * build.insulationDensityKgM3 + fabric.areaM2 * fabricMass;
    return {
      pieces,
      frameLengthM,
      frameVolumeM3,
      fillPiece: { kind: "triangle", legM, lengthM: build.lengthM },
      insulationVolumeM3,
      fabric: { widthM: fabric.widthM, heightM: fabric.heightM },
      fabricAreaM2: fabric.areaM2,
      sheetAreaM2: 0,
      holes: null,
      screws: SCREWS_PER_JOINT * joints,
      cleats: 0,
      brackets: 2 * perSurface,
      weightKg,
      mounting:
        build.orientation === "floor-to-ceiling"
          ? `Stand the trap in the corner and tie it to both walls with ${perSurface} angle bracket(s) each, screwed into studs or with anchors rated for the load (tip restraint).`
          : `Hang the trap along the wall–ceiling edge with ${perSurface} brackets into the ceiling joists and ${perSurface} into the wall studs; it hangs over people, so use fixings rated for the load.`,
    };
  }

  const depth = frameDepthM(build);
  const frameVolumeM3 = frameLengthM * t * depth; // rails on edge ripped to the frame depth
  const fillW = build.faceWidthM - 2 * t;
  const fillH = build.faceHeightM - 2 * t;
  if (build.kind === "panel") {
    const insulationVolumeM3 = fillW * fillH * build.insulationThicknessM;
    const fabric = fabricCutSize(build.faceWidthM, build.faceHeightM, depth, materials.fabric.wrapM);
    const weightKg = frameVolumeM3 * wood + insulationVolumeM3 * build.insulationDensityKgM3 + fabric.areaM2 * fabricMass;
    const cleats = Math.max(2, Math.ceil(weightKg / KG_PER_CLEAT - 1e-9));
    return {
      pieces,
      frameLengthM,
      frameVolumeM3,
      fillPiece: { kind: "rect", widthM: fillW, heightM: fillH, thicknessM: build.insulationThicknessM },
      insulationVolumeM3,
      fabric: { widthM: fabric.widthM, heightM: fabric.heightM },
      fabricAreaM2: fabric.areaM2,
      sheetAreaM2: 0,
      holes: null,
      screws: SCREWS_PER_JOINT * joints,
      cleats,
      brackets: 0,
      weightKg,
      mounting:
        (build.airGapM ?? 0) > 0
          ? `Hang on ${cleats} cleats or hangers into studs or rated anchors; the frame's back edge sits on the wall and the ${Math.round((build.airGapM ?? 0) * 1000)} mm gap stays open behind the slab.`
          : `Hang on ${cleats} cleats or hangers into studs or rated anchors, back edge against the wall.`,
    };
  }
  // membrane / perforated trap
  const insulationVolumeM3 = fillW * fillH * build.fillThicknessM;
  const sheetAreaM2 = build.faceWidthM * build.faceHeightM;
  const open = build.perforation?.openAreaRatio ?? 0;
  const sheetKg = sheetAreaM2 * (1 - open) * build.faceSheetThicknessM * build.faceSheetDensityKgM3;
  const holes = build.perforation
    ? { count: Math.round((open * sheetAreaM2) / (Math.PI * (build.perforation.holeDiameterM / 2) ** 2)), diameterM: build.perforation.holeDiameterM }
    : null;
  const weightKg = frameVolumeM3 * wood + insulationVolumeM3 * build.insulationDensityKgM3 + sheetKg;
  const cleats = Math.max(2, Math.ceil(weightKg / KG_PER_CLEAT - 1e-9));
  const perimeter = 2 * (build.faceWidthM + build.faceHeightM);
  return {
    pieces,
    frameLengthM,
    frameVolumeM3,
    fillPiece: { kind: "rect", widthM: fillW, heightM: fillH, thicknessM: build.fillThicknessM },
    insulationVolumeM3,
    fabric: null,
    fabricAreaM2: 0,
    sheetAreaM2,
    holes,
    screws: SCREWS_PER_JOINT * joints + Math.ceil(perimeter / SHEET_SCREW_SPACING_M - 1e-9),
    cleats,
    brackets: 0,
    weightKg,
    mounting: `Seal the frame's back edge to the wall (a bead of sealant) so the cavity is closed, and fix it with ${cleats} cleats into studs or rated anchors; the fill sits against the wall, clear of the face sheet.`,
  };
}
