import { describe, expect, it } from "vitest";
import { z } from "zod";
import {
  flatnessMapRequestSchema, modalResponseRequestSchema, modesRequestSchema, multiSourceResponseRequestSchema, rectRoomSchema,
  flatnessMap, modalResponse, roomModes,
} from "../../../lib/modes/index";

const room = { lengthM: 5, widthM: 4, heightM: 3 };

describe("rectRoomSchema", () => {
  it("accepts a valid room and rejects non-positive, non-finite and > 100 m dimensions with the field's path", () => {
    expect(rectRoomSchema.parse(room)).toEqual(room);
    for (const bad of [0, -1, 100.5, Number.NaN, Number.POSITIVE_INFINITY]) {
      const r = rectRoomSchema.safeParse({ ...room, widthM: bad });
      expect(r.success).toBe(false);
      expect(r.error!.issues[0]!.path).toEqual(["widthM"]);
    }
  });
});

describe("modesRequestSchema", () => {
  it("parses a JSON body { room, maxFrequencyHz, speedOfSound? } and applies the default 343 m/s", () => {
    const body = modesRequestSchema.parse({ room, maxFrequencyHz: 100 });
    expect(body.speedOfSound).toBe(343);
    expect(roomModes(body.room, body)).toHaveLength(13); // REFERENCES.md: 13 modes up to 100 Hz
  });
  it("rejects a frequency above 1000 Hz", () => {
    const r = modesRequestSchema.safeParse({ room, maxFrequencyHz: 1001 });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["maxFrequencyHz"]);
  });
});

describe("modalResponseRequestSchema", () => {
  const body = { room, source: [1, 1, 1], receiver: [4, 3, 2], frequenciesHz: [40, 80], rt60Seconds: 0.5, maxModeFrequencyHz: 150 };
  it("parses a valid body whose fields feed modalResponse unchanged", () => {
    const p = modalResponseRequestSchema.parse(body);
    expect(modalResponse(p.room, p)).toEqual(modalResponse(room, { ...body, source: [1, 1, 1], receiver: [4, 3, 2] }));
  });
  it("rejects a receiver outside the room with the path receiver.1", () => {
    const r = modalResponseRequestSchema.safeParse({ ...body, receiver: [4, 4.5, 2] });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path)).toContainEqual(["receiver", 1]);
  });
  it("rejects RT60 outside 0.05..10 s, frequencies outside 1..1000 Hz and more than 2000 frequencies", () => {
    expect(modalResponseRequestSchema.safeParse({ ...body, rt60Seconds: 0.04 }).success).toBe(false);
    expect(modalResponseRequestSchema.safeParse({ ...body, frequenciesHz: [0.9] }).success).toBe(false);
    expect(modalResponseRequestSchema.safeParse({ ...body, frequenciesHz: new Array(2001).fill(50) }).success).toBe(false);
    expect(modalResponseRequestSchema.safeParse({ ...body, maxModeFrequencyHz: undefined }).success).toBe(false);
  });
});

describe("flatnessMapRequestSchema", () => {
  const body = { room, source: [1, 1, 1], heightM: 1.2, gridX: 4, gridY: 3, frequenciesHz: [40, 80], rt60Seconds: 0.5, maxModeFrequencyHz: 150 };
  it("parses a valid body and bounds the grid to 400 x 400", () => {
    const p = flatnessMapRequestSchema.parse(body);
    expect(flatnessMap(p.room, p).stdDevDb).toHaveLength(12);
    const r = flatnessMapRequestSchema.safeParse({ ...body, gridY: 401 });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["gridY"]);
  });
  it("rejects a listening height above the ceiling with the path heightM", () => {
    const r = flatnessMapRequestSchema.safeParse({ ...body, heightM: 3.2 });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path)).toContainEqual(["heightM"]);
  });
});

describe("multiSourceResponseRequestSchema", () => {
  it("checks every source and receiver position against the room", () => {
    const body = { room, sources: [{ position: [0, 0, 0] }, { position: [5, 4, 3.5], delayMs: 2, polarity: -1 }], receivers: [[1, 1, 1]], frequenciesHz: [40], rt60Seconds: 0.5, maxModeFrequencyHz: 150 };
    const r = multiSourceResponseRequestSchema.safeParse(body);
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path)).toContainEqual(["sources", 1, "position", 2]);
  });
});

describe("z.toJSONSchema(request schemas) for the OpenAPI document", () => {
  it("produces JSON Schema with descriptions on the fields", () => {
    for (const s of [modesRequestSchema, modalResponseRequestSchema, flatnessMapRequestSchema, multiSourceResponseRequestSchema]) {
      const j = z.toJSONSchema(s, { io: "input" }) as { type: string; properties: Record<string, { description?: string }>; description?: string };
      expect(j.type).toBe("object");
      expect(j.description).toBeTruthy();
      expect(j.properties.room!.description ?? "").not.toBe("");
    }
  });
});
