import { roomReflectionsRequestSchema } from "@/lib/reflections";
import { sizerRequestSchema } from "@/lib/sizer";
import type { EndpointDoc } from "./openapi";

/** Treatment design endpoints (app/api/v1/sizer, app/api/v1/reflections). */
export const DESIGN_ENDPOINTS: EndpointDoc[] = [
  {
    method: "post",
    path: "/sizer",
    summary: "Bass-trap sizing on top of a scenario: the builds, counts and places that bring 63–250 Hz to the target with the least depth, count or cost, with RT before/after, reasons and limits",
    tag: "Treatment",
    body: sizerRequestSchema,
    success: 200,
  },
  {
    method: "post",
    path: "/reflections",
    summary: "First reflection points from the room's main speakers to its seats (or a listening area), the zones that cover them, a suggested panel set and its placement checks",
    tag: "Treatment",
    body: roomReflectionsRequestSchema,
    success: 200,
  },
];
