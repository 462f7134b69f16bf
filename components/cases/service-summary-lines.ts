import { summariseServiceRecord, type ServiceRecordValues } from "@/lib/service/record-summary";
import { formatMass, formatVacuum, formatVolume } from "@/lib/units";
import { withArticle } from "@/lib/article";
import type { ReaderUnits } from "@/lib/units/reader";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { PartOilAllowancesMl } from "@/lib/service/oil";
import type { ServiceCaseContext, ServiceRecordDto } from "@/lib/contracts/service-records";

/** One line of the case page's service summary: a name and what was recorded, in the reader's units. */
export interface SummaryLine {
  name: string;
  value: string;
  /** A recorded figure the record's own checks flag (over or under the label, a failed hold). */
  flagged?: boolean;
}

export const NOT_RECORDED = "not recorded";

const has = (v: number | null | undefined): v is number =>
  v !== null && v !== undefined && Number.isFinite(v);

const signed = (text: string, value: number) => (value > 0 ? `+${text}` : text);
/** A percentage with its sign, the minus written as the unit formatters write it. */
const percent = (pct: number) =>
  `${pct >= 0.05 ? "+" : pct <= -0.05 ? "\u2212" : ""}${Math.abs(pct).toFixed(1)} %`;

/**
 * The service record as the case page sums it up: recovered against the label, oil out and in, the
 * vacuum and its hold, and the charge, each in the reader's units. A value nobody entered says
 * "not recorded"; a number is never shown without its figure.
 */
export function serviceSummaryLines({
  values,
  units,
  altitudeM,
  allowancesMl,
  electricCompressor = false,
}: {
  values: ServiceRecordValues & { refrigerant: RefrigerantId };
  units: ReaderUnits;
  altitudeM?: number;
  allowancesMl?: PartOilAllowancesMl;
  electricCompressor?: boolean;
}): SummaryLine[] {
  const summary = summariseServiceRecord(values, {
    altitudeM,
    allowancesMl,
    compressorDrive: electricCompressor ? "electric" : "belt",
  });
  const mass = (g: number) => formatMass(g, units.mass);
  const volume = (ml: number) => formatVolume(ml, units.volume);
  const vacuum = (kpaAbs: number) => formatVacuum(kpaAbs, units.vacuum, { altitudeM });
  const lines: SummaryLine[] = [];

  lines.push({
    name: "Label charge",
    value: has(values.labelChargeG) ? mass(values.labelChargeG) : NOT_RECORDED,
  });

  if (!has(values.recoveredChargeG)) lines.push({ name: "Recovered", value: NOT_RECORDED });
  else if (summary.recovered && has(values.labelChargeG)) {
    const { deltaG, deltaPct, verdict } = summary.recovered;
    const judged =
      verdict === "within" ? "" : verdict === "over" ? ": more than the label" : ": less than the label";
    lines.push({
      name: "Recovered",
      value: `${mass(values.recoveredChargeG)} against the ${mass(values.labelChargeG)} label (${signed(mass(deltaG), deltaG)}, ${percent(deltaPct)}${judged})`,
      flagged: verdict !== "within",
    });
  } else
    lines.push({ name: "Recovered", value: `${mass(values.recoveredChargeG)} (no label charge to compare)` });

  lines.push({
    name: "Oil out",
    value: has(values.oilRemovedMl) ? volume(values.oilRemovedMl) : NOT_RECORDED,
  });
  if (!has(values.oilAddedMl)) lines.push({ name: "Oil in", value: NOT_RECORDED });
  else if (summary.addBack && summary.oilAddedDeltaMl !== null) {
    const deltaMl = summary.oilAddedDeltaMl;
    // Within 5 mL is as close as a graduated oil injector reads (common practice), as the record says.
    const off = Math.abs(deltaMl) > 5;
    lines.push({
      name: "Oil in",
      value: `${volume(values.oilAddedMl)} against ${volume(summary.addBack.totalMl)} asked for${
        off ? ` (${volume(Math.abs(deltaMl))} ${deltaMl > 0 ? "too much" : "short"})` : ""
      }`,
      flagged: off,
    });
  } else lines.push({ name: "Oil in", value: volume(values.oilAddedMl) });

  const shallow = summary.evacuation !== null && !summary.evacuation.reached;
  lines.push({
    name: "Deepest vacuum",
    value: has(values.deepestKpaAbs)
      ? `${vacuum(values.deepestKpaAbs)}${shallow ? ": not deep enough to boil off moisture" : ""}`
      : NOT_RECORDED,
    flagged: shallow,
  });
  if (summary.hold && has(values.holdStartKpaAbs) && has(values.holdEndKpaAbs) && has(values.holdMinutes))
    lines.push({
      name: "Vacuum hold",
      value: `${summary.hold.verdict === "pass" ? "held" : "did not hold"}: ${vacuum(values.holdStartKpaAbs)} to ${vacuum(
        values.holdEndKpaAbs,
      )} over ${values.holdMinutes} min`,
      flagged: summary.hold.verdict !== "pass",
    });
  else lines.push({ name: "Vacuum hold", value: NOT_RECORDED });

  if (!has(values.chargedG)) lines.push({ name: "Charged", value: NOT_RECORDED });
  else if (summary.charge && summary.target) {
    const targetG = has(values.targetG) && values.targetG > 0 ? values.targetG : summary.target.targetG;
    const { within, deltaG } = summary.charge;
    lines.push({
      name: "Charged",
      value: `${mass(values.chargedG)} against ${withArticle(mass(targetG))} target (${
        within ? "within tolerance" : `${signed(mass(deltaG), deltaG)}, outside tolerance`
      })`,
      flagged: !within,
    });
  } else lines.push({ name: "Charged", value: mass(values.chargedG) });

  return lines;
}

/** Emptied and not yet refilled: recovered (or drained) with no charge recorded. */
export function emptiedNotRecharged(values: ServiceRecordValues): boolean {
  return has(values.recoveredChargeG) && !(has(values.chargedG) && values.chargedG > 0);
}

/** The record's stored figures (or none yet) with the vehicle's label charge where the record has none. */
export function summaryValuesOf(
  record: ServiceRecordDto | null,
  serviceCase: Pick<ServiceCaseContext, "refrigerant" | "labelChargeG">,
): ServiceRecordValues & { refrigerant: RefrigerantId } {
  return {
    refrigerant: record?.refrigerant ?? serviceCase.refrigerant ?? "R-134a",
    labelChargeG: record?.labelChargeG ?? serviceCase.labelChargeG,
    recoveredChargeG: record?.recoveredChargeG,
    oilRemovedMl: record?.oilRemovedMl,
    oilPulled: record?.oilPulled ?? false,
    partsReplaced: (record?.partsReplaced ?? []).map((p) => ({
      part: p.part,
      count: p.count,
      ...(p.measuredMl !== null && p.measuredMl !== undefined ? { measuredMl: p.measuredMl } : {}),
    })),
    deepestKpaAbs: record?.deepestKpaAbs,
    holdStartKpaAbs: record?.holdStartKpaAbs,
    holdEndKpaAbs: record?.holdEndKpaAbs,
    holdMinutes: record?.holdMinutes,
    oilAddedType: record?.oilAddedType,
    oilAddedMl: record?.oilAddedMl,
    targetG: record?.targetG,
    chargedG: record?.chargedG,
  };
}
