import { isServiceRefrigerant } from "@/lib/refrigerants/catalog";
import type { RepairId } from "@/lib/repairs/catalog";
import { isExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { OwnerFacts } from "./facts";
import type { OwnerUnits } from "./units";

/** The service record's values the owner's wording uses (internal units; null when not entered). */
export interface ServiceRecordFacts {
  labelChargeG: number | null;
  recoveredChargeG: number | null;
  chargedG: number | null;
  holdMinutes: number | null;
  holdPassed: boolean | null;
  oilAddedMl: number | null;
  partsReplaced: readonly { part: string }[];
}

const num = (v: unknown): number | undefined => (typeof v === "number" && Number.isFinite(v) ? v : undefined);
const obj = (v: unknown): Record<string, unknown> =>
  v !== null && typeof v === "object" && !Array.isArray(v) ? (v as Record<string, unknown>) : {};

/**
 * Facts for the owner's wording from the interview's stored record (`{ answers: {...} }`) and the
 * service record, which wins where both hold a value. Unknown shapes give empty facts, never a throw.
 */
export function ownerFactsFromCase({
  units,
  answersRecord,
  serviceRecord,
}: {
  units: OwnerUnits;
  answersRecord: unknown;
  serviceRecord: ServiceRecordFacts | null;
}): OwnerFacts {
  const answers = obj(obj(answersRecord).answers);
  const system = obj(answers.system);
  const conditions = obj(answers.conditions);
  const running = obj(answers.running);
  const audit = obj(answers.chargeAudit);
  const refrigerant = system.refrigerant;
  const device = system.expansionDevice;
  const sr = serviceRecord;
  const facts: OwnerFacts = {
    units,
    refrigerant: isServiceRefrigerant(refrigerant) ? refrigerant : undefined,
    expansionDevice: isExpansionDevice(device) ? device : undefined,
    electricCompressor: system.compressorType === "electric" || system.electricCompressor === true,
    labelChargeG: num(sr?.labelChargeG) ?? num(system.labelChargeG),
    foundChargeG:
      num(sr?.recoveredChargeG) ?? (audit.recovered === true ? num(audit.recoveredChargeG) : undefined),
    chargedG: num(sr?.chargedG),
    ambientC: num(conditions.ambientC),
    ventC: num(running.ventC),
    holdMinutes: num(sr?.holdMinutes),
    holdPassed: sr?.holdPassed ?? undefined,
    oilAddedMl: num(sr?.oilAddedMl),
  };
  return Object.fromEntries(Object.entries(facts).filter(([, v]) => v !== undefined)) as OwnerFacts;
}

const PART_REPAIRS: Record<string, RepairId> = {
  compressor: "replace_compressor",
  condenser: "replace_condenser",
  evaporator: "replace_evaporator",
  accumulator: "replace_drier",
  receiver_drier: "replace_drier",
  hose: "replace_hose",
};

/** What the service record shows was done, as catalogue repairs (parts first, then the recharge). */
export function repairsDoneFromRecord(record: ServiceRecordFacts | null): RepairId[] {
  if (!record) return [];
  const done = new Set<RepairId>();
  for (const { part } of record.partsReplaced) {
    const repair = PART_REPAIRS[part];
    if (repair) done.add(repair);
  }
  if (record.chargedG !== null && record.chargedG > 0) done.add("recover_evacuate_recharge");
  return [...done];
}
