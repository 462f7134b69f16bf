import type { ReaderUnits } from "@/lib/units";

/*
 * The units a field starts in come from the person's profile (lib/units readerUnitsOf, resolved on the
 * server); a tap on a field's unit button changes what that one field's digits mean, nothing else.
 */
export type UnitPreferences = ReaderUnits;
/** The quantities the interview asks for (vacuum is a service-record reading). */
export type QuantityKind = "pressure" | "temperature" | "mass" | "volume";
/** One field's unit where the technician tapped another than their profile's, by field name. */
export type FieldUnits = Partial<Record<string, string>>;

/** The units one field reads in: the profile's, unless its own button said otherwise. */
export function unitsForField(units: UnitPreferences, fieldUnits: FieldUnits, name: string, kind: string) {
  const own = fieldUnits[name];
  return own === undefined ? units : ({ ...units, [kind]: own } as UnitPreferences);
}
