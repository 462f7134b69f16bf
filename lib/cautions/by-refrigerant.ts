import { refrigerantInfo, type RefrigerantId } from "@/lib/refrigerants/catalog";
import { type Caution, type CautionId, cautionsById } from "./catalog";

/** The cautions a refrigerant brings of its own, most serious first. */
export function refrigerantCautionIds(refrigerant: RefrigerantId): CautionId[] {
  if (refrigerant === "R-1234yf") return ["flammable_r1234yf"];
  if (refrigerant === "R-744") return ["r744_pressure", "co2_asphyxiation"];
  return [];
}

/**
 * The venting bans cover the HFCs, HFOs and CFCs; releasing an R-744 charge follows the vehicle maker's
 * procedure instead (the US ban under Clean Air Act §608(c) exempts CO₂, from memory). An unknown
 * refrigerant keeps the ban on screen: better once too often than missed.
 */
export function ventingBanApplies(refrigerant: RefrigerantId | undefined): boolean {
  return refrigerant === undefined || refrigerantInfo(refrigerant).chemistry !== "natural";
}

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
