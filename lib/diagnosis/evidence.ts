import { chargeDeviation } from "@/lib/refrigerants";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { addRunningEvidence } from "./evidence-running";
import { addStaticEvidence } from "./evidence-static";
import type { Extraction } from "./evidence-types";
import { degC, grams, pct } from "./format";
import type { DiagnosisInput } from "./schema";
import { SYMPTOM_LABELS, type SymptomId } from "./symptoms";
import { AIR_PCT, CHARGE_PCT, PURITY_PASS_PCT, VENT_C } from "./grading";

/** Turn readings into graded observations, each with a sentence carrying its numbers. */
export function extractEvidence(input: DiagnosisInput): Extraction {
  const barometricKpa = standardBarometricKpa(input.altitudeM ?? 0);
  const out: Extraction = {
    observations: [],
    notes: [],
    computed: { barometricKpa },
    observedGroups: new Set(),
    confidenceFactor: 1,
  };
  const symptoms = new Set(input.symptoms ?? []);

  out.observations.push(
    input.expansionDevice === "txv"
      ? {
          id: "device:txv",
          text: "Expansion-valve (TXV) system with receiver-drier: the valve, not a cycling switch, keeps the evaporator from flooding.",
        }
      : {
          id: "device:orifice_tube",
          text: "Orifice-tube system with accumulator: a fixed orifice cannot stick open, and the cycling switch alone guards against icing.",
        },
  );

  const mixed = addIdentifierEvidence(input, out) || symptoms.has("identifier_flags_hydrocarbon");
  if (mixed) {
    out.notes.push(
      "Pressure–temperature checks were skipped: the saturation tables hold only for pure refrigerant.",
    );
    out.confidenceFactor *= 0.6;
  } else {
    addStaticEvidence(input, barometricKpa, out);
    addRunningEvidence(input, barometricKpa, out);
  }
  if (input.refrigerant === "R-744") {
    out.notes.push(
      "R-744 (CO2) systems are covered only as far as the saturation tables go; follow the vehicle maker's figures.",
    );
    out.confidenceFactor *= 0.7;
  }
  addChargeEvidence(input, out);
  addVentEvidence(input, out);
  for (const symptom of symptoms)
    out.observations.push({ id: `symptom:${symptom}`, text: symptomSentence(symptom) });
  return out;
}

function symptomSentence(symptom: SymptomId): string {
  const label = SYMPTOM_LABELS[symptom];
  if (label.startsWith("Checked: ")) return `${label}.`;
  // Lower-case the first word unless it is an abbreviation ("A/C").
  const first = /^[A-Z][a-z]/.test(label) ? label.charAt(0).toLowerCase() : label.charAt(0);
  return `Reported: ${first}${label.slice(1)}.`;
}

/** Returns true when the refrigerant failed identification. */
function addIdentifierEvidence(input: DiagnosisInput, out: Extraction): boolean {
  let failed = false;
  if (input.identifierPurityPct !== undefined) {
    out.observedGroups.add("purity");
    failed = input.identifierPurityPct < PURITY_PASS_PCT;
    out.observations.push(
      failed
        ? {
            id: "purity:fail",
            text: `Identifier purity ${pct(input.identifierPurityPct)} is below the ${PURITY_PASS_PCT} % pass mark.`,
          }
        : {
            id: "purity:pass",
            text: `Identifier purity ${pct(input.identifierPurityPct)} passes (${PURITY_PASS_PCT} % or better).`,
          },
    );
  }
  if (input.identifierAirPct !== undefined) {
    out.observedGroups.add("air");
    const air = input.identifierAirPct;
    if (air < AIR_PCT.some)
      out.observations.push({
        id: "air:none",
        text: `Identifier shows ${pct(air)} air: no meaningful non-condensable gas.`,
      });
    else if (air < AIR_PCT.high)
      out.observations.push({ id: "air:some", text: `Identifier shows ${pct(air)} air.` });
    else
      out.observations.push({
        id: "air:high",
        text: `Identifier shows ${pct(air)} air, well above trace level.`,
      });
  }
  return failed;
}

function addChargeEvidence(input: DiagnosisInput, out: Extraction): void {
  if (input.labelChargeG === undefined || input.recoveredChargeG === undefined) return;
  const { deltaG, deltaPct } = chargeDeviation({
    labelChargeG: input.labelChargeG,
    recoveredChargeG: input.recoveredChargeG,
  });
  out.computed.chargeDeltaG = deltaG;
  out.computed.chargeDeltaPct = deltaPct;
  out.observedGroups.add("charge");
  const lead = `Recovered ${grams(input.recoveredChargeG)} against a label charge of ${grams(input.labelChargeG)}`;
  const short = `${lead}: ${grams(-deltaG)} (${pct(Math.round(-deltaPct))}) short`;
  if (deltaPct < CHARGE_PCT.empty)
    out.observations.push({ id: "charge:empty", text: `${short}, the system is practically empty.` });
  else if (deltaPct < CHARGE_PCT.veryLow) out.observations.push({ id: "charge:very_low", text: `${short}.` });
  else if (deltaPct < CHARGE_PCT.low)
    out.observations.push({
      id: "charge:low",
      text: `${short} (recovery can leave some behind, so this is the least that is missing).`,
    });
  else if (deltaPct <= CHARGE_PCT.high)
    out.observations.push({
      id: "charge:ok",
      text: `${lead}: within tolerance (${pct(Math.round(deltaPct))}).`,
    });
  else {
    const over = `${lead}: ${grams(deltaG)} (${pct(Math.round(deltaPct))}) over`;
    out.observations.push(
      deltaPct <= CHARGE_PCT.veryHigh
        ? { id: "charge:high", text: `${over}.` }
        : { id: "charge:very_high", text: `${over}, a clear overcharge.` },
    );
  }
}

function addVentEvidence(input: DiagnosisInput, out: Extraction): void {
  if (input.ventC === undefined) return;
  out.observedGroups.add("vent");
  const riseK = Math.max(0, input.ambientC - VENT_C.hotAmbientC) * VENT_C.riseKPerK;
  const coldMaxC = VENT_C.cold + riseK;
  const warmMinC = VENT_C.warm + riseK;
  const lead = `Centre vent ${degC(input.ventC)} at ${degC(input.ambientC)} ambient`;
  if (input.ventC < VENT_C.freezing)
    out.observations.push({ id: "vent:freezing", text: `${lead}: cold enough to freeze the evaporator.` });
  else if (input.ventC <= coldMaxC)
    out.observations.push({
      id: "vent:cold",
      text: `${lead}: cooling well (${degC(coldMaxC)} or colder expected).`,
    });
  else if (input.ventC < warmMinC)
    out.observations.push({
      id: "vent:cool",
      text: `${lead}: cooling, but weaker than expected (${degC(coldMaxC)} or colder).`,
    });
  else
    out.observations.push({
      id: "vent:warm",
      text: `${lead}: poor cooling (${degC(coldMaxC)} or colder expected).`,
    });
}
