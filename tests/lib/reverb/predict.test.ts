import { describe, expect, it } from "vitest";
import {
  airAttenuationDbPerM,
  evaluateTarget,
  exactMidBandHz,
  finishAlpha,
  intensityAttenuationPerM,
  predictReverberation,
  reverberationTime,
  speedOfSound,
} from "@/lib/reverb";

const room = {
  volumeM3: 40,
  surfaces: [
    { areaM2: 50, finish: "painted-drywall-on-studs" },
    { areaM2: 16, finish: "carpet-on-pad" },
    { areaM2: 6, alpha: [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8] },
  ],
};

describe("predictReverberation", () => {
  it("equals reverberationTime on the resolved finishes, c(ϑ) and ISO 9613-1 air at exact mid-band frequencies (1e-12)", () => {
    const p = predictReverberation({ ...room, temperatureC: 25, relativeHumidityPct: 40, formula: "sabine" });
    const nominal = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
    const exact = nominal.map((f) => exactMidBandHz(f, 1));
    const t = reverberationTime({
      volumeM3: 40,
      surfaces: [
        { areaM2: 50, alpha: nominal.map((f) => finishAlpha("painted-drywall-on-studs", f).alpha) },
        { areaM2: 16, alpha: nominal.map((f) => finishAlpha("carpet-on-pad", f).alpha) },
        room.surfaces[2] as { areaM2: number; alpha: number[] },
      ],
      bandsHz: exact,
      formula: "sabine",
      speedOfSound: speedOfSound(25),
      airAttenuation: exact.map((f) => intensityAttenuationPerM(airAttenuationDbPerM(f, { temperatureC: 25, relativeHumidityPct: 40 }))),
    });
    p.bands.forEach((b, i) => expect(b.timeS).toBeCloseTo(t[i]!, 12));
    expect(p.speedOfSound).toBeCloseTo(speedOfSound(25), 12);
  });
  it("defaults to Eyring, 20 °C, 50 % RH, octave bands, and notes the held end bands of the finish table", () => {
    const p = predictReverberation(room);
    expect(p.formula).toBe("eyring");
    expect(p.bands.map((b) => b.nominalHz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000]);
    expect(p.notes.join(" ")).toMatch(/63 Hz/);
  });
  it("third-octave bands give 24 bands 50…10 000 Hz when the surfaces are finishes", () => {
    const p = predictReverberation({ volumeM3: 40, surfaces: room.surfaces.slice(0, 2), bands: "third-octave" });
    expect(p.bands).toHaveLength(24);
  });
  it("treatment lowers T where the panels absorb; extra area is added as given", () => {
    const base = predictReverberation(room);
    const extra = predictReverberation({ ...room, treatment: { extraAbsorptionM2: [0, 0, 0, 5, 5, 0, 0, 0] } });
    expect(extra.bands[3]!.timeS).toBeLessThan(base.bands[3]!.timeS);
    expect(extra.bands[0]!.timeS).toBe(base.bands[0]!.timeS);
    expect(extra.bands[3]!.treatmentM2).toBe(5);
  });
  it("an unknown finish is a RangeError naming 'finish'", () => {
    expect(() => predictReverberation({ volumeM3: 40, surfaces: [{ areaM2: 10, finish: "gold-leaf" }] })).toThrow(/finish/);
  });
});

describe("evaluateTarget", () => {
  it("adding the reported area brings every band to the target (round trip, 1e-6 s)", () => {
    const r = evaluateTarget(room, { kind: "small-room" });
    const again = predictReverberation({ ...room, treatment: { extraAbsorptionM2: r.required.map((b) => b.addM2) } });
    again.bands.forEach((b, i) => {
      if (r.required[i]!.addM2 > 0) expect(b.timeS).toBeCloseTo(r.comparison[i]!.targetS, 6);
    });
    expect(r.comparison.every((c) => ["within", "near", "outside"].includes(c.verdict))).toBe(true);
  });
});
