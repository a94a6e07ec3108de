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

import * as modes from "@/app/api/v1/modes/route";
import * as modesResponse from "@/app/api/v1/modes/response/route";
import * as flatness from "@/app/api/v1/modes/flatness-map/route";
import { flatnessMap, modalResponse, roomModes } from "@/lib/modes";

const rect = { lengthM: 5.8, widthM: 4.1, heightM: 2.5 };

describe("POST /modes, /modes/response, /modes/flatness-map", () => {
  it("lists the modes roomModes lists, with the table when RT60 is given", async () => {
    const res = await callRoute(modes.POST, { body: { room: rect, maxFrequencyHz: 120, rt60Seconds: 0.4 } });
    expect(res.status).toBe(200);
    expect(res.json.modes).toEqual(roomModes(rect, { maxFrequencyHz: 120 }));
    expect(res.json.schroederFrequencyHz).toBeCloseTo(2000 * Math.sqrt(0.4 / (5.8 * 4.1 * 2.5)), 9);
    expect(res.json.table).toBeDefined();
  });

  it("answers the modal response modalResponse computes", async () => {
    const body = { room: rect, source: [0.3, 0.3, 0.3], receiver: [3.5, 2.05, 1.1], frequenciesHz: [30, 45, 60], rt60Seconds: 0.4, maxModeFrequencyHz: 300 };
    const res = await callRoute(modesResponse.POST, { body });
    expect(res.status).toBe(200);
    const { room, ...options } = body;
    expect(res.json.levelsDb).toEqual(modalResponse(room, options as Parameters<typeof modalResponse>[1]));
  });

  it("answers a receiver outside the room with 400 naming receiver.0", async () => {
    const res = await callRoute(modesResponse.POST, { body: { room: rect, source: [0.3, 0.3, 0.3], receiver: [9, 1, 1], frequenciesHz: [40], rt60Seconds: 0.4, maxModeFrequencyHz: 200 } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain("receiver.0");
  });

  it("returns the flatness map as numbers in the contract's index order", async () => {
    const body = { room: rect, source: [0.2, 0.2, 0.2], heightM: 1.1, gridX: 6, gridY: 4, frequenciesHz: [20, 30, 40, 50, 60, 80, 100], rt60Seconds: 0.4, maxModeFrequencyHz: 200 };
    const res = await callRoute(flatness.POST, { body });
    expect(res.status).toBe(200);
    const { room, ...options } = body;
    const direct = flatnessMap(room, options as Parameters<typeof flatnessMap>[1]);
    expect(res.json.stdDevDb).toEqual(Array.from(direct.stdDevDb));
    expect(res.json.stdDevDb).toHaveLength(24);
  });

  it("refuses a 1000 × 1000 grid with 400 on gridX", async () => {
    const res = await callRoute(flatness.POST, { body: { room: rect, source: [0.2, 0.2, 0.2], heightM: 1.1, gridX: 1000, gridY: 1000, frequenciesHz: [40], rt60Seconds: 0.4, maxModeFrequencyHz: 200 } });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.gridX).toBeDefined();
  });
});
