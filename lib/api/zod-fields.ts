import type { z } from "zod";
import type { FieldErrors } from "./errors";

/** Turns a zod error into field path → messages ("" is the body itself). */
export function fieldErrors(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join(".");
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** One sentence naming the first failing fields, for the `message` of a 400. */
export function summarise(fields: FieldErrors): string {
  const keys = Object.keys(fields);
  if (keys.length === 0) return "The request is not valid.";
  const first = keys.slice(0, 3).map((k) => `${k || "body"}: ${fields[k]?.[0] ?? "invalid"}`);
  return `Invalid input — ${first.join("; ")}${keys.length > 3 ? ` (and ${keys.length - 3} more)` : ""}.`;
}
