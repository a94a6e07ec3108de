import type { CutPiece, StockBoard } from "./types";
import { checkInteger, checkNumber, LENGTH_EPS_M } from "./validate";

/** One stock board of an optimised cut list. */
export interface BoardPlan {
  stockLengthM: number;
  cuts: { label: string; lengthM: number }[];
  /** length consumed by the cuts and their kerfs, m */
  usedM: number;
  offcutM: number;
}

/** Result of {@link optimiseCuts}. */
export interface CutPlan {
  boards: BoardPlan[];
  /** boards needed per stock length, shortest first */
  countsByLength: { lengthM: number; count: number }[];
  method: string;
}

const METHOD =
  "first-fit decreasing: pieces longest first, each into the first open board with room for it plus one kerf, else a new board of the longest stock length; each board is then cut from the shortest stock length that holds its cuts. A heuristic: it uses at most 11/9·OPT + 6/9 boards of one length (Dósa 2007, bin packing bound [from memory, high]), not always the fewest.";

/**
 * Packs frame pieces into stock boards by first-fit decreasing, each cut consuming its length plus one
 * saw kerf (conservative: the last cut of a board is charged a kerf too).
 * @param pieces lengths in m with counts; @param stock available stock lengths (m) and prices; @param kerfM kerf per cut, m
 * @example optimiseCuts([{ label: 'side', lengthM: 1.2, count: 2 }, { label: 'end', lengthM: 0.562, count: 2 }], [{ lengthM: 2.4 }], 0.003).boards.length // 2
 */
export function optimiseCuts(pieces: readonly CutPiece[], stock: readonly StockBoard[], kerfM: number): CutPlan {
  if (!Array.isArray(pieces)) throw new TypeError("pieces must be an array");
  if (!Array.isArray(stock) || stock.length === 0) throw new RangeError("stockBoards must hold at least one stock length");
  checkNumber(kerfM, "kerfM", 0, 0.02);
  stock.forEach((s, i) => checkNumber(s.lengthM, `stockBoards[${i}].lengthM`, 0.3, 12));
  const lengths = [...new Set(stock.map((s) => s.lengthM))].sort((a, b) => a - b);
  const longest = lengths[lengths.length - 1]!;
  const flat: { label: string; lengthM: number }[] = [];
  pieces.forEach((p, i) => {
    checkNumber(p.lengthM, `pieces[${i}].lengthM`, 0.001, 12);
    checkInteger(p.count, `pieces[${i}].count`, 0, 100_000);
    if (p.lengthM + kerfM > longest + LENGTH_EPS_M) {
      throw new RangeError(`pieces[${i}] (${p.label}, ${p.lengthM} m) is longer than the longest stock board (${longest} m): join it or buy longer stock`);
    }
    for (let k = 0; k < p.count; k++) flat.push({ label: p.label, lengthM: p.lengthM });
  });
  flat.sort((a, b) => b.lengthM - a.lengthM || a.label.localeCompare(b.label));
  const open: { cuts: { label: string; lengthM: number }[]; usedM: number }[] = [];
  for (const piece of flat) {
    const need = piece.lengthM + kerfM;
    let board = open.find((b) => b.usedM + need <= longest + LENGTH_EPS_M);
    if (!board) {
      board = { cuts: [], usedM: 0 };
      open.push(board);
    }
    board.cuts.push(piece);
    board.usedM += need;
  }
  const boards = open.map((b) => {
    const stockLengthM = lengths.find((l) => b.usedM <= l + LENGTH_EPS_M)!;
    return { stockLengthM, cuts: b.cuts, usedM: b.usedM, offcutM: Math.max(0, stockLengthM - b.usedM) };
  });
  const countsByLength = lengths
    .map((lengthM) => ({ lengthM, count: boards.filter((b) => b.stockLengthM === lengthM).length }))
    .filter((c) => c.count > 0);
  return { boards, countsByLength, method: METHOD };
}
