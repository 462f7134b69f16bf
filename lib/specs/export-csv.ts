import Papa from "papaparse";
import { type MassUnit, type VolumeUnit, massFromG, volumeFromMl } from "@/lib/units";
import type { SpecRow } from "./schema";

const DECIMALS: Readonly<Record<MassUnit | VolumeUnit, number>> = {
  g: 0,
  kg: 3,
  oz: 2,
  lb: 3,
  mL: 0,
  floz: 2,
};
const SUFFIX: Readonly<Record<MassUnit | VolumeUnit, string>> = {
  g: "g",
  kg: "kg",
  oz: "oz",
  lb: "lb",
  mL: "ml",
  floz: "floz",
};

function rounded(value: number, unit: MassUnit | VolumeUnit): number {
  const f = 10 ** DECIMALS[unit];
  return Math.round(value * f) / f;
}

/** The spec table as CSV that parseSpecCsv reads back; the unit sits in the header (label_charge_oz). */
export function specRowsToCsv(
  rows: readonly SpecRow[],
  opts: { units?: { charge?: MassUnit; oil?: VolumeUnit } } = {},
): string {
  const chargeUnit = opts.units?.charge ?? "g";
  const oilUnit = opts.units?.oil ?? "mL";
  const fields = [
    "year_from",
    "year_to",
    "make",
    "model",
    "variant",
    "rear_ac",
    "refrigerant",
    `label_charge_${SUFFIX[chargeUnit]}`,
    "oil_type",
    `total_oil_${SUFFIX[oilUnit]}`,
    "compressor_type",
  ];
  const data = rows.map((r) => [
    r.yearFrom,
    r.yearTo,
    r.make,
    r.model,
    r.variant,
    r.rearAc ? "yes" : "no",
    r.refrigerant,
    rounded(massFromG(r.labelChargeG, chargeUnit), chargeUnit),
    r.oilType,
    r.totalOilMl === null ? "" : rounded(volumeFromMl(r.totalOilMl, oilUnit), oilUnit),
    r.compressorType ? r.compressorType.replace("_", " ") : "",
  ]);
  return Papa.unparse({ fields, data }, { escapeFormulae: true, newline: "\r\n" });
}
