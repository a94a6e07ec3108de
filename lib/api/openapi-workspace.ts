import {
  buildInputSchema,
  buildUpdateSchema,
  positionInputSchema,
  positionUpdateSchema,
  scenarioDuplicateSchema,
  scenarioInputSchema,
  scenarioUpdateSchema,
  surfacesInputSchema,
  treatmentItemInputSchema,
  treatmentItemUpdateSchema,
} from "@/lib/schemas/workspace";
import type { EndpointDoc } from "./openapi";

const roomVersion = [{ name: "version", description: "The room's version you read (409 when stale)", required: true }];
const scenarioVersion = [{ name: "version", description: "The scenario's version you read (409 when stale)", required: true }];

/**
 * The room workspace's endpoints (issue 5). Writes to surfaces and positions carry the room's
 * version; writes to a scenario or its items carry the scenario's version. Every write recomputes
 * the stored analysis in the same transaction. Reads: owner, engineer, builder; writes: owner,
 * engineer; clients get 403 (their project) or 404 (another project).
 */
export const WORKSPACE_ENDPOINTS: EndpointDoc[] = [
  { method: "get", path: "/rooms/{roomId}/workspace", summary: "Room, six surfaces, seats, sources and scenario summaries in one call", tag: "Workspace", success: 200 },
  { method: "get", path: "/rooms/{roomId}/surfaces", summary: "The room's six surfaces with finishes and openings", tag: "Workspace", success: 200 },
  { method: "put", path: "/rooms/{roomId}/surfaces", summary: "Save all six surfaces at once (room version); recomputes every scenario", tag: "Workspace", body: surfacesInputSchema, success: 200 },
  { method: "get", path: "/rooms/{roomId}/positions", summary: "Seats and sources of the room", tag: "Workspace", success: 200 },
  { method: "post", path: "/rooms/{roomId}/positions", summary: "Add a seat or a source inside the room (room version)", tag: "Workspace", body: positionInputSchema, success: 201, conflict: true },
  { method: "patch", path: "/rooms/{roomId}/positions/{positionId}", summary: "Move, rename or change a position (room version); a drag sends x, y, z only", tag: "Workspace", body: positionUpdateSchema, success: 200 },
  { method: "delete", path: "/rooms/{roomId}/positions/{positionId}", summary: "Delete a position (room version as ?version=)", tag: "Workspace", success: 200, query: roomVersion, conflict: true },
  { method: "get", path: "/rooms/{roomId}/scenarios", summary: "Scenario summaries, baseline first (?archived=false leaves archived out)", tag: "Scenarios", success: 200, query: [{ name: "archived", description: "false: leave archived scenarios out" }] },
  { method: "post", path: "/rooms/{roomId}/scenarios", summary: "Create a scenario, empty or as a copy of another (copyFromScenarioId)", tag: "Scenarios", body: scenarioInputSchema, success: 201 },
  { method: "get", path: "/rooms/{roomId}/analysis", summary: "Full results of several scenarios for a comparison (?scenarioIds=a,b; default every one not archived)", tag: "Scenarios", success: 200, query: [{ name: "scenarioIds", description: "Comma-separated scenario ids of this room" }] },
  { method: "get", path: "/scenarios/{scenarioId}", summary: "One scenario with its items and stored analysis (recomputed first when stale)", tag: "Scenarios", success: 200 },
  { method: "patch", path: "/scenarios/{scenarioId}", summary: "Rename, notes, target, archive/unarchive (scenario version)", tag: "Scenarios", body: scenarioUpdateSchema, success: 200 },
  { method: "post", path: "/scenarios/{scenarioId}/duplicate", summary: "Duplicate a scenario with its items", tag: "Scenarios", body: scenarioDuplicateSchema, success: 201 },
  { method: "get", path: "/scenarios/{scenarioId}/items", summary: "Treatment items of a scenario", tag: "Scenarios", success: 200 },
  { method: "post", path: "/scenarios/{scenarioId}/items", summary: "Add a treatment item (scenario version; not to the baseline)", tag: "Scenarios", body: treatmentItemInputSchema, success: 201, conflict: true },
  { method: "patch", path: "/scenarios/{scenarioId}/items/{itemId}", summary: "Change a treatment item (scenario version)", tag: "Scenarios", body: treatmentItemUpdateSchema, success: 200 },
  { method: "delete", path: "/scenarios/{scenarioId}/items/{itemId}", summary: "Remove a treatment item (scenario version as ?version=)", tag: "Scenarios", success: 200, query: scenarioVersion, conflict: true },
  { method: "get", path: "/builds", summary: "The firm's build library (owner, engineer, builder)", tag: "Build library", success: 200 },
  { method: "post", path: "/builds", summary: "Save a build to the library (owner, engineer)", tag: "Build library", body: buildInputSchema, success: 201 },
  { method: "get", path: "/builds/{buildId}", summary: "One build of the library", tag: "Build library", success: 200 },
  { method: "patch", path: "/builds/{buildId}", summary: "Change a library build (its version)", tag: "Build library", body: buildUpdateSchema, success: 200 },
  { method: "delete", path: "/builds/{buildId}", summary: "Delete a library build (items made from it keep their copy)", tag: "Build library", success: 204 },
];
