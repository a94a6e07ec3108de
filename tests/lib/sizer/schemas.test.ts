import { describe, expect, it } from "vitest";
import { buildSheetJobSchema } from "@/lib/build-sheet";
import { reflectionsRequestSchema, roomReflectionsRequestSchema } from "@/lib/reflections";
import { sizerInputSchema, sizerRequestSchema } from "@/lib/sizer";

const ID = "3f1c2a9e-8b7d-4c6e-9a5b-1d2e3f4a5b6c";
const LIMITS = { maxDepthM: 0.5, verticalCorners: ["front-left"], ceilingEdges: [], wallAreaM2: 5 };

describe("sizer, reflections and build-sheet request schemas", () => {
  it("sizerRequestSchema: ids must be UUIDs, the aim defaults to the target, corners at most once", () => {
    expect(sizerRequestSchema.parse({ roomId: ID, scenarioId: ID, objective: "cost", limits: LIMITS }).aim).toBe("target");
    expect(sizerRequestSchema.safeParse({ roomId: "room-1", scenarioId: ID, objective: "cost", limits: LIMITS }).success).toBe(false);
    const twice = sizerRequestSchema.safeParse({ roomId: ID, scenarioId: ID, objective: "cost", limits: { ...LIMITS, verticalCorners: ["front-left", "front-left"] } });
    expect(twice.success).toBe(false);
    expect(twice.error!.issues[0]!.path).toEqual(["limits", "verticalCorners"]);
  });

  it("sizerInputSchema: surfaces that cannot close the room are refused with the field", () => {
    const r = sizerInputSchema.safeParse({ room: { lengthM: 5, widthM: 4, heightM: 2.5 }, surfaces: [{ areaM2: 10, finish: "carpet-on-pad" }], target: { kind: "listening-room" }, objective: "depth", limits: LIMITS });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["surfaces"]);
  });

  it("reflection requests: seats or a listening area are required; defaults for margin, panel and clearance", () => {
    const room = { lengthM: 6, widthM: 4, heightM: 2.5 };
    expect(reflectionsRequestSchema.safeParse({ room, speakers: [{ id: "L", position: [0.5, 1, 1.2] }] }).success).toBe(false);
    const ok = roomReflectionsRequestSchema.parse({ roomId: ID });
    expect(ok).toMatchObject({ marginM: 0.2, panel: { widthM: 1.2, heightM: 0.6 }, clearanceM: 0, items: [] });
  });

  it("buildSheetJobSchema: a membrane trap's fill may not exceed its cavity", () => {
    const r = buildSheetJobSchema.safeParse({
      items: [{ build: { kind: "membrane-trap", faceWidthM: 0.6, faceHeightM: 1.2, cavityDepthM: 0.1, fillThicknessM: 0.2, faceSheetThicknessM: 0.009, faceSheetDensityKgM3: 750, insulationDensityKgM3: 35 }, count: 1 }],
      lumber: { thicknessM: 0.019, widthM: 0.1 },
      stockBoards: [{ lengthM: 2.4 }],
      slab: { lengthM: 1.2, widthM: 0.6, thicknessM: 0.05 },
      fabric: {},
    });
    expect(r.success).toBe(false);
    expect(JSON.stringify(r.error!.issues)).toContain("fillThicknessM must not exceed cavityDepthM");
  });
});
