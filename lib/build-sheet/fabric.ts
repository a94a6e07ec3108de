import { checkNumber } from "./validate";

/**
 * Fabric cut size for a framed face: the face, plus the frame depth on each side, plus the wrap onto the
 * back of the frame on each side (common practice: ≥ 50 mm to staple into).
 * width = W + 2·(D + wrap), height = H + 2·(D + wrap).
 * @param faceWidthM W, m; @param faceHeightM H, m; @param depthM D, m (0 for a face frame laid flat); @param wrapM m
 * @example fabricCutSize(0.6, 1.2, 0.1, 0.05) // { widthM: 0.9, heightM: 1.5, areaM2: 1.35 }
 */
export function fabricCutSize(faceWidthM: number, faceHeightM: number, depthM: number, wrapM: number): { widthM: number; heightM: number; areaM2: number } {
  checkNumber(faceWidthM, "faceWidthM", 0.01, 10);
  checkNumber(faceHeightM, "faceHeightM", 0.01, 20);
  checkNumber(depthM, "depthM", 0, 1);
  checkNumber(wrapM, "fabric.wrapM", 0, 0.3);
  const widthM = faceWidthM + 2 * (depthM + wrapM);
  const heightM = faceHeightM + 2 * (depthM + wrapM);
  return { widthM, heightM, areaM2: widthM * heightM };
}
