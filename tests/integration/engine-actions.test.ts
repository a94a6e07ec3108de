// The engine server actions answer what the engines compute and refuse bad input with field messages.
import { beforeAll, describe, expect, it } from "vitest";
import { absorberRatingAction, absorptionSpectrumAction, flatnessMapAction, modalResponseAction, reverbPredictAction, reverbTargetAction, roomModesAction } from "@/app/(app)/rooms/[roomId]/engine-actions";
import { absorptionSpectrum } from "@/lib/porous";
import { roomModes } from "@/lib/modes";
import { actAs, runAction } from "../support/act-as";

const rect = { lengthM: 5.8, widthM: 4.1, heightM: 2.5 };
const panel = [{ kind: "porous" as const, thicknessM: 0.1, flowResistivity: 10000, model: "miki" as const }];
const room = { volumeM3: 59.45, surfaces: [{ areaM2: 49.5, finish: "painted-drywall-on-studs" }, { areaM2: 23.78, finish: "carpet-on-pad" }, { areaM2: 23.78, finish: "painted-drywall-on-studs" }] };

beforeAll(() => actAs("builder"));

describe("engine server actions", () => {
  it("roomModesAction equals roomModes", async () => {
    const r = await roomModesAction({ room: rect, maxFrequencyHz: 100 });
    expect(r).toEqual({ ok: true, data: { modes: roomModes(rect, { maxFrequencyHz: 100 }) } });
  });
  it("absorptionSpectrumAction equals absorptionSpectrum", async () => {
    const r = await absorptionSpectrumAction({ layers: panel, frequenciesHz: [125, 250], incidence: "normal" });
    expect(r).toEqual({ ok: true, data: { points: absorptionSpectrum(panel, { frequenciesHz: [125, 250], incidence: "normal" }) } });
  });
  it("answers bad input with fields, never throwing", async () => {
    const r = await modalResponseAction({ room: rect, source: [0, 0, 0], receiver: [1, 1, 9], frequenciesHz: [40], rt60Seconds: 0.4, maxModeFrequencyHz: 200 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.fields ?? {})).toContain("receiver.2");
    const f = await flatnessMapAction({ room: rect, source: [0, 0, 0], heightM: 1, gridX: 0, gridY: 4, frequenciesHz: [40], rt60Seconds: 0.4, maxModeFrequencyHz: 200 });
    expect(f.ok).toBe(false);
  });
  it("rates, predicts and compares with a target", async () => {
    expect((await absorberRatingAction({ layers: panel })).ok).toBe(true);
    expect((await reverbPredictAction(room)).ok).toBe(true);
    const t = await reverbTargetAction({ ...room, target: { kind: "small-room", lowerS: 0.2, upperS: 0.4 } });
    expect(t.ok).toBe(true);
  });
  it("sends anonymous callers to sign in", async () => {
    await actAs("anonymous");
    expect(await runAction(() => roomModesAction({ room: rect, maxFrequencyHz: 100 }))).toEqual({ redirect: "/sign-in" });
    await actAs("builder");
  });
});
