import type { RefrigerantId } from "@/lib/refrigerants";

export type ServiceStep = "identify" | "recovery" | "oil" | "evacuation" | "recharge";
export type ExpansionDevice = "orifice_tube" | "txv";

export interface ServiceCaution {
  id: string;
  /** steps the caution is shown with; empty = every step */
  steps: readonly ServiceStep[];
  severity: "danger" | "warning" | "notice";
  text: string;
  source: string;
  appliesTo?: {
    refrigerants?: readonly RefrigerantId[];
    expansionDevices?: readonly ExpansionDevice[];
    electricCompressor?: true;
  };
}

const HFC_HFO_CFC: readonly RefrigerantId[] = ["R-134a", "R-1234yf", "R-12"];

/** Shown in this order; the deferral to local rules is always last. */
export const SERVICE_CAUTIONS: readonly ServiceCaution[] = [
  {
    id: "eye-and-skin",
    steps: [],
    severity: "danger",
    text: "Wear safety glasses and gloves whenever a line or port is opened, even when the gauges read empty: liquid refrigerant freezes skin and eyes on contact. If it touches you, flush with lukewarm water for 15 minutes and get medical help.",
    source: "US Army TM 5-2420-230-24-1 warnings; 15-minute flush common practice",
  },
  {
    id: "identify-before-connecting",
    steps: ["identify", "recovery"],
    severity: "warning",
    text: "Identify the refrigerant before connecting a recovery machine. Below 98 % purity it must not go into the shop's machine: use dedicated equipment or a separate, labelled cylinder.",
    source:
      "SAE J2099 (98 % purity threshold); SAE J2912 identifiers; SAE J2843 requires identification (from memory)",
  },
  {
    id: "recover-slowly-accumulator",
    steps: ["recovery"],
    severity: "warning",
    text: "Recover slowly from an orifice-tube system: a sudden pressure drop foams the oil in the accumulator and pulls liquid and oil into the machine. Expect recovery to take longer.",
    source:
      "common practice; SAE J2762 notes accumulator systems hold more oil and refrigerant and recover more slowly",
    appliesTo: { expansionDevices: ["orifice_tube"] },
  },
  {
    id: "recover-again-after-rise",
    steps: ["recovery"],
    severity: "notice",
    text: "When the machine stops, wait about 5 minutes. If the pressure climbs back above zero, recover again until it stays at or below zero.",
    source: "US Army TM 5-3810-307-24-1-2 ch. 9",
  },
  {
    id: "never-vent",
    steps: ["recovery", "evacuation", "recharge"],
    severity: "danger",
    text: "Never release refrigerant to the air. Recover it with certified equipment; releasing it knowingly is against the law.",
    source:
      "US Clean Air Act §608(c), 40 CFR 82.154(a); EU F-gas Regulation (EU) 517/2014 Art. 3 (from memory; now Regulation (EU) 2024/573)",
    appliesTo: { refrigerants: HFC_HFO_CFC },
  },
  {
    id: "r744-high-pressure",
    steps: [],
    severity: "danger",
    text: "R-744 (CO₂) systems work at far higher pressures than R-134a systems. Use only gauges, hoses and equipment rated for R-744 and follow the maker's procedure for releasing the charge.",
    source: "SAE J639 (R-744 systems); pressures from memory",
    appliesTo: { refrigerants: ["R-744"] },
  },
  {
    id: "r1234yf-equipment-only",
    steps: ["recovery", "evacuation", "recharge"],
    severity: "danger",
    text: "R-1234yf is mildly flammable (A2L). Use only equipment certified for R-1234yf, keep flames and sparks away, ventilate the work area, and never put R-1234yf and R-134a through the same hoses unless the machine is certified for both.",
    source:
      "SAE J2843 and SAE J3030 (required by a US EPA rule of January 2021, from memory); ASHRAE 34 class A2L",
    appliesTo: { refrigerants: ["R-1234yf"] },
  },
  {
    id: "high-voltage-compressor",
    steps: [],
    severity: "danger",
    text: "Electric compressor: orange cables carry high voltage. Make the high-voltage system safe by the maker's procedure before any work, and only if you are trained and equipped to do so.",
    source: "common practice; vehicle maker's high-voltage procedure",
    appliesTo: { electricCompressor: true },
  },
  {
    id: "dielectric-oil",
    steps: ["recovery", "oil", "recharge"],
    severity: "danger",
    text: "Electric compressor: use only the dielectric oil the maker specifies, through equipment that does not inject oil. A little PAG oil can break down the insulation and leave the compressor case live.",
    source: "SAE J2788H (from memory); about 1 % PAG contamination compromises insulation (from memory)",
    appliesTo: { electricCompressor: true },
  },
  {
    id: "recovery-cylinder-fill",
    steps: ["recovery"],
    severity: "warning",
    text: "Fill a recovery cylinder to no more than 80 % of its capacity: liquid expands as it warms and an overfilled cylinder can burst.",
    source: "common practice",
  },
  {
    id: "no-air-pressure-test",
    steps: ["evacuation"],
    severity: "danger",
    text: "Never pressure- or leak-test with compressed air or oxygen. Use dry nitrogen or an approved tracer gas through a regulator.",
    source: "SAE J2211 caution text (from memory)",
  },
  {
    id: "charge-liquid-by-weight",
    steps: ["recharge"],
    severity: "warning",
    text: "Charge by weight through the machine, as liquid, to the label figure. Never pour liquid into the compressor's suction side by hand.",
    source: "SAE J2788 (recharge from the liquid phase); US Army TM 5-2420-230-24-1",
  },
  {
    id: "no-refill-before-repair",
    steps: ["recharge"],
    severity: "warning",
    text: "Do not refill a system that has leaked until the leak is repaired. In the EU this is the law.",
    source: "Directive 2006/40/EC Art. 7",
  },
  {
    id: "local-rules-prevail",
    steps: [],
    severity: "notice",
    text: "These cautions are reminders, not a procedure. Local codes and laws, the vehicle maker's service procedure and certified practice come first, and only certified technicians may handle refrigerant.",
    source: "US EPA Section 609 (40 CFR 82.34, 82.40); EU Regulation (EC) 307/2008",
  },
];

export interface CautionContext {
  step?: ServiceStep;
  refrigerant?: RefrigerantId;
  expansionDevice?: ExpansionDevice;
  electricCompressor?: boolean;
}

function applies(caution: ServiceCaution, ctx: CautionContext): boolean {
  if (ctx.step && caution.steps.length > 0 && !caution.steps.includes(ctx.step)) return false;
  const only = caution.appliesTo;
  if (!only) return true;
  // An unknown refrigerant or expansion device keeps its cautions on screen (better once too
  // often than missed); high-voltage cautions need the compressor marked electric.
  if (only.refrigerants && ctx.refrigerant && !only.refrigerants.includes(ctx.refrigerant)) return false;
  if (only.expansionDevices && ctx.expansionDevice && !only.expansionDevices.includes(ctx.expansionDevice))
    return false;
  if (only.electricCompressor && ctx.electricCompressor !== true) return false;
  return true;
}

/** The cautions for a step (or the whole job), in display order, ending with the local-rules line. */
export function cautionsFor(ctx: CautionContext = {}): ServiceCaution[] {
  return SERVICE_CAUTIONS.filter((c) => applies(c, ctx));
}
