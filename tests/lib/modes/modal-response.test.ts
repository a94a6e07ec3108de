import { describe, expect, it } from "vitest";
import { modalResponse } from "../../../lib/modes/index";
import { bruteForceModes, referenceLevelDb, refLogSpace } from "./reference";

const room = { lengthM: 5, widthM: 4, heightM: 3 };
const L: [number, number, number] = [5, 4, 3];

describe("modalResponse(room, { source, receiver, frequenciesHz, rt60Seconds, speedOfSound, maxModeFrequencyHz })", () => {
  it("matches a direct slow evaluation of the contract's modal sum (hand-written complex arithmetic in the test) to 1e-9 dB", () => {
    const cases: { s: [number, number, number]; r: [number, number, number]; t: number; fm: number }[] = [
      { s: [0.3, 0.4, 0.2], r: [3.1, 2.2, 1.2], t: 0.5, fm: 200 },
      { s: [4.9, 0.1, 2.9], r: [1.7, 3.3, 0.6], t: 0.25, fm: 150 },
      { s: [0, 0, 0], r: [5, 4, 3], t: 1.5, fm: 300 },
    ];
    const freqs = refLogSpace(10, 250, 37);
    for (const c of cases) {
      const got = modalResponse(room, { source: c.s, receiver: c.r, frequenciesHz: freqs, rt60Seconds: c.t, maxModeFrequencyHz: c.fm });
      expect(got).toHaveLength(freqs.length);
      freqs.forEach((f, i) => {
        const ref = referenceLevelDb(L, [{ position: c.s }], c.r, f, c.t, c.fm);
        expect(Math.abs(got[i]! - ref)).toBeLessThan(1e-9);
      });
    }
  });

  it("shows the dip of mode (1,0,0) at 34.30 Hz for a receiver on its pressure node x = Lx/2 (mode shape cos(pi x / Lx) = 0, CONTRACTS.md)", () => {
    const opts = { source: [0.2, 0.3, 0.25] as [number, number, number], frequenciesHz: [34.3], rt60Seconds: 0.5, maxModeFrequencyHz: 200 };
    const onNode = modalResponse(room, { ...opts, receiver: [2.5, 1.3, 1.1] })[0]!;
    const offNode = modalResponse(room, { ...opts, receiver: [0.2, 1.3, 1.1] })[0]!;
    // At resonance the (1,0,0) term is |psi_s psi_r| / (Lambda 2 delta) = 1/(0.5 * 27.6) ~ 0.072 while the
    // (0,0,0) term is 1/omega ~ 0.0046 (by hand): without that term the level is far lower.
    expect(offNode - onNode).toBeGreaterThan(10);
    // On the node the level equals the sum with mode (1,0,0) removed (its term is exactly cos(pi/2) ~ 6e-17).
    const without = referenceLevelDb(L, [{ position: opts.source }], [2.5, 1.3, 1.1], 34.3, 0.5, 200, 343, (m) => m.nx === 1 && m.ny === 0 && m.nz === 0);
    expect(Math.abs(onNode - without)).toBeLessThan(1e-9);
  });

  it("excites every mode with source and receiver in corners: a peak within 0.3 Hz of each well separated mode below 100 Hz (all |psi| = 1 there, CONTRACTS.md)", () => {
    const modes = bruteForceModes(L, 100);
    const isolated = modes.filter((m) => modes.every((o) => o === m || Math.abs(o.f - m.f) > 3));
    expect(isolated.length).toBeGreaterThanOrEqual(4);
    for (const m of isolated) {
      const freqs = Array.from({ length: 61 }, (_, i) => m.f - 1.5 + i * 0.05);
      const lv = modalResponse(room, { source: [0, 0, 0], receiver: [5, 4, 3], frequenciesHz: freqs, rt60Seconds: 2, maxModeFrequencyHz: 200 });
      const iMax = lv.indexOf(Math.max(...lv));
      expect(Math.abs(freqs[iMax]! - m.f), `mode ${m.nx}${m.ny}${m.nz} at ${m.f}`).toBeLessThanOrEqual(0.3);
      expect(iMax).toBeGreaterThan(0);
      expect(iMax).toBeLessThan(freqs.length - 1);
    }
    // The room's centre is a node of every mode with an odd index: (1,0,0) is missing there.
    const centre = modalResponse(room, { source: [0, 0, 0], receiver: [2.5, 2, 1.5], frequenciesHz: [34.3], rt60Seconds: 2, maxModeFrequencyHz: 200 })[0]!;
    const corner = modalResponse(room, { source: [0, 0, 0], receiver: [5, 4, 3], frequenciesHz: [34.3], rt60Seconds: 2, maxModeFrequencyHz: 200 })[0]!;
    expect(corner - centre).toBeGreaterThan(10);
  });

  it("rises 6 dB per octave towards the lowest frequencies because of the (0,0,0) term (pressure-chamber region: that term is 1/omega, CONTRACTS.md)", () => {
    const opts = { source: [0.4, 0.7, 0.3] as [number, number, number], receiver: [3.3, 2.1, 1.2] as [number, number, number], rt60Seconds: 0.5, maxModeFrequencyHz: 100 };
    const [l1, l2, l4] = modalResponse(room, { ...opts, frequenciesHz: [1, 2, 4] });
    // 20 log10 2 = 6.02 dB per octave; the other modes add omega * sum(...)/omega_n^2, under 0.5 dB here.
    expect(l1! - l2!).toBeCloseTo(6.02, 0);
    expect(l2! - l4!).toBeCloseTo(6.02, 0);
    // Without the (0,0,0) term the same sum would fall towards low frequencies instead (reference, by hand).
    const skip0 = (m: { nx: number; ny: number; nz: number }) => m.nx + m.ny + m.nz === 0;
    const n1 = referenceLevelDb(L, [{ position: opts.source }], opts.receiver, 1, 0.5, 100, 343, skip0);
    const n2 = referenceLevelDb(L, [{ position: opts.source }], opts.receiver, 2, 0.5, 100, 343, skip0);
    expect(n2 - n1).toBeCloseTo(6.02, 0);
  });

  it("uses the contract's default speed of sound 343 m/s when none is given", () => {
    const base = { source: [1, 1, 1] as [number, number, number], receiver: [4, 3, 2] as [number, number, number], frequenciesHz: [40, 80], rt60Seconds: 0.4, maxModeFrequencyHz: 150 };
    expect(modalResponse(room, base)).toEqual(modalResponse(room, { ...base, speedOfSound: 343 }));
  });

  it("stays finite and matches the reference at the edges of the allowed ranges (1 Hz, 1000 Hz, RT60 10 s)", () => {
    const lv = modalResponse(room, { source: [2.5, 2, 1.5], receiver: [2.5, 2, 1.5], frequenciesHz: [1, 500, 1000], rt60Seconds: 10, maxModeFrequencyHz: 50 });
    lv.forEach((v) => expect(Number.isFinite(v)).toBe(true));
    [1, 500, 1000].forEach((f, i) => {
      expect(Math.abs(lv[i]! - referenceLevelDb(L, [{ position: [2.5, 2, 1.5] }], [2.5, 2, 1.5], f, 10, 50))).toBeLessThan(1e-9);
    });
  });
});
