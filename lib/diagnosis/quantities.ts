/**
 * Evidence carries its numbers as quantities, not baked into sentences: a value in the engine's
 * internal unit and the kind of quantity it is. The formatter (messages.ts) renders them in the
 * reader's units at the edge.
 */
export type QuantityKind =
  /** kPa above the local atmosphere */
  | "pressure_gauge"
  /** kPa absolute */
  | "pressure_abs"
  /** a difference of pressures, kPa */
  | "pressure_difference"
  /** °C */
  | "temperature"
  /** a difference of temperatures (superheat, subcooling, excess over saturation), K */
  | "temperature_difference"
  /** g */
  | "mass"
  /** mL */
  | "volume"
  | "percent"
  /** minutes */
  | "duration";

export interface Quantity {
  value: number;
  kind: QuantityKind;
  /** Display precision when the kind's default does not suit (a percentage shown whole). */
  decimals?: 0 | 1 | 2 | 3;
}

export const gaugeKpa = (value: number): Quantity => ({ value, kind: "pressure_gauge" });
export const absKpa = (value: number): Quantity => ({ value, kind: "pressure_abs" });
export const kpaDifference = (value: number): Quantity => ({ value, kind: "pressure_difference" });
export const tempC = (value: number): Quantity => ({ value, kind: "temperature" });
export const kelvin = (value: number): Quantity => ({ value, kind: "temperature_difference" });
export const grams = (value: number): Quantity => ({ value, kind: "mass" });
export const millilitres = (value: number): Quantity => ({ value, kind: "volume" });
export const percent = (value: number, decimals?: 0 | 1): Quantity =>
  decimals === undefined ? { value, kind: "percent" } : { value, kind: "percent", decimals };
export const minutes = (value: number): Quantity => ({ value, kind: "duration" });
