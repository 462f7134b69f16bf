/**
 * A JSON column as a raw read hands it back: already parsed, or its text (the MariaDB driver returns
 * JSON columns as text). Text that is not JSON reads as null, as does a missing value.
 */
export function jsonColumn(value: unknown): unknown {
  if (typeof value !== "string") return value ?? null;
  try {
    return JSON.parse(value);
  } catch {
    return null;
  }
}
