/*
 * The one list of compressor types, with the one way each is named on screen: how the compressor is
 * driven and controlled, which decides what the clutch's behaviour can tell (a fixed-displacement
 * compressor cycles its clutch to hold the evaporator above freezing; a variable-displacement one
 * changes its stroke instead; an electric one is driven by its own inverter). Common practice.
 */
export const COMPRESSOR_TYPES = ["cycling_clutch", "variable_displacement", "electric"] as const;
export type CompressorType = (typeof COMPRESSOR_TYPES)[number];

export const COMPRESSOR_TYPE_LABELS: Readonly<Record<CompressorType, string>> = {
  cycling_clutch: "Fixed displacement, cycling clutch",
  variable_displacement: "Variable displacement",
  electric: "Electric (high-voltage)",
};

export function isCompressorType(value: unknown): value is CompressorType {
  return typeof value === "string" && (COMPRESSOR_TYPES as readonly string[]).includes(value);
}
