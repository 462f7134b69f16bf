import type { RefrigerantId } from "./catalog";
import { type Quantity, quantityMarker } from "@/lib/units/quantity";

export type SaturationQuantity = "temperature" | "pressure";
export type SaturationLimit = "below" | "above";

/**
 * Thrown when a reading falls outside the saturation table. The message is written for the technician
 * with its numbers as quantity markers; `limitQuantity` is the limit itself.
 */
export class SaturationRangeError extends RangeError {
  readonly refrigerant: RefrigerantId;
  readonly quantity: SaturationQuantity;
  readonly limit: SaturationLimit;
  /** The table's limit in the quantity's internal unit: °C or kPa absolute. */
  readonly limitValue: number;
  /** The limit as a quantity, for a screen that says it on its own. */
  readonly limitQuantity: Quantity;

  constructor(a: {
    refrigerant: RefrigerantId;
    quantity: SaturationQuantity;
    limit: SaturationLimit;
    limitValue: number;
    minTempC: number;
  }) {
    super(describe(a));
    this.name = "SaturationRangeError";
    this.refrigerant = a.refrigerant;
    this.quantity = a.quantity;
    this.limit = a.limit;
    this.limitValue = a.limitValue;
    this.limitQuantity = limitQuantity(
      a.quantity === "temperature" ? "temperature" : "pressure_abs",
      a.limitValue,
    );
  }
}

/** A table limit as a quantity: whole degrees and kPa show no decimals, others one. */
function limitQuantity(kind: "temperature" | "pressure_abs", value: number): Quantity {
  return { kind, value, decimals: Number.isInteger(Number(value.toFixed(2))) ? 0 : 1 };
}

/**
 * The message carries its numbers as quantity markers (lib/units/quantity.ts): a screen says it with
 * sayInUnits in its reader's units, so an imperial reader sees °F and psia.
 */
function describe(a: {
  refrigerant: RefrigerantId;
  quantity: SaturationQuantity;
  limit: SaturationLimit;
  limitValue: number;
  minTempC: number;
}): string {
  const { refrigerant, quantity, limit, limitValue, minTempC } = a;
  if (quantity === "temperature") {
    const shown = quantityMarker(limitQuantity("temperature", limitValue));
    if (limit === "below") return `Below ${shown} the tables for ${refrigerant} do not apply.`;
    return `Above ${shown} ${refrigerant} is past its critical point: there is no liquid, so no saturation pressure exists and the tables do not apply.`;
  }
  const shown = quantityMarker(limitQuantity("pressure_abs", limitValue));
  if (limit === "below") {
    return `Below ${shown} the tables for ${refrigerant} do not apply (a saturation temperature under ${quantityMarker(limitQuantity("temperature", minTempC))}).`;
  }
  return `Above ${shown} ${refrigerant} is past its critical pressure: the reading is not a saturation state and the tables do not apply.`;
}
