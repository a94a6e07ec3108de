import { modalBandwidthHz } from "./bandwidth";
import { roomModes } from "./room-modes";
import type { RectRoom, RoomMode } from "./types";
import { checkNumber, checkRt60 } from "./validate";

/** One row of the mode table. */
export interface ModeTableRow extends RoomMode {
  /** Half-power bandwidth 2.2/T, Hz. */
  bandwidthHz: number;
  /** True when the mode below or above lies closer than the bandwidth (they overlap into one peak). */
  coincident: boolean;
  /** Distance to the mode below, Hz (0 for a degenerate partner), null for the lowest mode. */
  gapBelowHz: number | null;
  /** True when gapBelowHz exceeds the wide-gap threshold. */
  wideGapBelow: boolean;
}

export interface ModeTable {
  rows: ModeTableRow[];
  bandwidthHz: number;
  wideGapHz: number;
  wideGaps: { fromHz: number; toHz: number; gapHz: number }[];
  /** Plain words for an engineer's screen. */
  verdict: string;
}

/**
 * The room's modes as a table for a screen: indices, kind, frequency, modal bandwidth, and flags for
 * coincident modes and for wide gaps between neighbours.
 *
 * Bandwidth B = ln(10^6)/(2 pi T) ~= 2.2/T (Schroeder 1996, JASA). Coincident: a neighbour closer than B
 * (|f_i - f_j| < B). Wide gap: the spacing to the mode below exceeds `wideGapHz`, default 20 Hz —
 * common practice (a rule of thumb, from memory; no published source), adjustable by the caller.
 *
 * @param room dimensions, m
 * @param options.maxFrequencyHz Hz, [1, 1000]; options.rt60Seconds s, [0.05, 10];
 *   options.speedOfSound m/s (default 343); options.wideGapHz Hz, (0, 1000] (default 20)
 * @example
 * modeTable({ lengthM: 5, widthM: 4, heightM: 3 }, { maxFrequencyHz: 60, rt60Seconds: 0.3 })
 *   .rows.map((r) => r.coincident) // [false, false, true, true] (54.91 and 57.17 Hz overlap)
 */
export function modeTable(
  room: RectRoom,
  options: { maxFrequencyHz: number; rt60Seconds: number; speedOfSound?: number; wideGapHz?: number },
): ModeTable {
  const modes = roomModes(room, options);
  const B = modalBandwidthHz(checkRt60(options.rt60Seconds));
  const wideGapHz = options.wideGapHz === undefined ? 20 : checkNumber(options.wideGapHz, "wideGapHz", 0, 1000, "Hz", true);
  const rows: ModeTableRow[] = modes.map((m, i) => {
    const below = i > 0 ? m.frequencyHz - modes[i - 1]!.frequencyHz : null;
    const above = i + 1 < modes.length ? modes[i + 1]!.frequencyHz - m.frequencyHz : null;
    const coincident = (below !== null && below < B) || (above !== null && above < B);
    return { ...m, bandwidthHz: B, coincident, gapBelowHz: below, wideGapBelow: below !== null && below > wideGapHz };
  });
  const wideGaps = rows.flatMap((r, i) => (r.wideGapBelow ? [{ fromHz: rows[i - 1]!.frequencyHz, toHz: r.frequencyHz, gapHz: r.gapBelowHz! }] : []));
  const nCo = rows.filter((r) => r.coincident).length;
  const f1 = (v: number) => v.toFixed(1);
  const verdict =
    `${rows.length} modes up to ${f1(options.maxFrequencyHz)} Hz, each about ${f1(B)} Hz wide at RT60 ${options.rt60Seconds.toFixed(2)} s. ` +
    (nCo ? `${nCo} overlap a neighbour (closer than ${f1(B)} Hz) and pile up into stronger peaks. ` : "No two modes overlap. ") +
    (wideGaps.length
      ? `${wideGaps.length} gap(s) wider than ${f1(wideGapHz)} Hz, where the bass may sound thin: ${wideGaps.map((g) => `${f1(g.fromHz)}-${f1(g.toHz)} Hz`).join(", ")}.`
      : `No gap between neighbouring modes is wider than ${f1(wideGapHz)} Hz.`);
  return { rows, bandwidthHz: B, wideGapHz, wideGaps, verdict };
}
