import { type CautionContext, type ServiceCaution, cautionsFor } from "./cautions";
import { type ChargeCheck, type RecoveredAgainstLabel, type TargetCharge, chargeWithinTolerance, recoveredAgainstLabel, targetCharge } from "./charge";
import { formatMillilitres, formatPercent } from "./format";
import { type PlannedMovement, postingsForServiceRecord } from "./ledger-corrections";
import { type OilAddBack, type OilPulledEstimate, estimateOilPulledMl, oilToAddBack } from "./oil";
import { type OilWarning, oilSuitsCompressor } from "./oil-type";
import type { ServiceContext, ServiceRecordInput } from "./record-schema";
import { type EvacuationCheck, type VacuumHoldResult, evaluateEvacuation, vacuumHoldTest } from "./vacuum";

/** SAE J2099 / SAE J2912: an identifier reading of 98 % or more counts as pure. */
export const IDENTIFIER_PURITY_PASS_PCT = 98;

/** common practice: an oil top-up within 5 mL or 10 % of the figure asked for is as close as a bottle can be read. */
export const OIL_MATCH_TOLERANCE = { ml: 5, pct: 10 } as const;

export interface ServiceRecordSummary {
  identifier?: { pass: boolean; message: string; source: string };
  target: TargetCharge | null;
  recovered?: RecoveredAgainstLabel;
  oilPulled?: OilPulledEstimate;
  oilToAddBack?: OilAddBack;
  oilAdded?: { differenceMl: number; matches: boolean; message: string };
  oilWarnings: OilWarning[];
  evacuation?: EvacuationCheck;
  hold?: VacuumHoldResult;
  charge?: ChargeCheck;
  cautions: ServiceCaution[];
  /** ledger postings the record makes (empty until a cylinder is named) */
  postings: PlannedMovement[];
  /** one line per thing that needs the technician's attention, in step order */
  attention: string[];
}

/** Everything the service-record screen shows beside what the technician has entered so far. */
export function summariseServiceRecord(record: ServiceRecordInput, ctx: ServiceContext, opts: { technicianId?: string } = {}): ServiceRecordSummary {
  const attention: string[] = [];
  const s: ServiceRecordSummary = { target: null, oilWarnings: [], cautions: [], postings: [], attention };

  if (record.identifier) {
    const pass = record.identifier.purityPct >= IDENTIFIER_PURITY_PASS_PCT;
    const air = record.identifier.airPct !== undefined ? ` (air ${formatPercent(record.identifier.airPct)})` : "";
    const message = pass
      ? `Purity ${formatPercent(record.identifier.purityPct)}${air}: pure enough to recover into the shop's machine.`
      : `Purity ${formatPercent(record.identifier.purityPct)}${air} is below ${IDENTIFIER_PURITY_PASS_PCT} %: do not recover into the shop's machine. Use dedicated equipment or a separate, labelled cylinder, and tell the owner in writing.`;
    s.identifier = { pass, message, source: "SAE J2099 and SAE J2912: 98 % purity" };
    if (!pass) attention.push(message);
    if (!pass && record.recovery?.cylinderId) attention.push("Refrigerant that failed identification was recovered into a shop cylinder: check that cylinder before it is reused.");
  }

  s.target = targetCharge({ labelChargeG: ctx.labelChargeG, specChargeG: ctx.specChargeG, revisedChargeG: ctx.revisedChargeG, refrigerant: ctx.refrigerant });
  attention.push(...(s.target?.warnings ?? []));

  if (record.recovery) {
    const referenceG = ctx.labelChargeG ?? s.target?.targetG;
    if (referenceG !== undefined) {
      s.recovered = recoveredAgainstLabel({
        labelChargeG: referenceG,
        recoveredChargeG: record.recovery.recoveredG,
        refrigerant: ctx.refrigerant,
        shortfallAllowancePct: ctx.recoveryShortfallPct,
      });
      if (s.recovered.verdict !== "within") attention.push(s.recovered.sentence);
    }
    if (record.recovery.oilPulledWithLiquid) {
      s.oilPulled = estimateOilPulledMl({ liquidRecoveredG: record.recovery.liquidRecoveredG ?? record.recovery.recoveredG });
    }
    s.oilToAddBack = oilToAddBack({
      drainedDuringRecoveryMl: record.recovery.oilDrainedMl,
      replacedParts: record.oil?.replacedParts,
      allowancesMl: ctx.partOilAllowancesMl,
      estimatedPulledMl: s.oilPulled?.oilMl,
      totalSystemOilMl: ctx.totalSystemOilMl,
    });
    attention.push(...s.oilToAddBack.warnings);
  }

  if (record.oil) {
    if (s.oilToAddBack) {
      const askedMl = s.oilToAddBack.totalMl;
      const differenceMl = record.oil.addedMl - askedMl;
      const matches = Math.abs(differenceMl) <= Math.max(OIL_MATCH_TOLERANCE.ml, (askedMl * OIL_MATCH_TOLERANCE.pct) / 100);
      const message = matches
        ? `Added ${formatMillilitres(record.oil.addedMl)} of oil; the record asked for ${formatMillilitres(askedMl)}.`
        : `Added ${formatMillilitres(record.oil.addedMl)} of oil but the record asks for ${formatMillilitres(askedMl)}: ${formatMillilitres(differenceMl)} ${differenceMl > 0 ? "too much" : "short"}.`;
      s.oilAdded = { differenceMl, matches, message };
      if (!matches) attention.push(message);
    }
    s.oilWarnings = oilSuitsCompressor({
      compressorDrive: ctx.electricCompressor ? "electric" : "belt",
      oilAdded: record.oil.type,
      specOilType: ctx.specOilType,
      refrigerant: ctx.refrigerant,
    }).warnings;
    attention.push(...s.oilWarnings.map((w) => w.text));
  }

  if (record.evacuation) {
    const at = { altitudeM: ctx.altitudeM, barometricKpa: ctx.barometricKpa };
    s.evacuation = evaluateEvacuation({ deepestKpaAbs: record.evacuation.deepestKpaAbs, ambientC: ctx.ambientC, ...at });
    if (!s.evacuation.reached || s.evacuation.waterBoils === false) attention.push(...s.evacuation.messages);
    if (record.evacuation.hold) {
      s.hold = vacuumHoldTest({ ...record.evacuation.hold, limit: ctx.holdLimit });
      if (s.hold.verdict === "fail") attention.push(s.hold.message);
      attention.push(...s.hold.warnings);
    }
  }

  if (record.recharge) {
    s.charge = chargeWithinTolerance({ ...record.recharge, refrigerant: ctx.refrigerant, toleranceG: ctx.chargeToleranceG });
    if (!s.charge.within) attention.push(s.charge.sentence);
    if (s.target && Math.abs(record.recharge.targetG - s.target.targetG) > s.charge.toleranceG) {
      attention.push(`The charge was aimed at ${record.recharge.targetG} g but the ${s.target.basis.replace("_", " ")} figure is ${s.target.targetG} g.`);
    }
  }

  const cautionCtx: CautionContext = { refrigerant: ctx.refrigerant, expansionDevice: ctx.expansionDevice, electricCompressor: ctx.electricCompressor };
  s.cautions = cautionsFor(cautionCtx);

  if (opts.technicianId) {
    s.postings = postingsForServiceRecord({
      refrigerant: ctx.refrigerant,
      technicianId: opts.technicianId,
      recovery: record.recovery?.cylinderId ? { cylinderId: record.recovery.cylinderId, massG: record.recovery.recoveredG } : null,
      recharge: record.recharge?.cylinderId ? { cylinderId: record.recharge.cylinderId, massG: record.recharge.chargedG } : null,
    });
  }
  return s;
}
