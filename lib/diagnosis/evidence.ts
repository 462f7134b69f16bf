import { chargeDeviationVerdict, type ChargeDeviationGrade } from "@/lib/service/charge-verdict";
import { wetBulbC } from "@/lib/psychro";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { addRunningEvidence } from "./evidence-running";
import { addClutchEvidence, CLUTCH_SYMPTOMS } from "./evidence-clutch";
import { addStaticEvidence } from "./evidence-static";
import type { Extraction } from "./evidence-types";
import type { DiagnosisInput } from "./schema";
import { grams, percent, tempC } from "./quantities";
import { AIR_PCT, PURITY_PASS_PCT, VENT_C } from "./grading";
import type { ReadingObservationId } from "./observations";

/** Turn readings into graded observations, each with a message carrying its numbers as quantities. */
export function extractEvidence(input: DiagnosisInput): Extraction {
  const barometricKpa = standardBarometricKpa(input.altitudeM ?? 0);
  const out: Extraction = {
    observations: [],
    notes: [],
    computed: { barometricKpa },
    observedGroups: new Set(),
  };
  const symptoms = new Set(input.symptoms ?? []);

  const device = input.expansionDevice === "txv" ? "device:txv" : "device:orifice_tube";
  out.observations.push({ id: device, message: { key: device } });

  const refrigerantContaminated =
    addIdentifierEvidence(input, out) || symptoms.has("identifier_flags_hydrocarbon");
  if (refrigerantContaminated) {
    out.notes.push({ key: "note:mixed_skips_pt" });
  } else {
    addStaticEvidence(input, barometricKpa, out);
    addRunningEvidence(input, barometricKpa, out);
  }
  if (input.refrigerant === "R-744") {
    out.notes.push({ key: "note:r744_limited" });
  }
  addClutchEvidence(input, barometricKpa, out);
  addChargeEvidence(input, out);
  addVentEvidence(input, out);
  for (const symptom of symptoms) {
    if (CLUTCH_SYMPTOMS.has(symptom)) continue;
    const id = `symptom:${symptom}` as const;
    out.observations.push({ id, message: { key: id } });
  }
  return out;
}

/** Returns true when the refrigerant failed identification. */
function addIdentifierEvidence(input: DiagnosisInput, out: Extraction): boolean {
  let failed = false;
  const passMark = percent(PURITY_PASS_PCT);
  if (input.identifierPurityPct !== undefined) {
    out.observedGroups.add("purity");
    failed = input.identifierPurityPct < PURITY_PASS_PCT;
    const id = failed ? "purity:fail" : "purity:pass";
    // Most identifiers cannot see sealant: a pass says nothing once sealant has been found (common practice).
    // Stryker disable next-line ArrayDeclaration: equivalent, any other default still has no "sealant_found"
    const sealant = !failed && (input.symptoms ?? []).includes("sealant_found");
    out.observations.push({
      id,
      ...(sealant ? { strength: 0 } : {}),
      message: { key: id, values: { purity: percent(input.identifierPurityPct), passMark } },
    });
    if (sealant) out.notes.push({ key: "note:identifier_blind_to_sealant" });
  }
  if (input.identifierAirPct !== undefined) {
    out.observedGroups.add("air");
    const airPct = input.identifierAirPct;
    const id = airPct < AIR_PCT.some ? "air:none" : airPct < AIR_PCT.high ? "air:some" : "air:high";
    out.observations.push({ id, message: { key: id, values: { air: percent(airPct) } } });
  }
  return failed;
}

const CHARGE_OBSERVATION: Record<ChargeDeviationGrade, ReadingObservationId> = {
  empty: "charge:empty",
  very_short: "charge:very_low",
  short: "charge:low",
  possible_slow_leak: "charge:slightly_low",
  within: "charge:ok",
  over: "charge:high",
  well_over: "charge:very_high",
};

function addChargeEvidence(input: DiagnosisInput, out: Extraction): void {
  if (input.labelChargeG === undefined || input.recoveredChargeG === undefined) return;
  // The service record's verdict: one rule for both.
  const { deltaG, deltaPct, grade } = chargeDeviationVerdict({
    labelChargeG: input.labelChargeG,
    recoveredChargeG: input.recoveredChargeG,
    refrigerant: input.refrigerant,
  });
  out.computed.chargeDeltaG = deltaG;
  out.computed.chargeDeltaPct = deltaPct;
  out.observedGroups.add("charge");
  const values = {
    recovered: grams(input.recoveredChargeG),
    label: grams(input.labelChargeG),
    short: grams(-deltaG),
    shortPct: percent(Math.round(-deltaPct), 0),
    over: grams(deltaG),
    overPct: percent(Math.round(deltaPct), 0),
    deltaPct: percent(Math.round(deltaPct), 0),
  };
  const id = CHARGE_OBSERVATION[grade];
  out.observations.push({ id, message: { key: id, values } });
}

/** The coldest a working system's centre vent should read for this air: rises with the wet-bulb temperature. */
export function ventColdLimitC(
  input: Pick<DiagnosisInput, "ambientC" | "relativeHumidityPct" | "altitudeM">,
): {
  coldMaxC: number;
  wetBulbC: number | null;
} {
  const relativeHumidityPct = Math.min(
    100,
    Math.max(1, input.relativeHumidityPct ?? VENT_C.unknownHumidityPct),
  );
  let wetBulb: number | null = null;
  try {
    wetBulb = wetBulbC({
      dryBulbC: input.ambientC,
      relativeHumidityPct,
      pressureKpa: standardBarometricKpa(input.altitudeM ?? 0),
    });
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
  }
  // Stryker disable next-line ConditionalExpression: equivalent, a null wet bulb also gives max(0, −15) × 0.4 = 0
  const riseK = wetBulb === null ? 0 : Math.max(0, wetBulb - VENT_C.wetBulbRefC) * VENT_C.riseKPerKWetBulb;
  return { coldMaxC: VENT_C.coldBaseC + riseK, wetBulbC: wetBulb };
}

function addVentEvidence(input: DiagnosisInput, out: Extraction): void {
  if (input.ventC === undefined) return;
  out.observedGroups.add("vent");
  const { coldMaxC, wetBulbC: wetBulb } = ventColdLimitC(input);
  out.computed.ventColdMaxC = coldMaxC;
  if (wetBulb !== null) out.computed.wetBulbC = wetBulb;
  const warmMinC = coldMaxC + VENT_C.warmAboveColdK;
  const id =
    input.ventC < VENT_C.freezing
      ? "vent:freezing"
      : input.ventC <= coldMaxC
        ? "vent:cold"
        : input.ventC < warmMinC
          ? "vent:cool"
          : "vent:warm";
  out.observations.push({
    id,
    message: {
      key: id,
      values: {
        vent: tempC(input.ventC),
        ambient: tempC(input.ambientC),
        coldMax: tempC(coldMaxC),
        ...(input.relativeHumidityPct === undefined
          ? {}
          : { humidity: percent(input.relativeHumidityPct, 0) }),
      },
    },
  });
}
