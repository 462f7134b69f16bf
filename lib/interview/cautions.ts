import type { InterviewAnswers } from "./answers";
import { pressureLeft, refrigerantContaminated, systemLooksEmpty, type ShopSettings } from "./branches";
import type { StepId } from "./steps";

export type CautionLevel = "danger" | "warning" | "notice";

export interface Caution {
  id: string;
  level: CautionLevel;
  title: string;
  text: string;
  /** Where the caution comes from. */
  basis: string;
}

const first: Caution = {
  id: "eye_and_skin",
  level: "warning",
  title: "Glasses and gloves on",
  text: "Liquid refrigerant freezes skin and eyes on contact. Wear safety glasses and gloves whenever you connect hoses or open a line, even when the gauges read empty.",
  basis: "US Army TM 5-2420-230-24-1 warnings; common practice",
};

const last: Caution = {
  id: "defer_to_procedure",
  level: "notice",
  title: "Local rules and the maker's procedure come first",
  text: "These cautions are general. The vehicle maker's service procedure, your local codes and regulations and certified practice take precedence over this interview.",
  basis: "common practice",
};

const byId = {
  neverVent: {
    id: "never_vent",
    level: "notice",
    title: "Certified hands, no venting",
    text: "Only a certified technician recovers or charges refrigerant, with approved equipment. Never vent it.",
    basis:
      "40 CFR 82.34 (certified technicians, approved equipment); 40 CFR 82.154(a) (venting prohibition); EU Regulation 307/2008",
  },
  flammable: {
    id: "flammable_r1234yf",
    level: "warning",
    title: "R-1234yf is flammable",
    text: "R-1234yf is mildly flammable (ASHRAE class A2L). No flames, sparks or smoking near the vehicle; work in a ventilated bay; use recovery and charging equipment certified for R-1234yf. Never mix it with or convert it to another refrigerant.",
    basis: "ASHRAE Standard 34 safety class A2L; SAE J2843 / J3030 equipment; SAE J639",
  },
  co2: {
    id: "r744_pressure",
    level: "danger",
    title: "R-744 runs at very high pressure",
    text: "R-744 (CO₂) systems stand at about 6 MPa at 25 °C and run far higher. Use only gauges, hoses and equipment rated for R-744, and follow the vehicle maker's procedure. CO₂ gathers in pits and closed spaces and can suffocate.",
    basis:
      "CO₂ saturation pressure 6.43 MPa at 25 °C (Span & Wagner 1996 equation of state); from memory for the rest",
  },
  highVoltage: {
    id: "high_voltage_compressor",
    level: "danger",
    title: "High-voltage compressor",
    text: "This compressor runs on the traction battery. Follow the maker's high-voltage isolation procedure before touching it or its orange cabling; only qualified staff may do so.",
    basis: "vehicle maker's high-voltage safety procedure; common practice",
  },
  dielectricOil: {
    id: "dielectric_oil",
    level: "warning",
    title: "Non-conductive oil only",
    text: "Electric compressors need the maker's non-conductive (dielectric) oil. A small amount of ordinary PAG oil can break down the motor's insulation and make the case live. Use equipment that injects no oil, or flush it first.",
    basis:
      "from memory (about 1 % PAG contamination can compromise the insulation); the vehicle maker's oil specification",
  },
  recoverSlowly: {
    id: "recover_slowly_accumulator",
    level: "notice",
    title: "Recover slowly",
    text: "An orifice-tube system holds oil in the accumulator. Recover at a moderate rate so the oil does not foam and get pulled out with the refrigerant, and measure what does come out.",
    basis: "common practice",
  },
  noChargeNoRun: {
    id: "empty_system",
    level: "warning",
    title: "Do not run the compressor",
    text: "The system is empty or nearly so. The compressor's oil travels with the refrigerant: running it now can ruin it. Find the leak before any running test.",
    basis: "common practice",
  },
  noTopOff: {
    id: "repair_before_refill",
    level: "notice",
    title: "Repair before refilling",
    text: "Do not top off a leaking system. In the EU, refilling after an abnormal leak before the repair is forbidden.",
    basis: "Directive 2006/40/EC, Article 7",
  },
  leakTestGas: {
    id: "leak_test_gas",
    level: "warning",
    title: "Never pressurise with air or oxygen",
    text: "To pressure-test for leaks use dry nitrogen or an approved tracer gas, at no more than the pressure the maker allows. Compressed air or oxygen with refrigerant and oil can ignite.",
    basis: "common practice; SAE J2970 (tracer-gas detectors)",
  },
  hydrocarbon: {
    id: "hydrocarbon_flammable",
    level: "danger",
    title: "Hydrocarbon in the system",
    text: "The identifier found hydrocarbon: treat the system as flammable, keep every ignition source away and ventilate.",
    basis: "SAE J2912 (identifiers report hydrocarbons); common practice",
  },
  contaminated: {
    id: "contaminated_do_not_recover",
    level: "danger",
    title: "Keep this refrigerant out of the shop's recovery machine",
    text: "The identifier reads below 98 % pure or flags hydrocarbon. Do not connect the shop's recovery machine: recover with equipment kept for contaminated refrigerant into a separate, labelled cylinder and send it for reclaim. Treat it as possibly flammable.",
    basis:
      "SAE J2099 (recycling only ≥ 98 % identified), SAE J2912 identifiers, SAE J2851 equipment for contaminated refrigerant",
  },
  identifyFirst: {
    id: "identify_before_recovery",
    level: "warning",
    title: "Identify before recovering",
    text: "Run the refrigerant identifier before connecting any recovery machine, so a contaminated charge does not spoil the shop's refrigerant.",
    basis: "common practice; SAE J2843 machines require an identifier (from memory)",
  },
  movingParts: {
    id: "engine_running",
    level: "warning",
    title: "Engine running",
    text: "Keep hands, hoses and sleeves clear of the fan and belts. An electric fan can start on its own, even with the engine off.",
    basis: "common practice",
  },
} satisfies Record<string, Caution>;

/**
 * The cautions in force. Ids match the findings engine's where the caution is the same, so a screen
 * showing both can merge them by id. The engine-running caution also depends on the step on screen.
 */
export function cautionsFor(
  answers: InterviewAnswers,
  options: { shop?: ShopSettings; step?: StepId } = {},
): Caution[] {
  const cautions: Caution[] = [first];
  const system = answers.system;
  // CO₂ release follows the maker's procedure: the US venting ban under Clean Air Act §608(c) exempts it (from memory).
  if (system?.refrigerant !== "R-744") cautions.push(byId.neverVent);
  if (system?.refrigerant === "R-1234yf") cautions.push(byId.flammable);
  if (system?.refrigerant === "R-744") cautions.push(byId.co2);
  if (system?.electricCompressor) cautions.push(byId.highVoltage, byId.dielectricOil);
  if (system?.expansionDevice === "orifice_tube") cautions.push(byId.recoverSlowly);

  const empty = systemLooksEmpty(answers, options.shop);
  if (empty) cautions.push(byId.noChargeNoRun, byId.noTopOff, byId.leakTestGas);
  else if (options.step === "running" || options.step === "behaviour") cautions.push(byId.movingParts);

  if (answers.identification?.hydrocarbonFlagged) cautions.push(byId.hydrocarbon);
  if (refrigerantContaminated(answers)) cautions.push(byId.contaminated);
  else if (answers.identification?.purityPct === undefined && (!empty || pressureLeft(answers))) {
    const recovering = answers.chargeAudit?.recovered === true;
    const atRecovery = options.step === "chargeAudit" || options.step === "recoveryHeld";
    if (recovering || atRecovery) cautions.push(byId.identifyFirst);
  }
  cautions.push(last);
  return cautions;
}
