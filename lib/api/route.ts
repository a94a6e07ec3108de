import "server-only";
import { z } from "zod";
import type { Actor } from "@/lib/auth/actor";
import { getActor } from "@/lib/auth/session";
import { AppError, STATUS_OF } from "./errors";
import { fieldErrors, summarise } from "./zod-fields";

/** Bodies above this are refused before parsing (the engines' largest valid request is far smaller). */
export const MAX_JSON_BYTES = 1_000_000;

export function jsonError(status: number, code: string, message: string, fields?: Record<string, string[]>): Response {
  return Response.json({ error: fields ? { code, message, fields } : { code, message } }, { status });
}

/** The one place that turns a thrown error into the API's JSON error answer. */
export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) return jsonError(STATUS_OF[error.code], error.code, error.message, error.fields);
  if (error instanceof z.ZodError) {
    const fields = fieldErrors(error);
    return jsonError(400, "bad_request", summarise(fields), fields);
  }
  // The computation modules throw RangeError/TypeError for arguments outside their domain.
  if (error instanceof RangeError || error instanceof TypeError) return jsonError(400, "bad_request", error.message);
  console.error("[api] unexpected error", error);
  return jsonError(500, "internal", "Something went wrong on our side. The error has been logged.");
}

/** Reads a JSON body with a size limit and parses it with the schema; throws AppError/ZodError. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().includes("application/json")) {
    throw new AppError("unsupported_media_type", "Send the body as JSON with Content-Type: application/json.");
  }
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > MAX_JSON_BYTES) throw new AppError("payload_too_large", `The body is larger than ${MAX_JSON_BYTES} bytes.`);
  return parseJsonText(await request.text(), schema);
}

/** A JSON body that may be left out (an empty body → undefined); otherwise as `readJson`. */
export async function readOptionalJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S> | undefined> {
  const text = await request.text();
  return text.trim() === "" ? undefined : parseJsonText(text, schema);
}

function parseJsonText<S extends z.ZodType>(text: string, schema: S): z.infer<S> {
  if (text.length > MAX_JSON_BYTES) throw new AppError("payload_too_large", `The body is larger than ${MAX_JSON_BYTES} bytes.`);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The body is not valid JSON.", { "": ["not valid JSON"] });
  }
  return schema.parse(data);
}

export interface RouteContext<P> {
  request: Request;
  actor: Actor;
  params: P;
}

type NextRouteArgs<P> = { params: Promise<P> };

/**
 * Wraps a route handler: requires a signed-in actor, awaits the params, and answers any error
 * as JSON. The handler returns a Response or a value to send as JSON with `status` (default 200).
 */
export function apiRoute<P = Record<string, never>>(
  handle: (ctx: RouteContext<P>) => Promise<Response | { body: unknown; status?: number }>,
): (request: Request, args: NextRouteArgs<P>) => Promise<Response> {
  return async (request, args) => {
    try {
      const actor = await getActor();
      if (!actor) throw new AppError("unauthorized", "Sign in first.");
      const params = (await args?.params) ?? ({} as P);
      const out = await handle({ request, actor, params });
      if (out instanceof Response) return out;
      return Response.json(out.body, { status: out.status ?? 200 });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
