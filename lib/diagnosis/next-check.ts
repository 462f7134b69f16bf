import { CAUSE_IDS, CAUSE_SHORT_NAMES, type CauseId } from "./causes";
import { CHECKS, type CheckContext, type CheckDefinition, type CheckId } from "./checks";
import { type DoNotRun, staticDeficits } from "./do-not-run";
import { soakQuality } from "./evidence-static";
import { DO_NOT_RUN, NEXT_CHECK, STATIC_CHECK } from "./grading";
import type { ObservationId } from "./observations";
import { doNotRunReason, repairPath } from "./repair-path";
import { outcomeVector } from "./scoring";

export interface NextCheck {
  check: CheckId | "confirm" | "repair_path";
  /** One instruction, addressed to the technician and phrased for the system in front of them. */
  instruction: string;
  /** Why this check: the suspects it separates, or the rule that chose it. */
  reason: string;
  separates: CauseId[];
  /** What the check is expected to tell about the ranking, nats of entropy; 0 when a rule chose it. */
  expectedGainNats: number;
  /** Whether doing it runs the compressor; never true in the "do not run" state. */
  runsSystem: boolean;
}

/** The ranking the next check works from: each cause with its share of the likelihood. */
export interface Ranked {
  cause: CauseId;
  share: number;
}

const electric = (ctx: CheckContext) => ctx.input.compressorType === "electric";

/** What settles each cause once it leads clearly or nothing cheaper is left (signature table "confirming test" column). */
export function confirmingStep(cause: CauseId, ctx: CheckContext): string {
  switch (cause) {
    case "overcharge":
      return "Recover the charge, weigh it against the label, then evacuate and recharge by weight to the label charge.";
    case "undercharge":
      return "Find and repair the leak, replace the drier or accumulator if the system was open or wet, evacuate, prove a vacuum hold, then recharge by weight to the label charge.";
    case "non_condensables":
      return "Recover the charge (the machine purges the air), find where air entered, evacuate for at least 30 minutes and recharge by weight.";
    case "moisture":
      return "Recover, replace the receiver-drier or accumulator, evacuate deeply (repeat if needed), find where moisture entered, and recharge by weight.";
    case "metering_restriction":
      return ctx.input.expansionDevice === "txv"
        ? "Recover and inspect the expansion valve and its inlet screen; metal debris means compressor wear, so flush and replace parts to the parts maker's conditions."
        : "Recover and inspect the orifice tube and its screen; metal debris means compressor wear, so flush and replace parts to the parts maker's conditions.";
    case "high_side_restriction":
      return "Inspect the condenser, drier and liquid line for damage or a blocked passage; recover, replace the restricted part and flush if there is debris.";
    case "metering_stuck_open":
      return "Check the valve's sensing element: on a block valve its seating and the insulation around it, on a valve with a remote bulb the bulb's clamp and insulation; if the valve still floods, replace it and the receiver-drier.";
    case "condenser_airflow":
      return `Repair the fan circuit or clear the condenser face and air seals, then repeat the running test${electric(ctx) ? " in ready mode" : " at idle"}.`;
    case "weak_compressor":
      return electric(ctx)
        ? "With the charge confirmed by weight, read the compressor's speed request, inverter data and fault codes with a scan tool before condemning it; follow the maker's high-voltage procedure."
        : ctx.input.compressorType === "variable_displacement"
          ? "With the charge confirmed by weight, check the drive belt and the displacement-control valve (and its command, where a scan tool shows it) before condemning the compressor."
          : "With the charge confirmed by weight, check the clutch air gap and the belt before condemning the compressor.";
    case "evaporator_icing":
      return ctx.input.compressorType === "cycling_clutch"
        ? "Check the cabin filter and blower speed, then confirm the cycling switch or evaporator sensor opens at the right point."
        : "Check the cabin filter and blower speed, then the evaporator temperature sensor and the compressor's control (a scan tool shows both on most cars).";
    case "contaminated_refrigerant":
      return "Recover with dedicated contaminated-refrigerant equipment (SAE J2851 type) or into a separate labelled cylinder, then evacuate and recharge with new refrigerant by weight.";
    case "oil_loss":
      return "Recover, drain and measure the compressor's oil, restore the system's oil to the maker's quantity and type, and check the compressor for damage.";
    case "no_refrigerant_fault":
      return "Check the cabin side: blend-door and recirculation operation, blower speed, cabin filter and heater-valve shut-off.";
  }
}

// Confirming steps that run the system to prove the repair; the rest leave the compressor off.
const CONFIRM_RUNS_SYSTEM: ReadonlySet<CauseId> = new Set(["condenser_airflow", "no_refrigerant_fault"]);
// Confirming steps that need a hose on a service port (recovery, gauges).
const CONFIRM_CONNECTS_HOSE: ReadonlySet<CauseId> = new Set(
  CAUSE_IDS.filter(
    (c) => c !== "condenser_airflow" && c !== "no_refrigerant_fault" && c !== "evaporator_icing",
  ),
);

const STATIC_REPEAT_COLD_PARTS =
  "Leave the engine off and let the parts warm to the shop's temperature (an hour or more), then read the static pressure and the parts' temperature again before anything else.";
const STATIC_REPEAT_LONGER_SOAK =
  "Before recovering anything, let the system soak longer (engine off, in shade, an hour or more), measure the parts' temperature beside the lines and read the static pressure again.";

const ruled = (
  check: NextCheck["check"],
  instruction: string,
  reason: string,
  separates: CauseId[],
  runsSystem = false,
): NextCheck => ({ check, instruction, reason, separates, expectedGainNats: 0, runsSystem });

const fromCheck = (
  check: CheckDefinition,
  ctx: CheckContext,
  reason: string,
  separates: CauseId[],
  gain = 0,
) => ({
  check: check.id,
  instruction: check.instruction(ctx),
  reason,
  separates,
  expectedGainNats: gain,
  runsSystem: check.runsSystem,
});

function entropy(p: Float64Array): number {
  let h = 0;
  // Stryker disable next-line EqualityOperator: a typed array reads one past its end as undefined, taken as 0
  for (let i = 0; i < p.length; i++) {
    const v = p[i] ?? 0;
    if (v > 1e-15) h -= v * Math.log(v);
  }
  return h;
}

/**
 * The expected information a check gives about the ranking, nats: the entropy of the shares now less
 * the expected entropy after it. Each result's chance under a cause is taken ∝ exp(its weight for that
 * cause), and results are weighed by the current ranking (Σ share × chance), so an outcome only unlikely
 * causes predict counts for little.
 */
export function expectedGain(outcomes: readonly (readonly ObservationId[])[], shares: Float64Array): number {
  const n = shares.length;
  const norms = new Float64Array(n);
  for (const outcome of outcomes) {
    const { expWeights } = outcomeVector(outcome);
    // Stryker disable next-line EqualityOperator: a typed array reads one past its end as undefined, taken as 0, and ignores a write there
    for (let c = 0; c < n; c++) norms[c] = (norms[c] ?? 0) + (expWeights[c] ?? 0);
  }
  const before = entropy(shares);
  const posterior = new Float64Array(n);
  let after = 0;
  for (const outcome of outcomes) {
    const { expWeights } = outcomeVector(outcome);
    let chance = 0;
    // Stryker disable next-line EqualityOperator: a typed array reads one past its end as undefined, taken as 0, and ignores a write there
    for (let c = 0; c < n; c++) {
      const joint = (shares[c] ?? 0) * ((expWeights[c] ?? 0) / (norms[c] ?? 1));
      posterior[c] = joint;
      chance += joint;
    }
    // Stryker disable next-line ConditionalExpression,EqualityOperator: exp() of a weight is above 0, so chance is 0 only when every share is; its NaN posterior adds 0 × 0
    if (chance <= 0) continue;
    // Stryker disable next-line EqualityOperator: a typed array reads one past its end as undefined, taken as 0, and ignores a write there
    for (let c = 0; c < n; c++) posterior[c] = (posterior[c] ?? 0) / chance;
    after += chance * entropy(posterior);
  }
  return Math.max(0, before - after);
}

const hoseReadingsTaken = (ctx: CheckContext) =>
  [
    ctx.input.staticKpaGauge,
    ctx.input.highKpaGauge,
    ctx.input.lowKpaGauge,
    ctx.input.lowCutOutKpaGauge,
    ctx.input.identifierPurityPct,
    ctx.input.recoveredChargeG,
  ].some((v) => v !== undefined);

/**
 * Sealant is looked for before any hose goes on, and the refrigerant identified before gauges or a
 * machine are connected (common practice; SAE J2843 equipment rules for identification).
 */
function firstThingsFirst(
  next: NextCheck,
  needsHose: boolean,
  ctx: CheckContext,
  separates: CauseId[],
): NextCheck {
  if (!needsHose || hoseReadingsTaken(ctx)) return next;
  // Stryker disable next-line ConditionalExpression: the sealant check is the first of CHECKS
  const sealant = CHECKS.find((c) => c.id === "look_for_sealant");
  // Stryker disable next-line OptionalChaining: CHECKS always holds the checks looked up by id here
  if (sealant?.available(ctx))
    return fromCheck(
      sealant,
      ctx,
      "Look for sealant before any hose goes on: it ruins gauges and recovery equipment.",
      separates,
    );
  const identify = CHECKS.find((c) => c.id === "identify_refrigerant");
  // Stryker disable next-line OptionalChaining: CHECKS always holds the checks looked up by id here
  if (next.check !== "identify_refrigerant" && identify?.available(ctx))
    return fromCheck(
      identify,
      ctx,
      "Identify the refrigerant before gauges or a machine go on: a mixed charge must stay out of the shop's equipment.",
      separates,
    );
  return next;
}

export function chooseNextCheck(ctx: CheckContext, ranking: readonly Ranked[], state: DoNotRun): NextCheck {
  const first = ranking[0]?.cause;
  const second = ranking[1]?.cause;
  if (first === undefined) throw new Error("chooseNextCheck needs at least one suspect");
  const pair = second === undefined ? [first] : [first, second];

  if (ctx.refrigerantContaminated || ctx.symptoms.has("sealant_found")) {
    return ruled(
      "confirm",
      confirmingStep("contaminated_refrigerant", ctx),
      ctx.refrigerantContaminated
        ? "The refrigerant failed identification: deal with it before any further test."
        : "Sealant was found: deal with it before any further test.",
      ["contaminated_refrigerant"],
    );
  }

  if (state.active) {
    const staticCheck = CHECKS.find((c) => c.id === "static_pressure");
    // Stryker disable next-line OptionalChaining: CHECKS always holds the checks looked up by id here
    if (state.reasons.every((r) => r === "electric_static_unknown") && staticCheck?.available(ctx))
      return fromCheck(
        staticCheck,
        ctx,
        `${doNotRunReason(state)} A static reading with liquid shows it has a charge.`,
        [first],
      );
    // Low only against the air: the parts are colder than the shop, so the reading waits for them.
    const deficits = staticDeficits(ctx.input);
    const onlyStatic = state.reasons.every((r) => r === "no_liquid" || r === "electric_static_low");
    const limitK = electric(ctx) ? DO_NOT_RUN.electricStaticBelowK : STATIC_CHECK.noLiquidBelowK;
    // Stryker disable next-line OptionalChaining: a static reason means a static reading, so the deficits are there
    if (onlyStatic && deficits?.soakK != null && deficits.soakK <= limitK)
      return ruled(
        "static_repeat",
        STATIC_REPEAT_COLD_PARTS,
        `${doNotRunReason(state)} The reading is low only against the air temperature: the parts are colder than the shop.`,
        [first],
      );
    return ruled("repair_path", repairPath(ctx.input, state, first, ranking), doNotRunReason(state), [first]);
  }

  // A static over saturation on a short or unmeasured soak is repeated before anything is recovered,
  // unless the identifier has already measured the air.
  const staticHigh = ctx.extraction.observations.some(
    (o) => o.id === "static:slightly_high" || o.id === "static:high" || o.id === "static:very_high",
  );
  if (
    staticHigh &&
    soakQuality(ctx.input) !== "measured" &&
    ctx.input.identifierAirPct === undefined &&
    pair.includes("non_condensables")
  )
    return ruled(
      "static_repeat",
      STATIC_REPEAT_LONGER_SOAK,
      "The static pressure sits above saturation, but after a short or unmeasured soak: repeat it before condemning the charge.",
      pair,
    );

  // Confirm the charge by weight before condemning a compressor (common practice).
  const weigh = CHECKS.find((c) => c.id === "recover_and_weigh");
  // Stryker disable next-line OptionalChaining: CHECKS always holds the checks looked up by id here
  if (first === "weak_compressor" && weigh?.available(ctx))
    return firstThingsFirst(
      fromCheck(weigh, ctx, "Confirm the charge by weight before condemning the compressor.", pair),
      weigh.connectsHose,
      ctx,
      pair,
    );

  // Stryker disable next-line OptionalChaining: the ranking has a first entry, checked above
  const leaderShare = ranking[0]?.share ?? 0;
  if (leaderShare >= NEXT_CHECK.leaderClearShare) {
    return firstThingsFirst(
      ruled(
        "confirm",
        confirmingStep(first, ctx),
        `${CAUSE_SHORT_NAMES[first]} is clear, with ${Math.round(leaderShare * 100)} % of the likelihood: confirm it and repair.`.replace(
          // Stryker disable next-line Regex: without the anchor the first match is still the first character
          /^./,
          (c) => c.toUpperCase(),
        ),
        [first],
        CONFIRM_RUNS_SYSTEM.has(first),
      ),
      CONFIRM_CONNECTS_HOSE.has(first),
      ctx,
      [first],
    );
  }

  // Air against overcharge: when the two are close, the static check or the identifier settles it.
  const closePair =
    second !== undefined &&
    ((first === "overcharge" && second === "non_condensables") ||
      (first === "non_condensables" && second === "overcharge")) &&
    ctx.gapLogOdds < NEXT_CHECK.closePairLogOdds;
  if (closePair) {
    const settling = CHECKS.find(
      (c) => (c.id === "static_pressure" || c.id === "identify_refrigerant") && c.available(ctx),
    );
    if (settling)
      return firstThingsFirst(
        fromCheck(
          settling,
          ctx,
          `Overcharge and air look alike on the gauges; ${settling.id === "static_pressure" ? "the static check" : "the identifier"} tells them apart.`,
          pair,
        ),
        settling.connectsHose,
        ctx,
        pair,
      );
  }

  const shares = new Float64Array(CAUSE_IDS.length);
  for (const r of ranking) shares[CAUSE_IDS.indexOf(r.cause)] = r.share;
  let best: { check: CheckDefinition; gain: number } | null = null;
  for (const check of CHECKS) {
    if (!check.available(ctx)) continue;
    const gain = expectedGain(check.outcomes(ctx), shares);
    if (gain > NEXT_CHECK.minUsefulGainNats && (best === null || gain > best.gain + 1e-9))
      best = { check, gain };
  }
  if (best) {
    const reason =
      second === undefined
        ? `Tells the most about ${CAUSE_SHORT_NAMES[first]}.`
        : `Best separates ${CAUSE_SHORT_NAMES[first]} from ${CAUSE_SHORT_NAMES[second]}.`;
    return firstThingsFirst(
      fromCheck(best.check, ctx, reason, pair, best.gain),
      best.check.connectsHose,
      ctx,
      pair,
    );
  }
  return firstThingsFirst(
    ruled(
      "confirm",
      confirmingStep(first, ctx),
      `No remaining check separates the leading suspects; confirm ${CAUSE_SHORT_NAMES[first]} directly.`,
      [first],
      CONFIRM_RUNS_SYSTEM.has(first),
    ),
    CONFIRM_CONNECTS_HOSE.has(first),
    ctx,
    [first],
  );
}
