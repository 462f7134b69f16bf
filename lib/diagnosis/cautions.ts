import type { CauseId } from "./causes";
import type { ObservationId } from "./observations";
import { REAL_SHARE } from "./grading";
import type { DiagnosisInput } from "./schema";

export type CautionId =
  | "eye_and_skin"
  | "never_vent"
  | "flammable_r1234yf"
  | "r744_pressure"
  | "high_voltage_compressor"
  | "electric_never_without_charge"
  | "contaminated_do_not_recover"
  | "hydrocarbon_flammable"
  | "sealant_found"
  | "head_pressure_high"
  | "empty_system"
  | "recover_slowly_accumulator"
  | "charge_by_weight"
  | "repair_before_refill"
  | "moisture_and_acid"
  | "defer_to_procedure";

export interface Caution {
  id: CautionId;
  text: string;
}

export const CAUTION_TEXT: Record<CautionId, string> = {
  eye_and_skin:
    "Wear safety glasses and gloves whenever lines or hoses are opened, even if the gauges read empty: liquid refrigerant freezes skin and eyes on contact.",
  never_vent:
    "Never vent refrigerant: recover it with certified equipment by a certified technician (US Clean Air Act Section 609; EU F-gas rules).",
  flammable_r1234yf:
    "R-1234yf is mildly flammable (ASHRAE A2L): keep sparks and flames away, ventilate the work area and use equipment certified for it (SAE J2843 or J3030).",
  r744_pressure:
    "R-744 (CO2) systems run at very high pressures: use only gauges, hoses and equipment rated for CO2, and ventilate, because released CO2 can displace the air in a closed space.",
  high_voltage_compressor:
    "High-voltage electric compressor: follow the maker's isolation procedure before touching it, use only the specified dielectric oil and equipment without oil injection, since wrong oil can make the compressor case live.",
  contaminated_do_not_recover:
    "Refrigerant failed identification: do not recover it into the shop's recovery machine or stock; use dedicated contaminated-refrigerant equipment (SAE J2851 type) or a separate labelled cylinder, and tell the owner in writing.",
  hydrocarbon_flammable:
    "Hydrocarbon detected: treat the system as flammable, keep ignition sources away and ventilate.",
  sealant_found:
    "Sealant in the system: keep it out of the shop's recovery machine and stock; recover with dedicated equipment or into a separate labelled cylinder, and tell the owner in writing.",
  head_pressure_high:
    "High side near the cut-out: keep hands and hoses clear of belts and fans, and stop the test if the pressure keeps climbing.",
  empty_system:
    "Do not run the compressor until the system is repaired and recharged by weight: without its liquid charge it runs short of oil, and a low-side leak pulls in air and moisture. Pressure-test only with dry nitrogen or an approved tracer gas, never compressed air or oxygen.",
  electric_never_without_charge:
    "Electric compressor: never energise it without a liquid charge or while the system is in vacuum, and after service follow the maker's insulation (isolation) check before handing the vehicle back.",
  recover_slowly_accumulator:
    "Recover slowly on orifice-tube/accumulator systems so oil is not pulled out; measure the oil removed and add the same amount of fresh, correct oil back.",
  charge_by_weight:
    "If the charge is to be corrected, charge by weight to the label specification through certified equipment; pressures are only a guide.",
  repair_before_refill:
    "If a leak is confirmed, repair it before refilling: topping off a leaking system brings it back (and in the EU it is not allowed after an abnormal leak).",
  moisture_and_acid:
    "If moisture is confirmed: with PAG oil it forms acid, so replace the receiver-drier or accumulator and evacuate thoroughly.",
  defer_to_procedure:
    "These cautions are general: the vehicle maker's service procedure, your local codes and regulations, and certified practice take precedence.",
};

/**
 * The cautions for this case. Safety cautions follow the system and the state; repair cautions follow the
 * leading cause or one holding a real share (REAL_SHARE), never a cause trailing at a few percent, and are
 * worded as conditions.
 */
export function collectCautions(a: {
  input: DiagnosisInput;
  observations: ReadonlySet<ObservationId>;
  ranking: readonly { cause: CauseId; share: number }[];
  mixed: boolean;
  doNotRun: boolean;
}): Caution[] {
  const { input, observations, ranking, mixed, doNotRun } = a;
  const leader = ranking[0]?.cause;
  const real = (cause: CauseId) =>
    !mixed && (cause === leader || (ranking.find((r) => r.cause === cause)?.share ?? 0) >= REAL_SHARE);
  const ids: CautionId[] = ["eye_and_skin"];
  // CO2 release is governed by the maker's procedure rather than the HFC venting bans.
  if (input.refrigerant !== "R-744") ids.push("never_vent");
  if (input.refrigerant === "R-1234yf") ids.push("flammable_r1234yf");
  if (input.refrigerant === "R-744") ids.push("r744_pressure");
  if (input.compressorType === "electric")
    ids.push("high_voltage_compressor", "electric_never_without_charge");
  if (mixed) ids.push("contaminated_do_not_recover");
  if (observations.has("symptom:identifier_flags_hydrocarbon")) ids.push("hydrocarbon_flammable");
  if (observations.has("symptom:sealant_found")) ids.push("sealant_found");
  if (observations.has("high_side:very_high") || observations.has("symptom:high_pressure_cutout"))
    ids.push("head_pressure_high");
  if (doNotRun) ids.push("empty_system");
  if (input.expansionDevice === "orifice_tube") ids.push("recover_slowly_accumulator");
  if (real("overcharge") || real("undercharge") || doNotRun) ids.push("charge_by_weight");
  if (real("undercharge")) ids.push("repair_before_refill");
  if (real("moisture")) ids.push("moisture_and_acid");
  ids.push("defer_to_procedure");
  return ids.map((id) => ({ id, text: CAUTION_TEXT[id] }));
}
