import { describe, expect, it } from "vitest";
import * as math from "mathjs";
import { absorptionSpectrum, type Layer } from "@/lib/porous";

// Cross-check set from ../shared/REFERENCES.md [calc]: rho0 = 1.213, c0 = 342.2, sigma = 10 000, 50 mm,
// Delany–Bazley X form, rigid backing.
const REF_AIR = { densityKgM3: 1.213, speedOfSound: 342.2 };
const REF_LAYER: Layer[] = [{ kind: "porous", thicknessM: 0.05, flowResistivity: 10_000, model: "delany-bazley" }];

/** Direct complex evaluation of the CONTRACTS.md formulas with mathjs (independent of lib/porous). */
function directSurfaceImpedance(
  layers: Layer[],
  f: number,
  thetaRad: number,
  air = { densityKgM3: 1.204, speedOfSound: 343 },
): math.Complex {
  const rho0 = air.densityKgM3;
  const c = air.speedOfSound;
  const omega = 2 * Math.PI * f;
  const k0 = omega / c;
  const kx = k0 * Math.sin(thetaRad);
  let zb: math.Complex | null = null; // null = rigid wall
  for (let i = layers.length - 1; i >= 0; i--) {
    const layer = layers[i]!;
    if (layer.kind === "resistive-sheet") {
      zb = math.add(zb as math.Complex, math.complex(layer.flowResistance, 0)) as math.Complex;
      continue;
    }
    let zc: math.Complex;
    let kc: math.Complex;
    if (layer.kind === "air") {
      zc = math.complex(rho0 * c, 0);
      kc = math.complex(k0, 0);
    } else if (layer.model === "delany-bazley") {
      const X = (rho0 * f) / layer.flowResistivity;
      zc = math.complex(rho0 * c * (1 + 0.0571 * X ** -0.754), -rho0 * c * 0.087 * X ** -0.732);
      kc = math.complex(k0 * (1 + 0.0978 * X ** -0.7), -k0 * 0.189 * X ** -0.595);
    } else {
      const Y = f / layer.flowResistivity;
      zc = math.complex(rho0 * c * (1 + 0.0699 * Y ** -0.632), -rho0 * c * 0.107 * Y ** -0.632);
      kc = math.complex(k0 * (1 + 0.109 * Y ** -0.618), -k0 * 0.16 * Y ** -0.618);
    }
    const kz = math.sqrt(math.subtract(math.multiply(kc, kc), kx * kx) as math.Complex) as math.Complex;
    const zn = math.divide(math.multiply(zc, kc), kz) as math.Complex;
    const cot = math.cot(math.multiply(kz, layer.thicknessM) as math.Complex) as math.Complex;
    const mj = math.complex(0, -1);
    if (zb === null) {
      zb = math.multiply(math.multiply(mj, zn), cot) as math.Complex;
    } else {
      const num = math.add(math.multiply(math.multiply(mj, zb), cot), zn);
      const den = math.add(zb, math.multiply(math.multiply(mj, zn), cot));
      zb = math.multiply(zn, math.divide(num, den)) as math.Complex;
    }
  }
  return zb as math.Complex;
}

function directAlpha(z: math.Complex, thetaRad: number, rho0c: number): number {
  const zc = math.multiply(z, Math.cos(thetaRad)) as math.Complex;
  const r = math.divide(math.subtract(zc, rho0c), math.add(zc, rho0c)) as math.Complex;
  const mag = math.abs(r) as unknown as number;
  return 1 - mag * mag;
}

describe("absorptionSpectrum — REFERENCES.md [calc] cross-check values", () => {
  it("normal incidence, 50 mm, sigma 10 000, DB: alpha(250, 500, 1000, 2000) = 0.1732, 0.4974, 0.8859, 0.9859 (±0.00051)", () => {
    const out = absorptionSpectrum(REF_LAYER, { frequenciesHz: [250, 500, 1000, 2000], incidence: "normal", air: REF_AIR });
    const expected = [0.1732, 0.4974, 0.8859, 0.9859];
    out.forEach((p, i) => expect(Math.abs(p.alpha - expected[i]!)).toBeLessThan(0.00051));
  });

  it("normal incidence, zs/rho0c0 at 500 Hz = 0.6088 − 1.5190j (±0.00051), e^{+jωt} sign", () => {
    const [p] = absorptionSpectrum(REF_LAYER, { frequenciesHz: [500], incidence: "normal", air: REF_AIR });
    const rho0c = REF_AIR.densityKgM3 * REF_AIR.speedOfSound;
    expect(Math.abs(p!.impedance.re / rho0c - 0.6088)).toBeLessThan(0.00051);
    expect(Math.abs(p!.impedance.im / rho0c - -1.519)).toBeLessThan(0.00051);
  });

  it("random incidence (Paris), same layer: alpha(125…4000) = 0.090, 0.301, 0.599, 0.834, 0.925, 0.953 (±0.0051)", () => {
    const f = [125, 250, 500, 1000, 2000, 4000];
    const out = absorptionSpectrum(REF_LAYER, { frequenciesHz: f, incidence: "random", air: REF_AIR });
    const expected = [0.09, 0.301, 0.599, 0.834, 0.925, 0.953];
    out.forEach((p, i) => expect(Math.abs(p.alpha - expected[i]!)).toBeLessThan(0.0051));
  });
});

describe("absorptionSpectrum — agreement with a direct complex evaluation (mathjs, CONTRACTS.md formulas)", () => {
  const stacks: { name: string; layers: Layer[] }[] = [
    { name: "single DB layer", layers: REF_LAYER },
    {
      name: "sheet + Miki layer + air gap",
      layers: [
        { kind: "resistive-sheet", flowResistance: 300 },
        { kind: "porous", thicknessM: 0.1, flowResistivity: 8000, model: "miki" },
        { kind: "air", thicknessM: 0.1 },
      ],
    },
    {
      name: "three porous layers",
      layers: [
        { kind: "porous", thicknessM: 0.03, flowResistivity: 40_000, model: "delany-bazley" },
        { kind: "porous", thicknessM: 0.05, flowResistivity: 12_000, model: "miki" },
        { kind: "porous", thicknessM: 0.02, flowResistivity: 5000, model: "delany-bazley" },
      ],
    },
  ];
  for (const { name, layers } of stacks) {
    it(`normal incidence matches to 1e-9 relative (${name})`, () => {
      const f = [31.5, 100, 315, 1000, 3150, 10_000];
      const out = absorptionSpectrum(layers, { frequenciesHz: f, incidence: "normal" });
      out.forEach((p, i) => {
        const z = directSurfaceImpedance(layers, f[i]!, 0);
        const scale = Math.hypot(z.re, z.im);
        expect(Math.abs(p.impedance.re - z.re) / scale).toBeLessThan(1e-9);
        expect(Math.abs(p.impedance.im - z.im) / scale).toBeLessThan(1e-9);
        expect(Math.abs(p.alpha - directAlpha(z, 0, 1.204 * 343))).toBeLessThan(1e-9);
      });
    });
    it(`oblique incidence at 30° and 60° matches to 1e-9 (${name})`, () => {
      for (const deg of [30, 60]) {
        const th = (deg * Math.PI) / 180;
        const out = absorptionSpectrum(layers, { frequenciesHz: [200, 2000], incidence: { angleDeg: deg } });
        out.forEach((p) => {
          const z = directSurfaceImpedance(layers, p.frequencyHz, th);
          const scale = Math.hypot(z.re, z.im);
          expect(Math.abs(p.impedance.re - z.re) / scale).toBeLessThan(1e-9);
          expect(Math.abs(p.impedance.im - z.im) / scale).toBeLessThan(1e-9);
          expect(Math.abs(p.alpha - directAlpha(z, th, 1.204 * 343))).toBeLessThan(1e-9);
        });
      }
    });
  }
  it("random incidence equals a 2000-panel midpoint Paris sum over direct evaluations (±1e-4)", () => {
    const layers = stacks[1]!.layers;
    for (const f of [125, 1000]) {
      const n = 2000;
      let sum = 0;
      for (let i = 0; i < n; i++) {
        const th = ((i + 0.5) / n) * (Math.PI / 2);
        sum += directAlpha(directSurfaceImpedance(layers, f, th), th, 1.204 * 343) * Math.sin(2 * th) * (Math.PI / 2 / n);
      }
      const [p] = absorptionSpectrum(layers, { frequenciesHz: [f], incidence: "random" });
      expect(Math.abs(p!.alpha - sum)).toBeLessThan(1e-4);
    }
  });
  it("field incidence equals the 0–78° weighted mean of direct evaluations (±1e-4)", () => {
    const layers = REF_LAYER;
    const f = 500;
    const n = 2000;
    const top = (78 * Math.PI) / 180;
    let num = 0;
    let den = 0;
    for (let i = 0; i < n; i++) {
      const th = ((i + 0.5) / n) * top;
      const w = Math.sin(2 * th);
      num += directAlpha(directSurfaceImpedance(layers, f, th), th, 1.204 * 343) * w;
      den += w;
    }
    const [p] = absorptionSpectrum(layers, { frequenciesHz: [f], incidence: "field" });
    expect(Math.abs(p!.alpha - num / den)).toBeLessThan(1e-4);
  });
});

describe("absorptionSpectrum — physical behaviour", () => {
  it("rigid-backed layer: alpha → 0 as f → 0 (Allard & Atalla 2009, ch. 3: rigid backing, Z → ∞) — below 0.01 at 10 Hz", () => {
    const out = absorptionSpectrum(
      [{ kind: "porous", thicknessM: 0.025, flowResistivity: 20_000, model: "miki" }],
      { frequenciesHz: [10, 20, 40, 80], incidence: "normal" },
    );
    expect(out[0]!.alpha).toBeLessThan(0.01);
    for (let i = 1; i < out.length; i++) expect(out[i]!.alpha).toBeGreaterThan(out[i - 1]!.alpha);
  });

  it("first absorption maximum of a thin, light layer lies near the quarter-wave frequency c/(4d) (within ±25 %; Allard & Atalla 2009, ch. 3)", () => {
    // 100 mm, sigma 3000: c/(4d) ≈ 858 Hz. The porous wave speed is a little lower than c, so the
    // peak sits slightly below c/(4d); 25 % is the tolerance we accept for that shift.
    const d = 0.1;
    const f: number[] = [];
    for (let x = 200; x <= 3000; x += 5) f.push(x);
    const out = absorptionSpectrum([{ kind: "porous", thicknessM: d, flowResistivity: 3000, model: "delany-bazley" }], {
      frequenciesHz: f,
      incidence: "normal",
    });
    let peak = -1;
    for (let i = 1; i < out.length - 1; i++) {
      if (out[i]!.alpha > out[i - 1]!.alpha && out[i]!.alpha >= out[i + 1]!.alpha) {
        peak = out[i]!.frequencyHz;
        break;
      }
    }
    const quarter = 343 / (4 * d);
    expect(peak).toBeGreaterThan(0.75 * quarter);
    expect(peak).toBeLessThan(1.25 * quarter);
  });

  it("adding an air gap behind the layer raises alpha at low frequency (Everest & Pohlmann, Master Handbook of Acoustics: spacing porous absorbers off the wall)", () => {
    const base: Layer[] = [{ kind: "porous", thicknessM: 0.05, flowResistivity: 15_000, model: "delany-bazley" }];
    const gap: Layer[] = [...base, { kind: "air", thicknessM: 0.1 }];
    const f = [125, 250];
    const a = absorptionSpectrum(base, { frequenciesHz: f, incidence: "random" });
    const b = absorptionSpectrum(gap, { frequenciesHz: f, incidence: "random" });
    for (let i = 0; i < f.length; i++) expect(b[i]!.alpha).toBeGreaterThan(a[i]!.alpha + 0.1);
  });

  it("rule of practice: 50 mm mineral wool, sigma 10–30 kPa·s/m², rigid backing, random incidence: alpha(125) ≤ 0.2, alpha(500) ≥ 0.55, alpha(1k) ≥ 0.8 (common practice)", () => {
    const rows: string[] = [];
    for (const sigma of [10_000, 15_000, 20_000, 30_000]) {
      const out = absorptionSpectrum(
        [{ kind: "porous", thicknessM: 0.05, flowResistivity: sigma, model: "delany-bazley" }],
        { frequenciesHz: [125, 500, 1000], incidence: "random" },
      );
      rows.push(`sigma ${sigma}: ${out.map((p) => `${p.frequencyHz} Hz ${p.alpha.toFixed(3)}`).join(", ")}`);
      expect(out[0]!.alpha).toBeLessThanOrEqual(0.2);
      expect(out[1]!.alpha).toBeGreaterThanOrEqual(0.55);
      expect(out[2]!.alpha).toBeGreaterThanOrEqual(0.8);
    }
    console.info(`50 mm rule of practice (random incidence):\n  ${rows.join("\n  ")}`);
  });

  it("a zero-resistance sheet changes nothing; a resistive sheet adds exactly R to the real part at normal incidence (CONTRACTS.md: Z = R + Zb)", () => {
    const core: Layer[] = [{ kind: "porous", thicknessM: 0.05, flowResistivity: 10_000, model: "delany-bazley" }];
    const a = absorptionSpectrum(core, { frequenciesHz: [500], incidence: "normal" })[0]!;
    const b = absorptionSpectrum([{ kind: "resistive-sheet", flowResistance: 0 }, ...core], { frequenciesHz: [500], incidence: "normal" })[0]!;
    const c = absorptionSpectrum([{ kind: "resistive-sheet", flowResistance: 250 }, ...core], { frequenciesHz: [500], incidence: "normal" })[0]!;
    expect(b.alpha).toBe(a.alpha);
    expect(c.impedance.re - a.impedance.re).toBeCloseTo(250, 9);
    expect(c.impedance.im).toBeCloseTo(a.impedance.im, 9);
  });

  it("an air layer on its own is lossless: alpha = 0 at normal incidence (within 1e-12)", () => {
    const out = absorptionSpectrum([{ kind: "air", thicknessM: 0.2 }], { frequenciesHz: [100, 777, 5000], incidence: "normal" });
    for (const p of out) expect(Math.abs(p.alpha)).toBeLessThan(1e-12);
  });

  it("a thick, lossy layer does not overflow (overflow-safe cot): 1 m at 20 kHz, sigma 500 000 gives a finite result", () => {
    const out = absorptionSpectrum([{ kind: "porous", thicknessM: 1, flowResistivity: 500_000, model: "delany-bazley" }], {
      frequenciesHz: [20_000, 10],
      incidence: "random",
    });
    for (const p of out) {
      expect(Number.isFinite(p.alpha)).toBe(true);
      expect(Number.isFinite(p.impedance.re)).toBe(true);
      expect(Number.isFinite(p.impedance.im)).toBe(true);
    }
  });

  it("random/field results report the 0° impedance; { angleDeg: 0 } equals 'normal' exactly", () => {
    const f = [250, 1000];
    const n = absorptionSpectrum(REF_LAYER, { frequenciesHz: f, incidence: "normal" });
    const r = absorptionSpectrum(REF_LAYER, { frequenciesHz: f, incidence: "random" });
    const fi = absorptionSpectrum(REF_LAYER, { frequenciesHz: f, incidence: "field" });
    const z = absorptionSpectrum(REF_LAYER, { frequenciesHz: f, incidence: { angleDeg: 0 } });
    for (let i = 0; i < f.length; i++) {
      expect(r[i]!.impedance).toEqual(n[i]!.impedance);
      expect(fi[i]!.impedance).toEqual(n[i]!.impedance);
      expect(z[i]).toEqual(n[i]);
    }
  });

  it("withinModelRange: false where rho0 f / sigma leaves 0.01…1.0 (Delany & Bazley 1970 fitted range), per frequency", () => {
    // sigma = 10 000, rho0 = 1.204: X = 0.01 at f ≈ 83 Hz and X = 1 at f ≈ 8306 Hz
    const out = absorptionSpectrum(REF_LAYER, { frequenciesHz: [50, 100, 8000, 9000], incidence: "normal" });
    expect(out.map((p) => p.withinModelRange)).toEqual([false, true, true, false]);
  });

  it("withinModelRange for Miki uses f/sigma in 0.01…1.0 (Miki 1990, range as published)", () => {
    const out = absorptionSpectrum([{ kind: "porous", thicknessM: 0.05, flowResistivity: 10_000, model: "miki" }], {
      frequenciesHz: [99, 101, 9999, 10_001],
      incidence: "normal",
    });
    expect(out.map((p) => p.withinModelRange)).toEqual([false, true, true, false]);
  });

  it("the density in X = rho0 f / sigma is the one passed in options.air (CONTRACTS.md)", () => {
    const a = absorptionSpectrum(REF_LAYER, { frequenciesHz: [90], incidence: "normal", air: { densityKgM3: 1.2, speedOfSound: 343 } });
    const b = absorptionSpectrum(REF_LAYER, { frequenciesHz: [90], incidence: "normal", air: { densityKgM3: 1.0, speedOfSound: 343 } });
    expect(a[0]!.withinModelRange).toBe(true); // X = 0.0108
    expect(b[0]!.withinModelRange).toBe(false); // X = 0.009
  });

  it("returns one point per frequency in the given order, and an empty array for no frequencies", () => {
    const out = absorptionSpectrum(REF_LAYER, { frequenciesHz: [1000, 125, 500], incidence: "random" });
    expect(out.map((p) => p.frequencyHz)).toEqual([1000, 125, 500]);
    expect(absorptionSpectrum(REF_LAYER, { frequenciesHz: [], incidence: "random" })).toEqual([]);
  });
});

describe("absorptionSpectrum — bad input", () => {
  const ok = { frequenciesHz: [500], incidence: "normal" as const };
  it("a resistive sheet directly on the rigid wall is a RangeError naming the layer", () => {
    expect(() => absorptionSpectrum([{ kind: "resistive-sheet", flowResistance: 100 }], ok)).toThrow(RangeError);
    expect(() =>
      absorptionSpectrum([...REF_LAYER, { kind: "resistive-sheet", flowResistance: 100 }], ok),
    ).toThrow(/layers\[1\]/);
  });
  it("an empty stack is a RangeError", () => {
    expect(() => absorptionSpectrum([], ok)).toThrow(RangeError);
  });
  it("out-of-range thickness, resistivity, frequency, angle and air are RangeErrors naming the field", () => {
    const bad = (layers: Layer[], o: Parameters<typeof absorptionSpectrum>[1], field: RegExp) =>
      expect(() => absorptionSpectrum(layers, o)).toThrow(field);
    bad([{ kind: "porous", thicknessM: 0, flowResistivity: 10_000, model: "miki" }], ok, /layers\[0\]\.thicknessM/);
    bad([{ kind: "porous", thicknessM: 0.05, flowResistivity: 50, model: "miki" }], ok, /layers\[0\]\.flowResistivity/);
    bad([{ kind: "air", thicknessM: Number.NaN }, ...REF_LAYER], ok, /layers\[0\]\.thicknessM/);
    bad(REF_LAYER, { frequenciesHz: [500, 0], incidence: "normal" }, /frequenciesHz\[1\]/);
    bad(REF_LAYER, { frequenciesHz: [500], incidence: { angleDeg: 90 } }, /incidence\.angleDeg/);
    bad(REF_LAYER, { frequenciesHz: [500], incidence: "normal", air: { densityKgM3: -1, speedOfSound: 343 } }, /air\.densityKgM3/);
    expect(() => absorptionSpectrum([{ kind: "porous", thicknessM: 0, flowResistivity: 10_000, model: "miki" }], ok)).toThrow(RangeError);
  });
  it("unknown kinds, models and incidences are TypeErrors", () => {
    expect(() => absorptionSpectrum([{ kind: "foam" } as unknown as Layer], ok)).toThrow(TypeError);
    expect(() =>
      absorptionSpectrum([{ kind: "porous", thicknessM: 0.05, flowResistivity: 1e4, model: "other" } as unknown as Layer], ok),
    ).toThrow(TypeError);
    expect(() => absorptionSpectrum(REF_LAYER, { frequenciesHz: [500], incidence: "diffuse" as unknown as "normal" })).toThrow(TypeError);
  });
});
