import { sizerInputSchema } from "./schemas";
import type { SizerInput } from "./types";

/**
 * Checks a sizer input with its zod schema (the API's own), throwing a TypeError/RangeError that names
 * the first bad field.
 */
export function checkInput(input: SizerInput): void {
  if (typeof input !== "object" || input === null) throw new TypeError("input must be an object");
  const r = sizerInputSchema.safeParse(input);
  if (!r.success) {
    const issue = r.error.issues[0]!;
    const field = issue.path.join(".") || "input";
    const message = `${field}: ${issue.message}`;
    throw issue.code === "invalid_type" ? new TypeError(message) : new RangeError(message);
  }
}
