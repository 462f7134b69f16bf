import { PURITY_PASS_PCT } from "@/lib/service/identifier";
import { quantityMarker } from "@/lib/units/quantity";

/*
 * The one catalogue of safety and service cautions. The interview, the service record, the ledger and
 * the findings screen pick cautions from it by id; each has one id spelling, one level, one text and the
 * source it rests on (a standard, a regulation, a government manual, `common practice` or `from memory`).
 * Which cautions a screen shows is decided beside that screen (lib/interview/cautions.ts,
 * lib/service/cautions.ts); what a caution says is decided here. The wording is our own.
 */

/**
 * - danger: can kill or maim at once (high voltage, very high pressure, fire or explosion);
 * - warning: can injure someone, or ruin a part or the shop's equipment;
 * - notice: what the law, good practice or the record asks. The interview folds notices away, so a
 *   phone at the vehicle shows the cautions that can hurt first.
 */
export const CAUTION_LEVELS = ["danger", "warning", "notice"] as const;
export type CautionLevel = (typeof CAUTION_LEVELS)[number];

/** How a level is named on screen, beside its own mark: never as a prefix in the caution's text. */
export const CAUTION_LEVEL_LABELS: Readonly<Record<CautionLevel, string>> = {
  danger: "Danger",
  warning: "Warning",
  notice: "Note",
};

interface CautionEntry {
  level: CautionLevel;
  /** a few words, read first */
  title: string;
  text: string;
  source: string;
  /**
   * The wording while the fault is only the findings' leading suspect, not yet confirmed: a repair the
   * findings name is a condition ("if … is confirmed"), never an order.
   */
  ifSuspected?: string;
}

const ENTRIES = {
  eye_and_skin: {
    level: "warning",
    title: "Glasses and gloves on",
    text: "Liquid refrigerant freezes skin and eyes on contact. Wear safety glasses and gloves whenever you connect hoses or open a line or port, even when the gauges read empty. If it touches you, flush with lukewarm water for 15 minutes and get medical help.",
    source: "US Army TM 5-2420-230-24-1 warnings; the 15-minute flush is common practice",
  },
  system_pressure: {
    level: "warning",
    title: "Under pressure with the engine off too",
    text: "The system holds pressure even with the engine off. Use hoses and couplers rated for this refrigerant, and open no line until the charge has been recovered.",
    source: "common practice",
  },
  never_vent: {
    level: "notice",
    title: "Certified hands, no venting",
    text: "Never release refrigerant to the air: recover it with certified equipment. Only a certified technician recovers or charges refrigerant.",
    source:
      "US Clean Air Act §608(c) and 40 CFR 82.154(a) (venting prohibition); 40 CFR 82.34 (certified technicians, approved equipment); EU Regulation (EC) No 307/2008; EU F-gas Regulation (EU) 517/2014 Art. 3 (from memory; now Regulation (EU) 2024/573)",
  },
  flammable_r1234yf: {
    level: "warning",
    title: "R-1234yf is flammable",
    text: "R-1234yf is mildly flammable (ASHRAE 34 class A2L). No flames, sparks or smoking near the vehicle; ventilate the bay; use only recovery and charging equipment certified for R-1234yf, and never put R-1234yf and R-134a through the same hoses unless the machine is certified for both. Never mix it with or convert it to another refrigerant.",
    source:
      "ASHRAE Standard 34 safety class A2L; SAE J2843 and SAE J3030 equipment (required by a US EPA rule of January 2021, from memory); SAE J639",
  },
  r744_pressure: {
    level: "danger",
    title: "R-744 runs at very high pressure",
    // Said in each reader's units by the list that shows it: the numbers are quantity markers.
    text: `R-744 (CO₂) systems stand at about ${quantityMarker({ kind: "pressure_abs", value: 6430, decimals: 0 })} at ${quantityMarker({ kind: "temperature", value: 25, decimals: 0 })} and run far higher. Use only gauges, hoses and equipment rated for R-744, and follow the vehicle maker's procedure for releasing the charge.`,
    source:
      "CO₂ saturation pressure 6.43 MPa at 25 °C (Span & Wagner 1996 equation of state); SAE J639 (R-744 systems); from memory for the rest",
  },
  co2_asphyxiation: {
    level: "warning",
    title: "CO₂ can suffocate",
    text: "CO₂ is heavier than air and gathers in pits and closed spaces; a large release can suffocate. Ventilate, and keep out of low spaces while the charge is released.",
    source: "common practice",
  },
  high_voltage_compressor: {
    level: "danger",
    title: "High-voltage compressor",
    text: "This compressor runs on the traction battery, and its orange cables carry high voltage. Make the high-voltage system safe by the maker's isolation procedure before touching it or its cabling, and only if you are trained and equipped to do so.",
    source: "the vehicle maker's high-voltage safety procedure; common practice",
  },
  dielectric_oil: {
    level: "danger",
    title: "Non-conductive oil only",
    text: "Electric compressors need the maker's non-conductive (dielectric) oil. A little ordinary PAG oil can break down the motor's insulation and leave the compressor case live. Use equipment that injects no oil, or flush it first.",
    source:
      "SAE J2788H (no oil injection for electric-compressor vehicles, from memory); about 1 % PAG contamination can compromise the insulation (from memory); the vehicle maker's oil specification",
  },
  engine_running: {
    level: "warning",
    title: "Engine running",
    text: "Keep hands, hoses and sleeves clear of the fan and belts. An electric fan can start on its own, even with the engine off.",
    source: "common practice",
  },
  electric_never_without_charge: {
    level: "danger",
    title: "Never energise without charge",
    text: "Electric compressor: never energise it without a liquid charge or while the system is in vacuum, and after service follow the maker's insulation (isolation) check before handing the vehicle back.",
    source: "the vehicle maker's service procedure; from memory",
  },
  sealant_in_system: {
    level: "warning",
    title: "Sealant in the system",
    text: "Keep a system with sealant in it out of the shop's recovery machine and stock: recover with dedicated equipment or into a separate, labelled cylinder, and tell the owner in writing.",
    source: "common practice",
  },
  head_pressure_high: {
    level: "warning",
    title: "High side near the cut-out",
    text: "Keep hands and hoses clear of belts and fans, and stop the test if the pressure keeps climbing.",
    source: "common practice",
  },
  empty_system: {
    level: "warning",
    title: "Do not run the compressor",
    text: "The system is empty or nearly so. The compressor's oil travels with the refrigerant: running it now can ruin it. Find and repair the leak before any running test.",
    source: "common practice",
  },
  leak_test_gas: {
    level: "danger",
    title: "Never pressurise with air or oxygen",
    text: "Pressure- or leak-test only with dry nitrogen or an approved tracer gas, through a regulator, at no more than the pressure the maker allows. Compressed air or oxygen with refrigerant and oil can ignite.",
    source: "common practice; SAE J2970 (tracer-gas detectors); SAE J2211 caution text (from memory)",
  },
  identify_before_recovery: {
    level: "warning",
    title: "Identify before recovering",
    text: `Run the refrigerant identifier before connecting any recovery machine. Below ${PURITY_PASS_PCT} % purity the charge must not go into the shop's machine: use dedicated equipment or a separate, labelled cylinder.`,
    source: `SAE J2099 (${PURITY_PASS_PCT} % purity threshold); SAE J2912 identifiers; SAE J2843 machines require an identifier (from memory)`,
  },
  contaminated_do_not_recover: {
    level: "danger",
    title: "Keep this refrigerant out of the shop's recovery machine",
    text: `The identifier reads below ${PURITY_PASS_PCT} % pure or flags hydrocarbon. Do not connect the shop's recovery machine: recover with equipment kept for contaminated refrigerant into a separate, labelled cylinder, send it for reclaim and tell the owner in writing. Treat it as possibly flammable.`,
    source: `SAE J2099 (recycling only ≥ ${PURITY_PASS_PCT} % identified); SAE J2912 identifiers; SAE J2851 equipment for contaminated refrigerant`,
  },
  hydrocarbon_flammable: {
    level: "danger",
    title: "Hydrocarbon in the system",
    text: "The identifier found hydrocarbon: treat the system as flammable, keep every ignition source away and ventilate.",
    source: "SAE J2912 (identifiers report hydrocarbons); common practice",
  },
  recover_slowly_accumulator: {
    level: "notice",
    title: "Recover slowly",
    text: "An orifice-tube system holds oil in its accumulator. Recover at a moderate rate so the oil does not foam and get pulled into the machine with the refrigerant; expect it to take longer, and measure the oil that does come out.",
    source:
      "common practice; SAE J2762 notes accumulator systems hold more oil and refrigerant and recover more slowly",
  },
  recover_again_after_rise: {
    level: "notice",
    title: "Watch for the pressure to rise",
    text: "When the machine stops, wait about 5 minutes. If the pressure climbs back above zero, recover again until it stays at or below zero.",
    source: "US Army TM 5-3810-307-24-1-2 ch. 9",
  },
  recovery_cylinder_fill: {
    level: "warning",
    title: "No more than 80 % full",
    text: "Fill a recovery cylinder to no more than 80 % of its capacity: liquid expands as it warms and an overfilled cylinder can burst.",
    source: "common practice",
  },
  charge_by_weight: {
    level: "warning",
    title: "Charge by weight",
    text: "Charge by weight to the label figure, as liquid through certified equipment: pressures are only a guide. Never pour liquid into the compressor's suction side by hand.",
    source: "SAE J2788 (recharge from the liquid phase); US Army TM 5-2420-230-24-1",
    ifSuspected:
      "If the charge is to be corrected, charge by weight to the label figure, as liquid through certified equipment: pressures are only a guide.",
  },
  repair_before_refill: {
    level: "notice",
    title: "Repair before refilling",
    text: "Do not refill a system that has leaked until the leak is repaired: topping it off brings the fault back, and in the EU refilling after an abnormal leak before the repair is forbidden.",
    source: "Directive 2006/40/EC, Article 7",
    ifSuspected:
      "If a leak is confirmed, repair it before refilling: topping off a leaking system brings the fault back, and in the EU refilling after an abnormal leak before the repair is forbidden.",
  },
  moisture_and_acid: {
    level: "notice",
    title: "Moisture makes acid",
    text: "Moisture with PAG oil forms acid: replace the receiver-drier or accumulator and evacuate thoroughly.",
    source: "common practice",
    ifSuspected:
      "If moisture is confirmed: with PAG oil it forms acid, so replace the receiver-drier or accumulator and evacuate thoroughly.",
  },
  defer_to_procedure: {
    level: "notice",
    title: "Local rules and the maker's procedure come first",
    text: "These cautions are general reminders, not a procedure. The vehicle maker's service procedure, your local codes and regulations and certified practice take precedence, and only certified technicians may handle refrigerant.",
    source: "US EPA Section 609 (40 CFR 82.34, 82.40); EU Regulation (EC) No 307/2008; common practice",
  },
} as const satisfies Record<string, CautionEntry>;

export type CautionId = keyof typeof ENTRIES;

export interface Caution extends CautionEntry {
  id: CautionId;
}

export const CAUTION_IDS = Object.keys(ENTRIES) as readonly CautionId[];

export const CAUTIONS: Readonly<Record<CautionId, Caution>> = Object.fromEntries(
  CAUTION_IDS.map((id) => [id, Object.freeze({ id, ...ENTRIES[id] })]),
) as Record<CautionId, Caution>;

export function isCautionId(value: unknown): value is CautionId {
  return typeof value === "string" && Object.hasOwn(ENTRIES, value);
}

/**
 * A caution another module names by id with its own text (the findings engine's): the catalogue's entry,
 * so one caution reads the same everywhere; an id the catalogue lacks keeps its text, as a notice.
 */
export function cautionNamed(id: string, text: string): Pick<Caution, "level" | "text"> & { id: string } {
  return isCautionId(id) ? CAUTIONS[id] : { id, level: "notice", text };
}

/** The catalogue's cautions for these ids, in the order given. */
export function cautionsById(ids: readonly CautionId[]): Caution[] {
  return ids.map((id) => CAUTIONS[id]);
}
