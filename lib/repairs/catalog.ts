import type { OwnerFacts } from "@/lib/owner/facts";
import { ownerMass } from "@/lib/owner/units";

// The one list of repairs a shop proposes to an owner and, later, records as done.
// Ids are stored in the database: add new ones, never rename or remove one.
export const REPAIR_IDS = [
  "recover_evacuate_recharge",
  "leak_repair",
  "replace_hose",
  "replace_condenser",
  "clean_condenser",
  "condenser_fan_repair",
  "replace_drier",
  "replace_orifice_tube",
  "replace_expansion_valve",
  "replace_evaporator",
  "replace_compressor",
  "compressor_clutch_repair",
  "cycling_control_repair",
  "replace_cabin_filter",
  "flush_system",
  "oil_correction",
  "contaminated_refrigerant_removal",
  "further_diagnosis",
] as const;

export type RepairId = (typeof REPAIR_IDS)[number];

export interface RepairEntry {
  id: RepairId;
  /** For the shop's screens, in the trade's words. */
  tradeLabel: string;
  /** For the owner: a short plain title. */
  ownerTitle: string;
  /** For the owner: what the work involves, filled from the case. */
  ownerInvolves: (facts: OwnerFacts) => string;
}

const labelAmount = (facts: OwnerFacts) =>
  facts.labelChargeG !== undefined
    ? `the ${ownerMass(facts.labelChargeG, facts.units)} the maker's label calls for`
    : "the amount on the maker's label";

export const REPAIR_CATALOG: Readonly<Record<RepairId, RepairEntry>> = {
  recover_evacuate_recharge: {
    id: "recover_evacuate_recharge",
    tradeLabel: "Recover, evacuate, vacuum hold and recharge by weight",
    ownerTitle: "Empty and refill the system",
    ownerInvolves: (facts) =>
      `We take out the old refrigerant with a machine that keeps it from escaping. We pump the system down to a vacuum and check that it holds. Then we weigh in ${labelAmount(facts)}.`,
  },
  leak_repair: {
    id: "leak_repair",
    tradeLabel: "Locate and repair the leak",
    ownerTitle: "Find and fix the leak",
    ownerInvolves: () =>
      "We find the leak with a detector, a safe test gas or dye. Then we fix or replace the part that leaks.",
  },
  replace_hose: {
    id: "replace_hose",
    tradeLabel: "Replace hose or line",
    ownerTitle: "Replace a hose or pipe",
    ownerInvolves: () => "We fit a new hose or pipe with new seals where the old one was worn or leaking.",
  },
  replace_condenser: {
    id: "replace_condenser",
    tradeLabel: "Replace condenser",
    ownerTitle: "Replace the condenser",
    ownerInvolves: () =>
      "We fit a new condenser at the front of the car. We add the right amount of oil for the new part.",
  },
  clean_condenser: {
    id: "clean_condenser",
    tradeLabel: "Clean condenser face and restore air seals",
    ownerTitle: "Clean the condenser",
    ownerInvolves: () =>
      "We clear leaves, bugs and dirt from the condenser. We refit the seals that guide air through it.",
  },
  condenser_fan_repair: {
    id: "condenser_fan_repair",
    tradeLabel: "Repair condenser fan, relay or circuit",
    ownerTitle: "Fix the cooling fan",
    ownerInvolves: () =>
      "We test the fan, its fuse, relay and wires. Then we replace the part that has failed.",
  },
  replace_drier: {
    id: "replace_drier",
    tradeLabel: "Replace receiver-drier or accumulator (desiccant)",
    ownerTitle: "Replace the drier",
    ownerInvolves: () => "We fit a new drier. Its fresh beads soak up any water that gets into the loop.",
  },
  replace_orifice_tube: {
    id: "replace_orifice_tube",
    tradeLabel: "Replace orifice tube",
    ownerTitle: "Replace the orifice tube",
    ownerInvolves: () =>
      "We take out the old orifice tube and look at what is caught in its screen. Then we fit a new one.",
  },
  replace_expansion_valve: {
    id: "replace_expansion_valve",
    tradeLabel: "Replace expansion valve (TXV)",
    ownerTitle: "Replace the expansion valve",
    ownerInvolves: () => "We fit a new expansion valve with new seals.",
  },
  replace_evaporator: {
    id: "replace_evaporator",
    tradeLabel: "Replace evaporator",
    ownerTitle: "Replace the evaporator",
    ownerInvolves: () =>
      "We take apart part of the dash to reach the evaporator and fit a new one. This is a long job.",
  },
  replace_compressor: {
    id: "replace_compressor",
    tradeLabel: "Replace compressor",
    ownerTitle: "Replace the compressor",
    ownerInvolves: (facts) =>
      `We fit a new compressor with the right oil${facts.electricCompressor ? ". Your car's compressor runs on high voltage, so we first shut that power off by the maker's steps" : ""}. We clean out the rest of the system so that old dirt does not harm the new part.`,
  },
  compressor_clutch_repair: {
    id: "compressor_clutch_repair",
    tradeLabel: "Repair compressor clutch, air gap or drive belt",
    ownerTitle: "Fix the compressor drive",
    ownerInvolves: () =>
      "We set or replace the clutch that turns the compressor on and off. We check the belt that drives it.",
  },
  cycling_control_repair: {
    id: "cycling_control_repair",
    tradeLabel: "Replace cycling switch or evaporator temperature sensor",
    ownerTitle: "Replace the switch that stops freezing",
    ownerInvolves: () =>
      "We replace the cycling switch or sensor. It turns the compressor off before the evaporator freezes.",
  },
  replace_cabin_filter: {
    id: "replace_cabin_filter",
    tradeLabel: "Replace cabin air filter",
    ownerTitle: "Replace the cabin air filter",
    ownerInvolves: () => "We fit a clean filter so the fan can push air through freely.",
  },
  flush_system: {
    id: "flush_system",
    tradeLabel: "Flush the system and replace the filtering parts",
    ownerTitle: "Clean out the system",
    ownerInvolves: () =>
      "We wash dirt and old oil out of the pipes and parts. We replace the parts that trap dirt.",
  },
  oil_correction: {
    id: "oil_correction",
    tradeLabel: "Restore the correct compressor oil type and amount",
    ownerTitle: "Put in the right oil",
    ownerInvolves: () =>
      "We take out the wrong or spent oil and put in the oil the maker asks for, in the right amount.",
  },
  contaminated_refrigerant_removal: {
    id: "contaminated_refrigerant_removal",
    tradeLabel: "Recover contaminated refrigerant into a dedicated cylinder for disposal",
    ownerTitle: "Remove the wrong refrigerant",
    ownerInvolves: (facts) =>
      `We draw the mixed gas into a tank kept just for waste. It is sent off to be destroyed. Then we refill with clean refrigerant, ${labelAmount(facts)}.`,
  },
  further_diagnosis: {
    id: "further_diagnosis",
    tradeLabel: "Further diagnosis",
    ownerTitle: "More tests",
    ownerInvolves: () => "We need more time with the car to be sure of the cause before we replace any part.",
  },
};

/** The catalogue in its fixed order, for pick lists. */
export const REPAIRS: readonly RepairEntry[] = REPAIR_IDS.map((id) => REPAIR_CATALOG[id]);

export function isRepairId(value: unknown): value is RepairId {
  return typeof value === "string" && (REPAIR_IDS as readonly string[]).includes(value);
}
