import type { ServiceRefrigerantId } from "@/lib/refrigerants/catalog";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { OwnerUnits } from "./units";

/**
 * What the owner's wording may use from a case: internal units (g, °C, mL), every value optional.
 * Built from the interview's answers and the service record; the templates pick what they need.
 */
export interface OwnerFacts {
  units: OwnerUnits;
  refrigerant?: ServiceRefrigerantId;
  expansionDevice?: ExpansionDevice;
  electricCompressor?: boolean;
  /** The maker's label charge, g. */
  labelChargeG?: number;
  /** What was recovered from the system and weighed, g. */
  foundChargeG?: number;
  /** What was charged back after the repair, g. */
  chargedG?: number;
  ambientC?: number;
  /** Centre-vent temperature during the running test, °C. */
  ventC?: number;
  /** Vacuum hold after evacuation: minutes held and whether it passed. */
  holdMinutes?: number;
  holdPassed?: boolean;
  oilAddedMl?: number;
}
