import { CAUSE_SHORT_NAMES, type CauseId } from "./causes";
import { CHECKS, type CheckContext, type CheckId } from "./checks";
import { type DoNotRun, staticDeficits } from "./do-not-run";
import { DO_NOT_RUN, STATIC_CHECK } from "./grading";
import { doNotRunReason, repairPath } from "./repair-path";
import type { ObservationId } from "./observations";
import { causeIndex, outcomeVector } from "./scoring";

export interface NextCheck {
  check: CheckId | "confirm" | "repair_path";
  /** One instruction, addressed to the technician. */
  instruction: string;
  /** Why this check: the suspects it separates. */
  reason: string;
  separates: CauseId[];
  /** Expected change, in log-odds, of the gap between the two leading suspects. */
  expectedShiftLogOdds: number;
  /** Whether doing it runs the compressor; never true in the "do not run" state. */
  runsSystem: boolean;
}

// Below this expected shift a check would not change the order in any useful way (common practice judgement).
const MIN_USEFUL_SHIFT = 0.05;

/** What settles each cause once nothing cheaper is left (signature table "confirming test" column). */
export const CONFIRMING_STEP: Record<CauseId, string> = {
  overcharge:
    "Recover the charge, weigh it against the label, then evacuate and recharge by weight to the label charge.",
  undercharge:
    "Repair the leak, replace the drier or accumulator if the system was open or wet, evacuate, prove a vacuum hold, then recharge by weight to the label charge.",
  non_condensables:
    "Recover the charge (the machine purges the air), find where air entered, evacuate for at least 30 minutes and recharge by weight.",
  moisture:
    "Recover, replace the receiver-drier or accumulator, evacuate deeply (repeat if needed), find where moisture entered, and recharge by weight.",
  metering_restriction:
    "Recover and inspect the orifice tube or expansion valve and its screen; metal debris means compressor wear, so flush and replace parts to the supplier's conditions.",
  high_side_restriction:
    "Inspect the condenser, drier and liquid line for damage or a blocked passage; recover, replace the restricted part and flush if there is debris.",
  metering_stuck_open:
    "Check the expansion-valve bulb's clamp and insulation; if it is secure and the valve still floods, replace the valve and the receiver-drier.",
  condenser_airflow:
    "Repair the fan circuit or clear the condenser face and air seals, then repeat the running test at idle.",
  weak_compressor:
    "With the charge confirmed by weight, check the clutch air gap, belt and displacement control before condemning the compressor.",
  evaporator_icing:
    "Check the cabin filter and blower speed, then confirm the cycling switch or evaporator sensor opens at the right point.",
  contaminated_refrigerant:
    "Recover with dedicated contaminated-refrigerant equipment (SAE J2851 type) or into a separate labelled cylinder, then evacuate and recharge with new refrigerant by weight.",
  oil_loss:
    "Recover, measure the oil removed and restore the system's oil to the maker's quantity and type; check the compressor for damage.",
  no_refrigerant_fault:
    "Check the cabin side: blend-door and recirculation operation, blower speed, cabin filter and heater-valve shut-off.",
};

/**
 * Expected |change| in (log-odds A − log-odds B) over a check's outcomes. An outcome's chance under a
 * cause is taken ∝ exp(its weight) (a likelihood ratio against an even background), averaged over A and B.
 */
export function expectedShift(
  outcomes: readonly (readonly ObservationId[])[],
  a: CauseId,
  b: CauseId,
): number {
  const ia = causeIndex(a);
  const ib = causeIndex(b);
  let normA = 0;
  let normB = 0;
  for (const outcome of outcomes) {
    const { expWeights } = outcomeVector(outcome);
    normA += expWeights[ia] ?? 0;
    normB += expWeights[ib] ?? 0;
  }
  let expected = 0;
  for (const outcome of outcomes) {
    const { weights, expWeights } = outcomeVector(outcome);
    const chance = 0.5 * ((expWeights[ia] ?? 0) / normA) + 0.5 * ((expWeights[ib] ?? 0) / normB);
    expected += chance * Math.abs((weights[ia] ?? 0) - (weights[ib] ?? 0));
  }
  return expected;
}

// Leaders within this many log-odds of each other are "close" (judgement: a likelihood ratio under 3).
const CLOSE_PAIR_LOG_ODDS = Math.log(3);
const isPair = (a: CauseId, b: CauseId, x: CauseId, y: CauseId) =>
  (a === x && b === y) || (a === y && b === x);

const STATIC_REPEAT_COLD_PARTS =
  "Leave the engine off and let the parts warm to the shop's temperature (an hour or more), then read the static pressure and the parts' temperature again before anything else.";

// What a confirming step involves: running the system to prove the repair, or not.
const CONFIRM_RUNS_SYSTEM: Record<CauseId, boolean> = {
  overcharge: false,
  undercharge: false,
  non_condensables: false,
  moisture: false,
  metering_restriction: false,
  high_side_restriction: false,
  metering_stuck_open: false,
  condenser_airflow: true,
  weak_compressor: false,
  evaporator_icing: false,
  contaminated_refrigerant: false,
  oil_loss: false,
  no_refrigerant_fault: true,
};

export function chooseNextCheck(ctx: CheckContext, leaders: readonly CauseId[], state: DoNotRun): NextCheck {
  const [first, second] = leaders;
  if (first === undefined) throw new Error("chooseNextCheck needs at least one suspect");
  if (ctx.mixed) {
    return {
      check: "confirm",
      instruction: CONFIRMING_STEP.contaminated_refrigerant,
      reason: "The refrigerant failed identification: deal with it before any further test.",
      separates: ["contaminated_refrigerant"],
      expectedShiftLogOdds: 0,
      runsSystem: false,
    };
  }
  if (state.active) {
    const staticCheck = CHECKS.find((c) => c.id === "static_pressure");
    if (state.reasons.every((r) => r === "electric_static_unknown") && staticCheck?.available(ctx)) {
      return {
        check: "static_pressure",
        instruction: staticCheck.instruction,
        reason: `${doNotRunReason(state)} A static reading with liquid shows it has a charge.`,
        separates: [first],
        expectedShiftLogOdds: 0,
        runsSystem: false,
      };
    }
    // Low only against the air: the parts are colder than the shop, so the reading waits for them.
    const deficits = staticDeficits(ctx.input);
    const onlyStatic = state.reasons.every((r) => r === "no_liquid" || r === "electric_static_low");
    const limitK =
      ctx.input.compressorType === "electric" ? DO_NOT_RUN.electricStaticBelowK : STATIC_CHECK.noLiquidBelowK;
    if (onlyStatic && deficits?.soakK != null && deficits.soakK <= limitK) {
      return {
        check: "static_repeat",
        instruction: STATIC_REPEAT_COLD_PARTS,
        reason: `${doNotRunReason(state)} The reading is low only against the air temperature: the parts are colder than the shop.`,
        separates: [first],
        expectedShiftLogOdds: 0,
        runsSystem: false,
      };
    }
    return {
      check: "repair_path",
      instruction: repairPath(ctx.input, state, first),
      reason: doNotRunReason(state),
      separates: [first],
      expectedShiftLogOdds: 0,
      runsSystem: false,
    };
  }
  // Confirm the charge by weight before condemning a compressor (common practice).
  const weigh = CHECKS.find((c) => c.id === "recover_and_weigh");
  if (first === "weak_compressor" && weigh?.available(ctx)) {
    return {
      check: weigh.id,
      instruction: weigh.instruction,
      reason: "Confirm the charge by weight before condemning the compressor.",
      separates: second === undefined ? [first] : [first, second],
      expectedShiftLogOdds: second === undefined ? 0 : expectedShift(weigh.outcomes(ctx), first, second),
      runsSystem: weigh.runsSystem,
    };
  }
  // Air against overcharge: when the two are close, the static check or the identifier settles it.
  if (
    second !== undefined &&
    isPair(first, second, "overcharge", "non_condensables") &&
    ctx.gapLogOdds < CLOSE_PAIR_LOG_ODDS
  ) {
    const settling = CHECKS.find(
      (c) => (c.id === "static_pressure" || c.id === "identify_refrigerant") && c.available(ctx),
    );
    if (settling) {
      return {
        check: settling.id,
        instruction: settling.instruction,
        reason: `Overcharge and air look alike on the gauges; ${settling.id === "static_pressure" ? "the static check" : "the identifier"} tells them apart.`,
        separates: [first, second],
        expectedShiftLogOdds: expectedShift(settling.outcomes(ctx), first, second),
        runsSystem: settling.runsSystem,
      };
    }
  }
  if (second !== undefined) {
    let best: { id: CheckId; instruction: string; shift: number; runsSystem: boolean } | null = null;
    for (const check of CHECKS) {
      if (!check.available(ctx)) continue;
      const shift = expectedShift(check.outcomes(ctx), first, second);
      if (shift > MIN_USEFUL_SHIFT && (best === null || shift > best.shift + 1e-9))
        best = { id: check.id, instruction: check.instruction, shift, runsSystem: check.runsSystem };
    }
    if (best) {
      return {
        check: best.id,
        instruction: best.instruction,
        reason: `Best separates ${CAUSE_SHORT_NAMES[first]} from ${CAUSE_SHORT_NAMES[second]}.`,
        separates: [first, second],
        expectedShiftLogOdds: best.shift,
        runsSystem: best.runsSystem,
      };
    }
  }
  return {
    check: "confirm",
    instruction: CONFIRMING_STEP[first],
    reason: `No remaining check separates the leading suspects; confirm ${CAUSE_SHORT_NAMES[first]} directly.`,
    separates: [first],
    expectedShiftLogOdds: 0,
    runsSystem: CONFIRM_RUNS_SYSTEM[first],
  };
}
