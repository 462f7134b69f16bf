import { fullVacuumKpaGauge, MAX_KPA_GAUGE_BY_REFRIGERANT } from "@/lib/refrigerants/gauge-limits";
import type { InterviewAnswers } from "./answers";
import { altitudeFor, type ShopSettings } from "./branches";
import type { GroupId } from "./steps";
import type { AnswerIssue } from "./issues";

// More than three times the label charge points at the scale or the label, not at the vehicle (common practice).
export const MAX_RECOVERED_TIMES_LABEL = 3;

const gaugeFields = [
  { group: "static", field: "staticKpaGauge", label: "Static pressure" },
  { group: "running", field: "highKpaGauge", label: "High side" },
  { group: "running", field: "lowKpaGauge", label: "Low side" },
] as const;

/** Checks that need more than one question group (or the shop's altitude); issues are filed under the group that should change. */
export function crossCheck(
  answers: InterviewAnswers,
  shop?: ShopSettings,
): Partial<Record<GroupId, AnswerIssue[]>> {
  const found: Partial<Record<GroupId, AnswerIssue[]>> = {};
  const add = (group: GroupId, issue: AnswerIssue) => {
    (found[group] ??= []).push(issue);
  };
  const altitudeM = altitudeFor(answers, shop);
  const floorKpa = altitudeM === undefined ? undefined : fullVacuumKpaGauge(altitudeM);
  if (floorKpa !== undefined) {
    for (const { group, field, label } of gaugeFields) {
      const value = (answers[group] as Record<string, number | undefined> | undefined)?.[field];
      if (value !== undefined && value < floorKpa) {
        add(group, {
          field,
          message: `${label}: a gauge cannot read below a full vacuum (${floorKpa.toFixed(1)} kPa at ${Math.round(altitudeM ?? 0)} m) — check the gauge zero`,
        });
      }
    }
  }
  const refrigerant = answers.system?.refrigerant;
  if (refrigerant !== undefined) {
    const maxKpa = MAX_KPA_GAUGE_BY_REFRIGERANT[refrigerant];
    for (const { group, field, label } of gaugeFields) {
      const value = (answers[group] as Record<string, number | undefined> | undefined)?.[field];
      if (value !== undefined && value > maxKpa) {
        add(group, {
          field,
          message: `${label}: ${Math.round(value)} kPa is more than an ${refrigerant} system can hold — check the unit (psi, bar or kPa)`,
        });
      }
    }
  }
  const labelChargeG = answers.system?.labelChargeG;
  const recoveredChargeG = answers.chargeAudit?.recovered ? answers.chargeAudit.recoveredChargeG : undefined;
  if (
    labelChargeG !== undefined &&
    recoveredChargeG !== undefined &&
    recoveredChargeG > labelChargeG * MAX_RECOVERED_TIMES_LABEL
  ) {
    add("chargeAudit", {
      field: "recoveredChargeG",
      message: "The recovered mass is more than three times the label charge — check the scale and the label",
    });
  }
  return found;
}
