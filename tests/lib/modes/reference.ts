/**
 * Slow, independent reference evaluations used only by the tests. They are written straight from
 * the formulas in ../shared/CONTRACTS.md (section lib/modes) without sharing any code with lib/modes:
 * a brute-force triple loop over mode indices and the modal sum in hand-written complex arithmetic.
 */

export interface RefMode { nx: number; ny: number; nz: number; f: number }

/** Every (nx, ny, nz) with f <= fMax by brute force; includeZero adds (0,0,0). Rayleigh's equation. */
export function bruteForceModes(
  L: [number, number, number],
  fMax: number,
  c = 343,
  includeZero = false,
): RefMode[] {
  const out: RefMode[] = [];
  const [lx, ly, lz] = L;
  // Upper bounds on each index from f <= fMax on the axis alone, with a safety margin of 2.
  const mx = Math.ceil((2 * lx * fMax) / c) + 2;
  const my = Math.ceil((2 * ly * fMax) / c) + 2;
  const mz = Math.ceil((2 * lz * fMax) / c) + 2;
  for (let nx = 0; nx <= mx; nx++)
    for (let ny = 0; ny <= my; ny++)
      for (let nz = 0; nz <= mz; nz++) {
        if (nx === 0 && ny === 0 && nz === 0 && !includeZero) continue;
        // Rayleigh: f = c/2 sqrt((nx/Lx)^2 + (ny/Ly)^2 + (nz/Lz)^2)
        const f = (c / 2) * Math.sqrt((nx / lx) ** 2 + (ny / ly) ** 2 + (nz / lz) ** 2);
        if (f <= fMax) out.push({ nx, ny, nz, f });
      }
  return out;
}

interface C { re: number; im: number }
const cadd = (a: C, b: C): C => ({ re: a.re + b.re, im: a.im + b.im });
const cmul = (a: C, b: C): C => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
const cdiv = (a: C, b: C): C => {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};
const cabs = (a: C): number => Math.hypot(a.re, a.im);

export interface RefSource { position: [number, number, number]; delayMs?: number; polarity?: number }

/**
 * Complex modal sum H(omega) exactly as CONTRACTS.md writes it, for one or several sources
 * (each multiplied by polarity * e^{-j omega tau}, time convention e^{+j omega t}).
 * `skip` removes chosen modes (used to show a node's missing term).
 */
export function referenceH(
  L: [number, number, number],
  sources: RefSource[],
  receiver: [number, number, number],
  fHz: number,
  t60: number,
  fMaxModes: number,
  c = 343,
  skip: (m: RefMode) => boolean = () => false,
): C {
  const modes = bruteForceModes(L, fMaxModes, c, true);
  const w = 2 * Math.PI * fHz;
  const delta = (3 * Math.log(10)) / t60;
  const psi = (m: RefMode, p: [number, number, number]): number =>
    Math.cos((m.nx * Math.PI * p[0]) / L[0]) *
    Math.cos((m.ny * Math.PI * p[1]) / L[1]) *
    Math.cos((m.nz * Math.PI * p[2]) / L[2]);
  let sum: C = { re: 0, im: 0 };
  for (const m of modes) {
    if (skip(m)) continue;
    const lam = (m.nx ? 0.5 : 1) * (m.ny ? 0.5 : 1) * (m.nz ? 0.5 : 1);
    const wn = 2 * Math.PI * m.f;
    const den: C = { re: lam * (w * w - wn * wn), im: lam * (-2 * delta * wn) };
    let num: C = { re: 0, im: 0 };
    for (const s of sources) {
      const tau = (s.delayMs ?? 0) / 1000;
      const g: C = { re: (s.polarity ?? 1) * Math.cos(w * tau), im: -(s.polarity ?? 1) * Math.sin(w * tau) };
      num = cadd(num, cmul(g, { re: psi(m, s.position) * psi(m, receiver), im: 0 }));
    }
    sum = cadd(sum, cdiv(num, den));
  }
  return { re: w * sum.re, im: w * sum.im };
}

/** 20 log10 |H| of the reference sum, dB. */
export function referenceLevelDb(...args: Parameters<typeof referenceH>): number {
  return 20 * Math.log10(cabs(referenceH(...args)));
}

/** Population standard deviation, written out: sqrt(mean((v - mean)^2)). */
export function refPopulationStd(v: number[]): number {
  const m = v.reduce((a, b) => a + b, 0) / v.length;
  return Math.sqrt(v.reduce((a, b) => a + (b - m) ** 2, 0) / v.length);
}

/** n log-spaced frequencies from a to b inclusive. */
export function refLogSpace(a: number, b: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => a * Math.pow(b / a, n === 1 ? 0 : i / (n - 1)));
}
