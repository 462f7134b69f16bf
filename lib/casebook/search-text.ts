import { CAUSE_LABELS, type CauseId } from "@/lib/diagnosis/causes";
import { REPAIR_CATALOG, isRepairId } from "@/lib/repairs/catalog";
import { confirmedCauseLabel } from "./labels";

export interface CaseTexts {
  complaint: string;
  make: string | null;
  model: string | null;
  conclusionCause: string | null;
  conclusionNotes: string | null;
  /** The seniors' sign-off comments. */
  reviewNotes: string[];
  /** The technician's notes on the service record. */
  serviceNotes: string | null;
  confirmedCauses: string[];
  repairIds: string[];
  confirmedRepair: string | null;
  repairNote: string | null;
}

const causeLabel = (id: string | null) => (id && id in CAUSE_LABELS ? CAUSE_LABELS[id as CauseId] : null);

/** Everything the casebook's search box looks through, as one text for the full-text index. */
export function caseSearchText(t: CaseTexts): string {
  return [
    t.complaint,
    t.make,
    t.model,
    causeLabel(t.conclusionCause),
    t.conclusionNotes,
    ...t.reviewNotes,
    t.serviceNotes,
    ...t.confirmedCauses.map(confirmedCauseLabel),
    ...t.repairIds.filter(isRepairId).map((id) => REPAIR_CATALOG[id].tradeLabel),
    t.confirmedRepair,
    t.repairNote,
  ]
    .filter((part): part is string => typeof part === "string" && part.trim().length > 0)
    .join("\n")
    .slice(0, 60_000);
}
