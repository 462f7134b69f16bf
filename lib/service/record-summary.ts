import type { RefrigerantId } from "@/lib/refrigerants";
import {
  type ChargeCheck,
  type RecoveredAgainstLabel,
  type TargetCharge,
  chargeWithinTolerance,
  recoveredAgainstLabel,
  targetCharge,
} from "./charge";
import { sayMillilitres } from "./format";
import {
  type OilAddBack,
  type OilPulledEstimate,
  type PartOilAllowancesMl,
  type ReplacedPart,
  estimateOilPulledMl,
  oilToAddBack,
} from "./oil";
import { type CompressorDrive, type OilWarning, oilSuitsCompressor } from "./oil-type";
import {
  type EvacuationCheck,
  type HoldLimit,
  type VacuumHoldResult,
  evaluateEvacuation,
  vacuumHoldTest,
} from "./vacuum";

/** What a service record holds so far; every field may still be empty while the work goes on. */
export interface ServiceRecordValues {
  refrigerant: RefrigerantId;
  labelChargeG?: number | null;
  specChargeG?: number | null;
  specOilType?: string | null;
  specTotalOilMl?: number | null;
  recoveredChargeG?: number | null;
  oilRemovedMl?: number | null;
  oilPulled?: boolean;
  partsReplaced?: readonly ReplacedPart[];
  deepestKpaAbs?: number | null;
  holdStartKpaAbs?: number | null;
  holdEndKpaAbs?: number | null;
  holdMinutes?: number | null;
  oilAddedType?: string | null;
  oilAddedMl?: number | null;
  targetG?: number | null;
  chargedG?: number | null;
}

export interface ServiceRecordContext {
  altitudeM?: number;
  allowancesMl?: PartOilAllowancesMl;
  holdLimit?: HoldLimit;
  compressorDrive?: CompressorDrive;
}

export interface ServiceRecordSummary {
  recovered: RecoveredAgainstLabel | null;
  pulledOil: OilPulledEstimate | null;
  addBack: OilAddBack | null;
  /** oil added against what the record asks for, mL (positive: more than asked) */
  oilAddedDeltaMl: number | null;
  oilAddedSentence: string | null;
  oilWarnings: OilWarning[];
  target: TargetCharge | null;
  charge: ChargeCheck | null;
  evacuation: EvacuationCheck | null;
  hold: VacuumHoldResult | null;
  /** values the computations refused (out of range), worded for the technician */
  problems: string[];
}

const has = (v: number | null | undefined): v is number =>
  v !== null && v !== undefined && Number.isFinite(v);

/**
 * Everything the service record works out from what has been typed so far. Never throws:
 * a value a computation refuses becomes a problem line, so the screen keeps working while
 * the technician is halfway through a number.
 */
export function summariseServiceRecord(
  v: ServiceRecordValues,
  ctx: ServiceRecordContext = {},
): ServiceRecordSummary {
  const problems: string[] = [];
  const attempt = <T>(fn: () => T): T | null => {
    try {
      return fn();
    } catch (error) {
      problems.push(error instanceof Error ? error.message : String(error));
      return null;
    }
  };

  const recovered =
    has(v.labelChargeG) && v.labelChargeG > 0 && has(v.recoveredChargeG)
      ? attempt(() =>
          recoveredAgainstLabel({
            labelChargeG: v.labelChargeG!,
            recoveredChargeG: v.recoveredChargeG!,
            refrigerant: v.refrigerant,
          }),
        )
      : null;

  const pulledOil =
    v.oilPulled && has(v.recoveredChargeG)
      ? attempt(() => estimateOilPulledMl({ liquidRecoveredG: v.recoveredChargeG! }))
      : null;

  const addBack = has(v.oilRemovedMl)
    ? attempt(() =>
        oilToAddBack({
          drainedDuringRecoveryMl: v.oilRemovedMl!,
          replacedParts: v.partsReplaced,
          allowancesMl: ctx.allowancesMl,
          estimatedPulledMl: pulledOil?.oilMl,
          totalSystemOilMl: v.specTotalOilMl ?? undefined,
        }),
      )
    : null;

  let oilAddedDeltaMl: number | null = null;
  let oilAddedSentence: string | null = null;
  if (addBack && has(v.oilAddedMl)) {
    oilAddedDeltaMl = v.oilAddedMl - addBack.totalMl;
    // Within 5 mL is as close as a graduated oil injector reads (common practice).
    oilAddedSentence =
      Math.abs(oilAddedDeltaMl) <= 5
        ? `Added ${sayMillilitres(v.oilAddedMl)}: matches the ${sayMillilitres(addBack.totalMl)} the record asks for.`
        : `Added ${sayMillilitres(v.oilAddedMl)} against ${sayMillilitres(addBack.totalMl)} asked for: ${sayMillilitres(oilAddedDeltaMl)} ${oilAddedDeltaMl > 0 ? "too much" : "short"}.`;
  }

  const oilWarnings = v.oilAddedType?.trim()
    ? oilSuitsCompressor({
        compressorDrive: ctx.compressorDrive ?? "belt",
        oilAdded: v.oilAddedType,
        specOilType: v.specOilType ?? undefined,
        refrigerant: v.refrigerant,
      }).warnings
    : [];

  const target = attempt(() =>
    targetCharge({ labelChargeG: v.labelChargeG, specChargeG: v.specChargeG, refrigerant: v.refrigerant }),
  );
  const targetG = has(v.targetG) && v.targetG > 0 ? v.targetG : (target?.targetG ?? null);
  const charge =
    has(targetG) && has(v.chargedG)
      ? attempt(() => chargeWithinTolerance({ targetG, chargedG: v.chargedG!, refrigerant: v.refrigerant }))
      : null;

  const evacuation = has(v.deepestKpaAbs)
    ? attempt(() => evaluateEvacuation({ deepestKpaAbs: v.deepestKpaAbs!, altitudeM: ctx.altitudeM }))
    : null;
  const hold =
    has(v.holdStartKpaAbs) && has(v.holdEndKpaAbs) && has(v.holdMinutes)
      ? attempt(() =>
          vacuumHoldTest({
            startKpaAbs: v.holdStartKpaAbs!,
            endKpaAbs: v.holdEndKpaAbs!,
            minutes: v.holdMinutes!,
            limit: ctx.holdLimit,
          }),
        )
      : null;

  return {
    recovered,
    pulledOil,
    addBack,
    oilAddedDeltaMl,
    oilAddedSentence,
    oilWarnings,
    target,
    charge,
    evacuation,
    hold,
    problems,
  };
}

/**
 * The summary with every sentence said by `say` (sayInUnits with the reader's units and the shop's
 * altitude): the computations keep quantity markers, the screen shows the reader's units.
 */
export function sayServiceRecordSummary(
  s: ServiceRecordSummary,
  say: (text: string) => string,
): ServiceRecordSummary {
  const all = (list: readonly string[]) => list.map(say);
  return {
    ...s,
    recovered: s.recovered && { ...s.recovered, sentence: say(s.recovered.sentence) },
    pulledOil: s.pulledOil && { ...s.pulledOil, sentence: say(s.pulledOil.sentence) },
    addBack: s.addBack && { ...s.addBack, warnings: all(s.addBack.warnings) },
    oilAddedSentence: s.oilAddedSentence && say(s.oilAddedSentence),
    target: s.target && { ...s.target, warnings: all(s.target.warnings) },
    charge: s.charge && { ...s.charge, sentence: say(s.charge.sentence) },
    evacuation: s.evacuation && { ...s.evacuation, messages: all(s.evacuation.messages) },
    hold: s.hold && { ...s.hold, message: say(s.hold.message), warnings: all(s.hold.warnings) },
    problems: all(s.problems),
  };
}
