/**
 * Shared types of the low-frequency engine. SI units throughout: metres, seconds, hertz.
 * Axes: x runs along the length, y along the width, z up the height (CONTRACTS.md, lib/modes).
 */

/** A rectangular (shoebox) room with rigid walls. */
export interface RectRoom {
  /** Length along x, m. */
  lengthM: number;
  /** Width along y, m. */
  widthM: number;
  /** Height along z, m. */
  heightM: number;
}

/** Axial: one non-zero index; tangential: two; oblique: three. */
export type ModeKind = "axial" | "tangential" | "oblique";

/** One standing wave (nx, ny, nz) of a rectangular room and its frequency, Hz. */
export interface RoomMode {
  nx: number;
  ny: number;
  nz: number;
  frequencyHz: number;
  kind: ModeKind;
}

/** A point [x, y, z] in metres, measured from the corner at the origin; 0 <= x <= lengthM etc. */
export type Point3 = [number, number, number];

/**
 * A low-frequency source (for example a subwoofer) for the multi-source sums. All sources are driven
 * by the same signal; each may be delayed and/or inverted. Time convention e^{+j omega t}: a delay of
 * tau seconds multiplies its contribution by e^{-j omega tau}.
 */
export interface SoundSource {
  /** Position in the room, m. */
  position: Point3;
  /** Signal delay, ms (0 when omitted); 0 <= delayMs <= 1000. */
  delayMs?: number;
  /** Polarity, +1 (default) or -1. */
  polarity?: 1 | -1;
}

/** A cooperative cancellation flag, shaped like `AbortSignal` (a real AbortSignal works). */
export interface AbortFlag {
  readonly aborted: boolean;
}

/** Options shared by the long computations that can report progress and be cancelled. */
export interface ProgressOptions {
  /** Called with the fraction done, in (0, 1], ending with exactly 1. */
  onProgress?: (fraction: number) => void;
  /** Checked between rows; when `aborted` is true the call throws an Error named "AbortError". */
  signal?: AbortFlag;
}
