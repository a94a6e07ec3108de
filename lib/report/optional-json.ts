import "server-only";
import type { z } from "zod";
import { AppError } from "@/lib/api/errors";
import { MAX_JSON_BYTES } from "@/lib/api/route";

/** A JSON body that may be left out (no body → undefined); otherwise parsed with the schema. */
export async function readOptionalJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S> | undefined> {
  const text = await request.text();
  if (text.trim() === "") return undefined;
  if (text.length > MAX_JSON_BYTES) throw new AppError("payload_too_large", `The body is larger than ${MAX_JSON_BYTES} bytes.`);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The body is not valid JSON.", { "": ["not valid JSON"] });
  }
  return schema.parse(data);
}
