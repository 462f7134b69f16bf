import type { FieldDef, FormValues } from "./field-defs";
import { fromInternal, toInternal } from "./quantities";
import type { UnitPreferences } from "./unit-preferences";

const isQuantity = (def: FieldDef) =>
  def.kind === "pressure" ||
  def.kind === "temperature" ||
  def.kind === "mass" ||
  def.kind === "volume" ||
  def.kind === "plain";

/** What the form shows for a saved answer or draft. */
export function formValuesOf(fields: FieldDef[], saved: unknown, units: UnitPreferences): FormValues {
  const record = (typeof saved === "object" && saved !== null ? saved : {}) as Record<string, unknown>;
  const values: FormValues = {};
  for (const def of fields) {
    const value = record[def.name];
    if (def.kind === "multi") values[def.name] = Array.isArray(value) ? value.map(String) : [];
    else if (def.kind === "yesno") values[def.name] = value === true ? "yes" : value === false ? "no" : "";
    else if (isQuantity(def)) values[def.name] = fromInternal(def.kind as never, value, units);
    else values[def.name] = value === undefined || value === null ? "" : String(value);
  }
  return values;
}

/** The answer group's values in internal units; empty fields are left out. */
export function answerValuesOf(
  fields: FieldDef[],
  values: FormValues,
  units: UnitPreferences,
): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const def of fields) {
    const raw = values[def.name];
    if (def.kind === "multi") {
      out[def.name] = Array.isArray(raw) ? raw : [];
      continue;
    }
    const text = typeof raw === "string" ? raw : "";
    let value: unknown;
    if (def.kind === "yesno") value = text === "yes" ? true : text === "no" ? false : undefined;
    else if (def.kind === "text") value = text.trim() === "" ? undefined : text;
    else if (def.kind === "choice") value = text === "" ? undefined : text;
    else value = toInternal(def.kind, text, units);
    if (value !== undefined) out[def.name] = value;
  }
  return out;
}
