import { CAUSE_LABELS, CAUSE_SHORT_NAMES, type CauseId } from "@/lib/diagnosis/causes";
import { COMPRESSOR_TYPE_LABELS } from "@/lib/vehicles/compressor-types";
import { EXPANSION_DEVICE_LABELS, isExpansionDevice } from "@/lib/vehicles/expansion-devices";

const isCause = (id: string): id is CauseId => id in CAUSE_LABELS;

export function confirmedCauseLabel(id: string): string {
  if (id === "none_found") return "No fault found";
  return isCause(id) ? CAUSE_LABELS[id] : id;
}

/** For sentences: "confirmed as poor condenser airflow". */
export function confirmedCauseShortName(id: string): string {
  if (id === "none_found") return "no fault found";
  return isCause(id) ? CAUSE_SHORT_NAMES[id] : id;
}

/** The metering device's one wording (lib/vehicles/expansion-devices.ts), or the stored value as it is. */
export function meteringDeviceLabel(id: string): string {
  return isExpansionDevice(id) ? EXPANSION_DEVICE_LABELS[id] : id;
}

/** The compressor types' one wording (lib/vehicles/compressor-types.ts). */
export { COMPRESSOR_TYPE_LABELS };
