import type { z } from "zod";
import type { FieldErrors } from "./errors";

/**
 * zod issues → `{ "field.path": ["message"] }`, the shape forms and API clients read. Messages keep their
 * quantity markers: a screen says them in its reader's units, the route pipeline's error answer in SI.
 */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
