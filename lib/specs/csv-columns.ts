import type { MassUnit, VolumeUnit } from "@/lib/units";

export type SpecField =
  | "yearFrom"
  | "yearTo"
  | "year"
  | "years"
  | "make"
  | "model"
  | "variant"
  | "rearAc"
  | "refrigerant"
  | "labelCharge"
  | "chargeUnit"
  | "oilType"
  | "totalOil"
  | "oilUnit"
  | "units"
  | "compressorType";

export const FIELD_COLUMN_NAMES: Readonly<Record<SpecField, string>> = {
  yearFrom: "year_from",
  yearTo: "year_to",
  year: "year",
  years: "years",
  make: "make",
  model: "model",
  variant: "variant",
  rearAc: "rear_ac",
  refrigerant: "refrigerant",
  labelCharge: "label_charge",
  chargeUnit: "charge_unit",
  oilType: "oil_type",
  totalOil: "total_oil",
  oilUnit: "oil_unit",
  units: "units",
  compressorType: "compressor_type",
};

const ALIASES: Readonly<Record<string, SpecField>> = {
  year_from: "yearFrom",
  from_year: "yearFrom",
  start_year: "yearFrom",
  year_start: "yearFrom",
  year_to: "yearTo",
  to_year: "yearTo",
  end_year: "yearTo",
  year_end: "yearTo",
  year: "year",
  model_year: "year",
  years: "years",
  year_range: "years",
  make: "make",
  manufacturer: "make",
  model: "model",
  variant: "variant",
  engine: "variant",
  engine_or_variant: "variant",
  engine_variant: "variant",
  rear_ac: "rearAc",
  rear_a_c: "rearAc",
  rear_air: "rearAc",
  rear_evaporator: "rearAc",
  refrigerant: "refrigerant",
  label_charge: "labelCharge",
  charge: "labelCharge",
  refrigerant_charge: "labelCharge",
  charge_unit: "chargeUnit",
  label_charge_unit: "chargeUnit",
  oil_type: "oilType",
  oil: "oilType",
  total_oil: "totalOil",
  oil_total: "totalOil",
  oil_capacity: "totalOil",
  oil_unit: "oilUnit",
  total_oil_unit: "oilUnit",
  units: "units",
  compressor_type: "compressorType",
  compressor: "compressorType",
};

const MASS_SUFFIXES: Readonly<Record<string, MassUnit>> = {
  g: "g",
  grams: "g",
  kg: "kg",
  oz: "oz",
  lb: "lb",
  lbs: "lb",
};
const VOLUME_SUFFIXES: Readonly<Record<string, VolumeUnit>> = {
  ml: "mL",
  cc: "mL",
  floz: "floz",
  fl_oz: "floz",
  oz: "floz",
};

export interface ColumnRole {
  field: SpecField;
  /** unit given by the header itself: label_charge_oz, total_oil_ml */
  unit?: MassUnit | VolumeUnit;
}

export function normaliseHeader(header: string): string {
  return header
    .replace(/^\uFEFF/, "")
    .trim()
    .toLowerCase()
    .replace(/[\s\-/().]+/g, "_")
    .replace(/^_+|_+$/g, "");
}

/** What a header means, or null when we do not use that column. */
export function columnRole(header: string): ColumnRole | null {
  const h = normaliseHeader(header);
  const direct = ALIASES[h];
  if (direct) return { field: direct };
  for (const [suffix, unit] of Object.entries(MASS_SUFFIXES)) {
    const base = h.endsWith(`_${suffix}`) ? h.slice(0, -suffix.length - 1) : null;
    if (base && ALIASES[base] === "labelCharge") return { field: "labelCharge", unit };
  }
  for (const [suffix, unit] of Object.entries(VOLUME_SUFFIXES)) {
    const base = h.endsWith(`_${suffix}`) ? h.slice(0, -suffix.length - 1) : null;
    if (base && ALIASES[base] === "totalOil") return { field: "totalOil", unit };
  }
  return null;
}

/** Unit words allowed in a charge_unit / oil_unit / units cell. */
export function massUnitFromWord(word: string): MassUnit | null {
  return MASS_SUFFIXES[normaliseHeader(word).replace(/_/g, "")] ?? null;
}

export function volumeUnitFromWord(word: string): VolumeUnit | null {
  return VOLUME_SUFFIXES[normaliseHeader(word).replace(/_/g, "")] ?? null;
}

/** A units cell: "metric" (g, mL), "us" (oz, fl oz), or "oz/floz"-style pairs. */
export function unitsFromWord(word: string): { charge: MassUnit; oil: VolumeUnit } | null {
  const w = word.trim().toLowerCase();
  if (w === "metric" || w === "si") return { charge: "g", oil: "mL" };
  if (w === "us" || w === "us customary") return { charge: "oz", oil: "floz" };
  const [c, o] = w.split(/\s*[/+;|]\s*/);
  const charge = c ? massUnitFromWord(c) : null;
  const oil = o ? volumeUnitFromWord(o) : null;
  return charge && oil ? { charge, oil } : null;
}
