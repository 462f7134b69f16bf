import type { FieldDef, FormValues } from "./field-defs";
import { fromInternal, readTyped, toInternal, type Unreadable } from "./quantities";
import { unitsForField, type FieldUnits, type UnitPreferences } from "./unit-preferences";

const isQuantity = (def: FieldDef) =>
  def.kind === "pressure" ||
  def.kind === "temperature" ||
  def.kind === "mass" ||
  def.kind === "volume" ||
  def.kind === "plain";

/** How the form reads numbers: the profile's units, any field's own unit, and the person's locale. */
export interface Reading {
  units: UnitPreferences;
  fieldUnits?: FieldUnits;
  locale?: string;
}

/** What the form shows for a saved answer or draft. */
export function formValuesOf(fields: FieldDef[], saved: unknown, reading: Reading): FormValues {
  const record = (typeof saved === "object" && saved !== null ? saved : {}) as Record<string, unknown>;
  const values: FormValues = {};
  for (const def of fields) {
    const value = record[def.name];
    const units = unitsForField(reading.units, reading.fieldUnits ?? {}, def.name, def.kind);
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
  reading: Reading,
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
    else {
      const units = unitsForField(reading.units, reading.fieldUnits ?? {}, def.name, def.kind);
      value = toInternal(def.kind, text, units, reading.locale);
    }
    if (value !== undefined) out[def.name] = value;
  }
  return out;
}

/** The number fields whose text cannot be read as a number, with what to say (or ask) about each. */
export function unreadableFields(
  fields: FieldDef[],
  values: FormValues,
  reading: Reading,
): { field: string; problem: Unreadable }[] {
  const out: { field: string; problem: Unreadable }[] = [];
  for (const def of fields) {
    if (!isQuantity(def)) continue;
    const raw = values[def.name];
    const units = unitsForField(reading.units, reading.fieldUnits ?? {}, def.name, def.kind);
    const read = readTyped(def.kind as never, typeof raw === "string" ? raw : "", units, reading.locale);
    if ("message" in read)
      out.push({
        field: def.name,
        problem: { message: read.message, ...(read.ambiguous ? { ambiguous: read.ambiguous } : {}) },
      });
  }
  return out;
}
