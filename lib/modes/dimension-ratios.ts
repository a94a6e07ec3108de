import type { RectRoom } from "./types";
import { checkRoom } from "./validate";

export interface DimensionRatioResult {
  /** l/h */
  lengthToHeight: number;
  /** w/h */
  widthToHeight: number;
  /** 1.1 w/h */
  lowerBound: number;
  /** 4.5 w/h - 4 */
  upperBound: number;
  conditions: { lowerBound: boolean; upperBound: boolean; lengthToHeightBelow3: boolean; widthToHeightBelow3: boolean };
  passes: boolean;
  /** Plain words for an engineer's screen. */
  verdict: string;
}

/**
 * Dimension-ratio criterion for listening rooms of EBU Tech 3276 (also ITU-R BS.1116), as given in
 * REFERENCES.md (from memory, high confidence):
 *   1.1 w/h <= l/h <= 4.5 w/h - 4,  l/h < 3,  w/h < 3
 * with l = room.lengthM, w = room.widthM, h = room.heightM as given (no re-ordering of the axes).
 *
 * @param room dimensions, m
 * @example dimensionRatioCheck({ lengthM: 7.2, widthM: 5.1, heightM: 2.7 }).passes // true
 */
export function dimensionRatioCheck(room: RectRoom): DimensionRatioResult {
  checkRoom(room);
  const lh = room.lengthM / room.heightM;
  const wh = room.widthM / room.heightM;
  // EBU Tech 3276: 1.1 w/h <= l/h <= 4.5 w/h - 4, l/h < 3, w/h < 3
  const lowerBound = 1.1 * wh;
  const upperBound = 4.5 * wh - 4;
  const conditions = { lowerBound: lh >= lowerBound, upperBound: lh <= upperBound, lengthToHeightBelow3: lh < 3, widthToHeightBelow3: wh < 3 };
  const passes = Object.values(conditions).every(Boolean);
  const r = (v: number) => v.toFixed(2);
  const fails: string[] = [];
  if (!conditions.lowerBound) fails.push(`l/h = ${r(lh)} is below 1.1 w/h = ${r(lowerBound)} (length too close to width)`);
  if (!conditions.upperBound) fails.push(`l/h = ${r(lh)} is above 4.5 w/h - 4 = ${r(upperBound)}`);
  if (!conditions.lengthToHeightBelow3) fails.push(`l/h = ${r(lh)} is not below 3`);
  if (!conditions.widthToHeightBelow3) fails.push(`w/h = ${r(wh)} is not below 3`);
  const verdict = passes
    ? `Meets the EBU Tech 3276 dimension-ratio criterion: l/h = ${r(lh)} lies within ${r(lowerBound)} ... ${r(upperBound)}, and l/h and w/h are below 3.`
    : `Does not meet the EBU Tech 3276 dimension-ratio criterion: ${fails.join("; ")}.`;
  return { lengthToHeight: lh, widthToHeight: wh, lowerBound, upperBound, conditions, passes, verdict };
}
