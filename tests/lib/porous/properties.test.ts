import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { absorptionSpectrum, LIMITS, type Incidence, type Layer } from "@/lib/porous";

// Property tests over the whole valid input domain (bounds from lib/porous LIMITS, the same ones the
// zod schemas use). Passivity: a passive stack cannot return more energy than it receives, so
// |R| ≤ 1 and alpha ≤ 1 always (Allard & Atalla 2009, ch. 3 [from memory, high]).
const porous = fc.record({
  kind: fc.constant("porous" as const),
  thicknessM: fc.double({ min: LIMITS.thicknessM.min, max: LIMITS.thicknessM.max, noNaN: true }),
  flowResistivity: fc.double({ min: LIMITS.flowResistivity.min, max: LIMITS.flowResistivity.max, noNaN: true }),
  model: fc.constantFrom("delany-bazley" as const, "miki" as const),
});
const air = fc.record({
  kind: fc.constant("air" as const),
  thicknessM: fc.double({ min: LIMITS.thicknessM.min, max: LIMITS.thicknessM.max, noNaN: true }),
});
const sheet = fc.record({
  kind: fc.constant("resistive-sheet" as const),
  flowResistance: fc.double({ min: LIMITS.flowResistance.min, max: LIMITS.flowResistance.max, noNaN: true }),
});
// any sequence of layers whose last one is not a sheet
const stackOf = (model: "delany-bazley" | "miki"): fc.Arbitrary<Layer[]> =>
  fc
    .tuple(
      fc.array(fc.oneof(porous.map((l) => ({ ...l, model })), air, sheet), { maxLength: 4 }),
      fc.oneof(porous.map((l) => ({ ...l, model })), air),
    )
    .map(([front, last]) => [...front, last]);
const stack: fc.Arbitrary<Layer[]> = fc
  .tuple(fc.array(fc.oneof(porous, air, sheet), { maxLength: 4 }), fc.oneof(porous, air))
  .map(([front, last]) => [...front, last]);
const incidence: fc.Arbitrary<Incidence> = fc.oneof(
  fc.constantFrom("normal" as const, "random" as const, "field" as const),
  fc.record({ angleDeg: fc.double({ min: 0, max: LIMITS.angleDeg.max, noNaN: true }) }),
);
const freqs = fc.array(fc.double({ min: LIMITS.frequencyHz.min, max: LIMITS.frequencyHz.max, noNaN: true }), {
  minLength: 1,
  maxLength: 4,
});

describe("absorptionSpectrum — properties (fast-check)", () => {
  it("alpha ≤ 1 (within 1e-9) and every number finite, for every valid stack, frequency and incidence", () => {
    fc.assert(
      fc.property(stack, freqs, incidence, (layers, frequenciesHz, inc) => {
        for (const p of absorptionSpectrum(layers, { frequenciesHz, incidence: inc })) {
          if (!(p.alpha <= 1 + 1e-9)) return false;
          if (![p.alpha, p.impedance.re, p.impedance.im].every(Number.isFinite)) return false;
        }
        return true;
      }),
      { numRuns: 400 },
    );
  });

  // Miki (1990) built his model because Delany–Bazley gives a negative real part of the surface
  // impedance of rigid-backed layers at low f/σ. Inside DB's fitted range this shows up near its lower
  // edge (X ≲ 0.014): a scan of the whole domain found alpha down to −0.0035 there. So the strict
  // property holds for Miki stacks; stacks with a DB layer get a stated −0.005 floor, and the DB
  // defect itself is pinned down in the next block.
  it("alpha ≥ 0 (within 1e-9) wherever every porous layer is inside its fitted range — Miki stacks", () => {
    let checked = 0;
    fc.assert(
      fc.property(stackOf("miki"), freqs, incidence, (layers, frequenciesHz, inc) => {
        for (const p of absorptionSpectrum(layers, { frequenciesHz, incidence: inc })) {
          if (p.withinModelRange) {
            checked++;
            if (!(p.alpha >= -1e-9)) return false;
          }
        }
        return true;
      }),
      { numRuns: 400 },
    );
    expect(checked).toBeGreaterThan(50);
  });

  it("alpha ≥ −0.005 wherever every porous layer is inside its fitted range — any stack (DB low-X defect, Miki 1990)", () => {
    fc.assert(
      fc.property(stack, freqs, incidence, (layers, frequenciesHz, inc) =>
        absorptionSpectrum(layers, { frequenciesHz, incidence: inc }).every((p) => !p.withinModelRange || p.alpha >= -0.005),
      ),
      { numRuns: 400 },
    );
  });

  it("alpha ≥ 0 (within 1e-9) for DB stacks wherever every DB layer has X = rho0 f/sigma ≥ 0.015", () => {
    fc.assert(
      fc.property(stackOf("delany-bazley"), freqs, incidence, (layers, frequenciesHz, inc) =>
        absorptionSpectrum(layers, { frequenciesHz, incidence: inc }).every((p) => {
          const minX = Math.min(
            ...layers.map((l) => (l.kind === "porous" ? (1.204 * p.frequencyHz) / l.flowResistivity : Infinity)),
          );
          return !p.withinModelRange || minX < 0.015 || p.alpha >= -1e-9;
        }),
      ),
      { numRuns: 400 },
    );
  });

  it("surface impedance has a non-negative real part (passive stack) wherever every porous layer is in range — Miki stacks", () => {
    fc.assert(
      fc.property(stackOf("miki"), freqs, (layers, frequenciesHz) =>
        absorptionSpectrum(layers, { frequenciesHz, incidence: "normal" }).every(
          (p) => !p.withinModelRange || p.impedance.re >= -1e-9 * Math.hypot(p.impedance.re, p.impedance.im),
        ),
      ),
      { numRuns: 200 },
    );
  });
});

describe("absorptionSpectrum — the known Delany–Bazley low-X defect (Miki 1990)", () => {
  it("a 50 mm DB layer, sigma 1440.73, at 12.1 Hz (X = 0.0101, inside the fitted range) gives a small negative alpha and Re Z < 0; Miki does not", () => {
    const db = absorptionSpectrum([{ kind: "porous", thicknessM: 0.05, flowResistivity: 1440.73, model: "delany-bazley" }], {
      frequenciesHz: [12.1],
      incidence: "normal",
    })[0]!;
    expect(db.withinModelRange).toBe(true);
    expect(db.alpha).toBeLessThan(0);
    expect(db.alpha).toBeGreaterThan(-0.005);
    expect(db.impedance.re).toBeLessThan(0);
    const mk = absorptionSpectrum([{ kind: "porous", thicknessM: 0.05, flowResistivity: 1440.73, model: "miki" }], {
      frequenciesHz: [14.5],
      incidence: "normal",
    })[0]!;
    expect(mk.withinModelRange).toBe(true);
    expect(mk.alpha).toBeGreaterThan(0);
  });
});
