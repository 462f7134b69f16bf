/*
 * The one list of expansion (metering) devices, with the one way each is named on screen. The trade pairs
 * each device with the part that stores refrigerant and dries it: an orifice tube with an accumulator on
 * the low side, a thermostatic expansion valve (TXV) with a receiver-drier on the high side.
 * tests/unit/vocabulary.test.ts fails on a second list or another wording.
 */
export const EXPANSION_DEVICE_IDS = ["orifice_tube", "txv"] as const;
export type ExpansionDevice = (typeof EXPANSION_DEVICE_IDS)[number];

export const EXPANSION_DEVICE_LABELS: Readonly<Record<ExpansionDevice, string>> = {
  orifice_tube: "Orifice tube with accumulator",
  txv: "TXV with receiver-drier",
};

export const EXPANSION_DEVICE_OPTIONS: readonly { value: ExpansionDevice; label: string }[] =
  EXPANSION_DEVICE_IDS.map((id) => ({ value: id, label: EXPANSION_DEVICE_LABELS[id] }));

export function isExpansionDevice(value: unknown): value is ExpansionDevice {
  return typeof value === "string" && (EXPANSION_DEVICE_IDS as readonly string[]).includes(value);
}
