import type { RefrigerantId } from "@/lib/refrigerants/catalog";
import { type Caution, cautionsById } from "./catalog";
import { refrigerantCautionIds, ventingBanApplies } from "./refrigerant-rules";

export { refrigerantCautionIds, ventingBanApplies } from "./refrigerant-rules";

/** Cautions to show wherever a technician works on a system with this refrigerant, most specific first. */
export function refrigerantCautions(refrigerant: RefrigerantId): Caution[] {
  return cautionsById([
    ...refrigerantCautionIds(refrigerant),
    "eye_and_skin",
    ...(ventingBanApplies(refrigerant) ? (["never_vent"] as const) : []),
    "system_pressure",
    "defer_to_procedure",
  ]);
}
