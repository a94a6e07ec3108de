// The computation endpoints answer what the engines compute, and bad input with 400 + field.
import { beforeAll, describe, expect, it } from "vitest";
import * as rating from "@/app/api/v1/absorbers/rating/route";
import * as spectrum from "@/app/api/v1/absorbers/spectrum/route";
import * as predict from "@/app/api/v1/reverb/predict/route";
import * as target from "@/app/api/v1/reverb/target/route";
import { absorptionSpectrum, rateAbsorber } from "@/lib/porous";
import { actAs, callRoute } from "../support/act-as";

const panel = [{ kind: "porous", thicknessM: 0.05, flowResistivity: 15000, model: "delany-bazley" }] as const;
const room = {
  volumeM3: 5.8 * 4.1 * 2.5,
  surfaces: [
    { areaM2: 2 * 5.8 * 2.5 + 2 * 4.1 * 2.5, finish: "painted-drywall-on-studs" },
    { areaM2: 5.8 * 4.1, finish: "carpet-on-pad" },
    { areaM2: 5.8 * 4.1, finish: "painted-drywall-on-studs" },
  ],
};

beforeAll(() => actAs("engineer"));

describe("POST /absorbers/spectrum", () => {
  it("returns exactly absorptionSpectrum's points", async () => {
    const res = await callRoute(spectrum.POST, { body: { layers: panel, frequenciesHz: [125, 500, 2000], incidence: "random" } });
    expect(res.status).toBe(200);
    expect(res.json.points).toEqual(JSON.parse(JSON.stringify(absorptionSpectrum([...panel], { frequenciesHz: [125, 500, 2000], incidence: "random" }))));
  });

  it("answers a negative thickness with 400 naming the field", async () => {
    const res = await callRoute(spectrum.POST, { body: { layers: [{ ...panel[0], thicknessM: -0.05 }], frequenciesHz: [500] } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain("layers.0.thicknessM");
  });

  it("answers a resistive sheet on the wall with 400", async () => {
    const res = await callRoute(spectrum.POST, { body: { layers: [{ kind: "resistive-sheet", flowResistance: 500 }], frequenciesHz: [500] } });
    expect(res.status).toBe(400);
  });

  it("refuses anonymous callers with 401", async () => {
    await actAs("anonymous");
    const res = await callRoute(spectrum.POST, { body: { layers: panel, frequenciesHz: [500] } });
    expect(res.status).toBe(401);
    await actAs("engineer");
  });
});

describe("POST /absorbers/rating", () => {
  it("rates a layer stack as rateAbsorber does", async () => {
    const res = await callRoute(rating.POST, { body: { layers: panel } });
    expect(res.status).toBe(200);
    expect(res.json.rating).toEqual(JSON.parse(JSON.stringify(rateAbsorber({ layers: [...panel] }))));
  });
  it("answers 14 one-third-octave values with 400", async () => {
    const res = await callRoute(rating.POST, { body: { thirdOctaveAlpha: new Array(14).fill(0.5) } });
    expect(res.status).toBe(400);
  });
});

describe("POST /reverb/predict and /reverb/target", () => {
  it("predicts a positive RT per octave band", async () => {
    const res = await callRoute(predict.POST, { body: room });
    expect(res.status).toBe(200);
    expect(res.json.prediction.bands.length).toBeGreaterThan(0);
  });
  it("compares with the listening-room target", async () => {
    const res = await callRoute(target.POST, { body: { ...room, target: { kind: "listening-room" } } });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    expect(res.json.comparison.length).toBe(res.json.prediction.bands.length);
  });
  it("answers a volume of zero with 400 on volumeM3", async () => {
    const res = await callRoute(predict.POST, { body: { ...room, volumeM3: 0 } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.volumeM3).toBeDefined();
  });
});
