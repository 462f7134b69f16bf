import { refrigerantInfo, type RefrigerantId } from "@/lib/refrigerants/catalog";
import type { CautionId } from "./catalog";

// Which cautions a refrigerant brings, by id only: the interview's screen asks this on the phone
// while the catalogue's texts stay on the server (lib/cautions/catalog.ts holds what each one says).

/** The cautions a refrigerant brings of its own, most serious first. */
export function refrigerantCautionIds(refrigerant: RefrigerantId) {
  if (refrigerant === "R-1234yf") return ["flammable_r1234yf"] as const satisfies readonly CautionId[];
  if (refrigerant === "R-744")
    return ["r744_pressure", "co2_asphyxiation"] as const satisfies readonly CautionId[];
  return [] as const;
}

/**
 * The venting bans cover the HFCs, HFOs and CFCs; releasing an R-744 charge follows the vehicle maker's
 * procedure instead (the US ban under Clean Air Act §608(c) exempts CO₂, from memory). An unknown
 * refrigerant keeps the ban on screen: better once too often than missed.
 */
export function ventingBanApplies(refrigerant: RefrigerantId | undefined): boolean {
  return refrigerant === undefined || refrigerantInfo(refrigerant).chemistry !== "natural";
}
