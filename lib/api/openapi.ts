import { z } from "zod";
import { REPORT_ENDPOINTS } from "@/lib/report/openapi";
import { BUILD_ENDPOINTS } from "./openapi-build";
import { DESIGN_ENDPOINTS } from "./openapi-design";
import { FILES_PAYMENTS_ENDPOINTS } from "./openapi-files-payments";
import { WORKSPACE_ENDPOINTS } from "./openapi-workspace";
import { flatnessMapRequestSchema, modalResponseRequestSchema, modesRequestSchema } from "@/lib/modes/schemas";
import { absorberRatingRequestSchema, absorberSpectrumRequestSchema } from "@/lib/porous/schemas";
import { reverbPredictRequestSchema, reverbTargetRequestSchema } from "@/lib/reverb/schemas";
import { inviteSchema, memberUpdateSchema } from "@/lib/schemas/member";
import { projectInputSchema, projectUpdateSchema } from "@/lib/schemas/project";
import { roomInputSchema, roomUpdateSchema } from "@/lib/schemas/room";

type Method = "get" | "post" | "put" | "patch" | "delete";

/** One documented endpoint. Request bodies are the same zod schemas the handlers parse. */
export interface EndpointDoc {
  method: Method;
  path: string;
  summary: string;
  tag: string;
  body?: z.ZodType;
  success: number;
  public?: boolean;
  /** Query parameters (strings), e.g. `version` of a DELETE */
  query?: { name: string; description: string; required?: boolean }[];
  /** Answers 409 on a stale version (PATCH and PUT always do) */
  conflict?: boolean;
}

const ENDPOINTS: EndpointDoc[] = [
  { method: "get", path: "/me", summary: "The signed-in user", tag: "Account", success: 200 },
  { method: "get", path: "/projects", summary: "Projects the caller may see", tag: "Projects", success: 200 },
  { method: "post", path: "/projects", summary: "Create a project (owner, engineer)", tag: "Projects", body: projectInputSchema, success: 201 },
  { method: "get", path: "/projects/{projectId}", summary: "One project", tag: "Projects", success: 200 },
  { method: "patch", path: "/projects/{projectId}", summary: "Update a project (optimistic: send the version you read)", tag: "Projects", body: projectUpdateSchema, success: 200 },
  { method: "delete", path: "/projects/{projectId}", summary: "Delete a project and its rooms", tag: "Projects", success: 204 },
  { method: "get", path: "/projects/{projectId}/rooms", summary: "Rooms of a project", tag: "Rooms", success: 200 },
  { method: "post", path: "/projects/{projectId}/rooms", summary: "Create a room (SI units)", tag: "Rooms", body: roomInputSchema, success: 201 },
  { method: "get", path: "/rooms/{roomId}", summary: "One room", tag: "Rooms", success: 200 },
  { method: "patch", path: "/rooms/{roomId}", summary: "Update a room (optimistic: send the version you read)", tag: "Rooms", body: roomUpdateSchema, success: 200 },
  { method: "delete", path: "/rooms/{roomId}", summary: "Delete a room", tag: "Rooms", success: 204 },
  { method: "get", path: "/members", summary: "Members of the caller's firm (owner, engineer)", tag: "Team", success: 200 },
  { method: "post", path: "/members", summary: "Invite a member by e-mail (owner)", tag: "Team", body: inviteSchema, success: 201 },
  { method: "patch", path: "/members/{userId}", summary: "Change a member's role or deactivate them (owner)", tag: "Team", body: memberUpdateSchema, success: 200 },
  { method: "post", path: "/modes", summary: "Room modes up to a frequency (Rayleigh); with RT60 also bandwidths, coincidences, gaps, Schroeder frequency, Bonello and EBU Tech 3276 checks", tag: "Low end", body: modesRequestSchema, success: 200 },
  { method: "post", path: "/modes/response", summary: "Modal response in dB between a source and a receiver (modal sum)", tag: "Low end", body: modalResponseRequestSchema, success: 200 },
  { method: "post", path: "/modes/flatness-map", summary: "Std-dev of the level over frequency on a grid at listening height (index ix*gridY + iy)", tag: "Low end", body: flatnessMapRequestSchema, success: 200 },
  { method: "post", path: "/absorbers/spectrum", summary: "Absorption coefficient per frequency of a layer stack (Delany–Bazley or Miki, transfer of impedance)", tag: "Absorbers", body: absorberSpectrumRequestSchema, success: 200 },
  { method: "post", path: "/absorbers/rating", summary: "ISO 11654 αw, shape indicators and class; ASTM C423 NRC and SAA", tag: "Absorbers", body: absorberRatingRequestSchema, success: 200 },
  { method: "post", path: "/reverb/predict", summary: "Reverberation time per band (Sabine/Eyring, ISO 9613-1 air absorption)", tag: "Decay", body: reverbPredictRequestSchema, success: 200 },
  { method: "post", path: "/reverb/target", summary: "Prediction against a target band, with the verdict and the absorption needed per band", tag: "Decay", body: reverbTargetRequestSchema, success: 200 },
  { method: "get", path: "/openapi.json", summary: "This document", tag: "Meta", success: 200, public: true },
];

// Every topic lists its endpoints in a file of its own, imported here: a route bundle never has to be
// loaded for its documentation to appear.
const endpoints: EndpointDoc[] = [...ENDPOINTS, ...WORKSPACE_ENDPOINTS, ...DESIGN_ENDPOINTS, ...BUILD_ENDPOINTS, ...REPORT_ENDPOINTS, ...FILES_PAYMENTS_ENDPOINTS];

const errorSchema = {
  type: "object",
  required: ["error"],
  properties: {
    error: {
      type: "object",
      required: ["code", "message"],
      properties: {
        code: { type: "string", enum: ["bad_request", "unauthorized", "forbidden", "not_found", "conflict", "payload_too_large", "unsupported_media_type", "rate_limited", "internal"] },
        message: { type: "string" },
        fields: { type: "object", additionalProperties: { type: "array", items: { type: "string" } }, description: "Field path → messages" },
      },
    },
  },
};

/**
 * JSON Schema of a request body. Schemas with a meta id come out as `$defs`; they move to
 * `components.schemas` and their references are rewritten to point there.
 */
function jsonSchema(schema: z.ZodType, components: Record<string, unknown>): unknown {
  const { $schema: _drop, $defs, ...rest } = z.toJSONSchema(schema, { io: "input", unrepresentable: "any" }) as Record<string, unknown>;
  const rewrite = (value: unknown): unknown => {
    if (Array.isArray(value)) return value.map(rewrite);
    if (value && typeof value === "object") {
      return Object.fromEntries(
        Object.entries(value).map(([k, v]) => [k, k === "$ref" && typeof v === "string" ? v.replace("#/$defs/", "#/components/schemas/") : rewrite(v)]),
      );
    }
    return value;
  };
  for (const [name, def] of Object.entries(($defs ?? {}) as Record<string, unknown>)) components[name] = rewrite(def);
  return rewrite(rest);
}

/** The OpenAPI 3.1 document of /api/v1, generated from the handlers' zod schemas. */
export function openApiDocument(): Record<string, unknown> {
  const paths: Record<string, Record<string, unknown>> = {};
  const schemas: Record<string, unknown> = { Error: errorSchema };
  for (const e of endpoints) {
    const params: Record<string, unknown>[] = [...e.path.matchAll(/\{(\w+)\}/g)].map((m) => ({ name: m[1], in: "path", required: true, schema: { type: "string" } }));
    for (const q of e.query ?? []) params.push({ name: q.name, in: "query", required: q.required ?? false, description: q.description, schema: { type: "string" } });
    const errors = {
      "400": { description: "Invalid input; `fields` names each failing field", content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } },
      ...(e.public ? {} : { "401": { description: "Not signed in", content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } } }),
      "403": { description: "Signed in, but the role does not allow it" },
      "404": { description: "Not found, or not visible to the caller" },
      ...(e.method === "patch" || e.method === "put" || e.conflict ? { "409": { description: "Stale version: someone else changed it" } } : {}),
    };
    (paths[e.path] ??= {})[e.method] = {
      summary: e.summary,
      tags: [e.tag],
      ...(params.length > 0 && { parameters: params }),
      ...(e.body && { requestBody: { required: true, content: { "application/json": { schema: jsonSchema(e.body, schemas) } } } }),
      responses: { [String(e.success)]: { description: e.success === 204 ? "Done, no body" : "OK" }, ...errors },
      ...(e.public ? { security: [] } : {}),
    };
  }
  return {
    openapi: "3.1.0",
    info: { title: "Eigenroom API", version: "1", description: "JSON API of Eigenroom. Errors are `{ error: { code, message, fields? } }`. SI units throughout." },
    servers: [{ url: "/api/v1" }],
    components: {
      schemas,
      securitySchemes: { session: { type: "apiKey", in: "cookie", name: "eigenroom_session" } },
    },
    security: [{ session: [] }],
    paths,
  };
}
