import type { z } from "zod";
import type { FieldErrors } from "./errors";
import { sayInUnits } from "./units/quantity";

/**
 * zod issues → `{ "field.path": ["message"] }`, the shape forms and API clients read. A message written
 * with quantity markers is said in SI here; screens that know their reader say it in theirs.
 */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    (out[key] ??= []).push(sayInUnits(issue.message));
  }
  return out;
}
