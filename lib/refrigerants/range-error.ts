import type { RefrigerantId } from "./catalog";

export type SaturationQuantity = "temperature" | "pressure";
export type SaturationLimit = "below" | "above";

/** Thrown when a reading falls outside the saturation table; the message is written for the technician. */
export class SaturationRangeError extends RangeError {
  readonly refrigerant: RefrigerantId;
  readonly quantity: SaturationQuantity;
  readonly limit: SaturationLimit;
  /** The table's limit in the quantity's internal unit: °C or kPa absolute. */
  readonly limitValue: number;

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
  }
}

function describe(a: {
  refrigerant: RefrigerantId;
  quantity: SaturationQuantity;
  limit: SaturationLimit;
  limitValue: number;
  minTempC: number;
}): string {
  const { refrigerant, quantity, limit, limitValue, minTempC } = a;
  if (quantity === "temperature") {
    const shown = formatNumber(limitValue, 2);
    if (limit === "below") return `Below ${shown} °C the tables for ${refrigerant} do not apply.`;
    return `Above ${shown} °C ${refrigerant} is past its critical point: there is no liquid, so no saturation pressure exists and the tables do not apply.`;
  }
  const shown = formatNumber(limitValue, 1);
  if (limit === "below") {
    return `Below ${shown} kPa absolute the tables for ${refrigerant} do not apply (a saturation temperature under ${formatNumber(minTempC, 2)} °C).`;
  }
  return `Above ${shown} kPa absolute ${refrigerant} is past its critical pressure: the reading is not a saturation state and the tables do not apply.`;
}

function formatNumber(value: number, decimals: number): string {
  const text = Number(value.toFixed(decimals)).toString();
  return text.startsWith("-") ? `−${text.slice(1)}` : text;
}
