import { CAUSE_LABELS, type CauseId } from "@/lib/diagnosis/causes";
import { SYMPTOM_LABELS, type SymptomId } from "@/lib/diagnosis/symptoms";
import { COMPRESSOR_TYPE_LABELS, confirmedCauseLabel, meteringDeviceLabel } from "@/lib/casebook/labels";
import type { CasebookFacet } from "@/lib/contracts/casebook";
import { CASE_STATUS_LABELS } from "@/lib/cases/statuses";

/** How each facet's values read on screen. */
export function facetValueLabel(facet: CasebookFacet, value: string, label?: string): string {
  switch (facet) {
    case "symptoms":
      return SYMPTOM_LABELS[value as SymptomId] ?? value;
    case "device":
      return meteringDeviceLabel(value);
    case "compressor":
      return COMPRESSOR_TYPE_LABELS[value as keyof typeof COMPRESSOR_TYPE_LABELS] ?? value;
    case "suspect":
      return CAUSE_LABELS[value as CauseId] ?? value;
    case "cause":
      return confirmedCauseLabel(value);
    case "status":
      return CASE_STATUS_LABELS[value as keyof typeof CASE_STATUS_LABELS] ?? value;
    case "technician":
      return label ?? value;
    case "comeback":
      return "Comebacks only";
    default:
      return value;
  }
}

export const FACET_TITLES: Record<CasebookFacet, string> = {
  symptoms: "Symptom",
  refrigerant: "Refrigerant",
  device: "Metering device",
  compressor: "Compressor type",
  suspect: "Leading suspect",
  cause: "Confirmed cause",
  make: "Make",
  model: "Model",
  technician: "Technician",
  status: "Status",
  comeback: "Comeback",
};

export function shortDate(iso: string | null): string {
  return iso ? iso.slice(0, 10) : "—";
}
