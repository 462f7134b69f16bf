import type { ObservationId } from "./observations";
import { SYMPTOM_IDS, SYMPTOM_LABELS, type SymptomId } from "./symptoms";

/*
 * Every sentence the engine can say. `{name}` is a quantity with its unit, `{name:n}` its number
 * alone, `{@name}` a plain word, `[ … ]` a part said only when its values are present.
 */

const HIGH_LEAD = "High side {high} (condensing at {condensing})";
const LOW_LEAD = "Low side {low} (evaporating at {evaporating})";
const BAND =
  "the expected {bandMinSat:n}–{bandMaxSat} saturation[ ({bandMin:n}–{bandMax})] for {ambient} ambient";
const SUBCOOLING_LEAD = "Subcooling {subcooling} (liquid line {liquid} against {condensing} condensing)";
const SUPERHEAT_LEAD = "Superheat {superheat} (suction line {suction} against {evaporating} evaporating)";
const CHARGE_LEAD = "Recovered {recovered} against a label charge of {label}";
const CHARGE_SHORT = `${CHARGE_LEAD}: {short} ({shortPct}) short`;
const CHARGE_OVER = `${CHARGE_LEAD}: {over} ({overPct}) over`;
const VENT_LEAD = "Centre vent {vent} at {ambient} ambient[ and {humidity} humidity]";

const READING_TEMPLATES = {
  "device:txv":
    "Expansion-valve (TXV) system with receiver-drier: the valve, not a cycling switch, keeps the evaporator from flooding.",
  "device:orifice_tube":
    "Orifice-tube system with accumulator: a fixed orifice cannot stick open, and the cycling switch alone guards against icing.",
  "purity:fail": "Identifier purity {purity} is below the {passMark} pass mark.",
  "purity:pass": "Identifier purity {purity} passes ({passMark} or better).",
  "air:none": "Identifier shows {air} air: no meaningful non-condensable gas.",
  "air:some": "Identifier shows {air} air.",
  "air:high": "Identifier shows {air} air, well above trace level.",
  "charge:empty": `${CHARGE_SHORT}, the system is practically empty.`,
  "charge:very_low": `${CHARGE_SHORT}.`,
  "charge:low": `${CHARGE_SHORT} (recovery can leave some behind, so this is the least that is missing).`,
  "charge:slightly_low": `${CHARGE_SHORT}: more than recovery leaves behind, possibly a slow leak to test for.`,
  "charge:ok": `${CHARGE_LEAD}: within what recovery leaves and the machine's accuracy ({deltaPct}).`,
  "charge:high": `${CHARGE_OVER}.`,
  "charge:very_high": `${CHARGE_OVER}, a clear overcharge.`,
  "vent:freezing": `${VENT_LEAD}: cold enough to freeze the evaporator.`,
  "vent:cold": `${VENT_LEAD}: cooling well ({coldMax} or colder expected).`,
  "vent:cool": `${VENT_LEAD}: cooling, but weaker than expected ({coldMax} or colder).`,
  "vent:warm": `${VENT_LEAD}: poor cooling ({coldMax} or colder expected).`,
  "high_side:very_low": `${HIGH_LEAD} is far below ${BAND}.`,
  "high_side:low": `${HIGH_LEAD} is below ${BAND}.`,
  "high_side:normal": `${HIGH_LEAD} is inside ${BAND}.`,
  "high_side:high": `${HIGH_LEAD} is above ${BAND}.`,
  "high_side:very_high": `${HIGH_LEAD} is far above ${BAND}.`,
  "low_side:vacuum": "Low side {low} is at or below atmospheric pressure (vacuum) while running.",
  "low_side:very_low": `${LOW_LEAD} is far below ${BAND}.`,
  "low_side:low": `${LOW_LEAD} is below ${BAND}.`,
  "low_side:normal": `${LOW_LEAD} is inside ${BAND}.`,
  "low_side:high": `${LOW_LEAD} is above ${BAND}.`,
  "lift:close":
    "High and low side are close together: the compressor lifts only {lift} of saturation temperature (at least {minLift} expected for {ambient} ambient).",
  "lift:normal": "The compressor lifts {lift} of saturation temperature, a normal spread between the sides.",
  "subcooling:none": `${SUBCOOLING_LEAD}: no liquid leaves the condenser with a margin.`,
  "subcooling:low": `${SUBCOOLING_LEAD} is below the typical {typicalMin:n}–{typicalMax}.`,
  "subcooling:normal": `${SUBCOOLING_LEAD} is within the typical {typicalMin:n}–{typicalMax}.`,
  "subcooling:high": `${SUBCOOLING_LEAD} is above the typical {typicalMin:n}–{typicalMax}: liquid is backing up in the condenser.`,
  "subcooling:very_high": `${SUBCOOLING_LEAD} is far above the typical {typicalMin:n}–{typicalMax}: liquid is backing up in the condenser.`,
  "superheat:near_zero": `${SUPERHEAT_LEAD}: the evaporator is flooding, unusual for {@device} system.`,
  "superheat:normal": `${SUPERHEAT_LEAD} is normal for {@device} system.`,
  "superheat:high": `${SUPERHEAT_LEAD} is high for {@device} system: the evaporator is starved.`,
  "superheat:very_high": `${SUPERHEAT_LEAD} is very high for {@device} system: the evaporator is badly starved.`,
  "static:empty":
    "Static pressure {static} at {reference}[, where saturation is {saturation}]: the system is empty or nearly so.",
  "static:no_liquid":
    "Static pressure {static} sits {excess} below saturation ({saturation}) at the {@what} of {reference}: no liquid left, so the air check is not valid.",
  "static:normal":
    "Static pressure {static} matches saturation ({saturation}) at the {@what} of {reference} within {tolerance}[ after {soakTime} of soak]: no sign of air{@weak}.",
  "static:slightly_high":
    "Static pressure {static} sits {excess} above saturation ({saturation}) at the {@what} of {reference}[ after {soakTime} of soak]{@weak}.",
  "static:high":
    "Static pressure {static} sits {excess} above saturation ({saturation}) at the {@what} of {reference}[ after {soakTime} of soak]{@weak}.",
  "static:very_high":
    "Static pressure {static} sits {excess} above saturation ({saturation}) at the {@what} of {reference}[ after {soakTime} of soak]{@weak}.",
  "cycling:opens_late":
    "The clutch cuts out only at {cutOut} ({cutOutSat} saturation), below the {cutOutMin:n} to {cutOutMax} a cycling switch usually opens at: the evaporator can ice before it cuts out.",
  "cycling:normal":
    "The clutch cuts out at {cutOut} and back in at {cutIn} ({cutOutSat} and {cutInSat} saturation): the cycling switch works at its usual points.",
  "cycling:opens_early":
    "The clutch cuts out already at {cutOut} ({cutOutSat} saturation), above the {cutOutMin:n} to {cutOutMax} a cycling switch usually opens at: it stops cooling early.",
  "cycling:closes_late":
    "The clutch cuts back in only at {cutIn} ({cutInSat} saturation), above the {cutInMin:n} to {cutInMax} a cycling switch usually closes at: long pauses with little cooling.",
  "pattern:compressor_not_pumping":
    "Low side {low} above its band while the high side {high} is below its band: the compressor is not pumping. A short charge lowers both sides, so it cannot do this.",
} as const satisfies Partial<Record<ObservationId, string>>;

const NOTE_TEMPLATES = {
  "note:mixed_skips_pt":
    "Pressure–temperature checks were skipped: the saturation tables hold only for pure refrigerant.",
  "note:r744_limited":
    "R-744 (CO2) systems are covered only as far as the saturation tables go; follow the vehicle maker's figures.",
  "note:transcritical":
    "High side {high} is above the critical pressure of {@refrigerant}: the gas cooler runs transcritical, so there is no condensing temperature or subcooling to judge.",
  "note:high_outside_table":
    "High side {high} is outside the saturation table for {@refrigerant}; it was not graded.",
  "note:low_outside_table":
    "Low side {low} is outside the saturation table for {@refrigerant}; it was not graded.",
  "note:static_outside_table":
    "Static pressure check not possible: {ambient} is outside the {@refrigerant} saturation table.",
  "note:static_too_cold":
    "Static pressure not judged: at {reference} the pressures of a full and a nearly empty system are too close; let the system warm to above {coldest} and read it again.",
  "note:static_outside_table_co2":
    "Static pressure check not possible: {ambient} is outside the R-744 saturation table (CO2 has no liquid above about {critical}).",
  "clutch:never_cycles_icing":
    "Reported: the clutch never switches off on a cycling-clutch system at {ambient}, with the low side below a switch's {cutOut} cut-out.",
  "note:never_cycles_variable":
    "A clutch that never switches off is normal on a variable-displacement compressor: it was not counted.",
  "note:never_cycles_electric": "An electric compressor has no clutch to cycle: that answer was not counted.",
  "note:never_cycles_type_unknown":
    "A clutch that never switches off says something only on a cycling-clutch compressor, and the compressor type is not known: it was not counted.",
  "note:never_cycles_high_load":
    "At {ambient} the load keeps a cycling clutch engaged (it points to icing only up to about {mildMax}): a clutch that never switches off was not counted.",
  "note:never_cycles_low_side_unknown":
    "A clutch that never switches off points to icing only with the low side below its cut-out; without a low-side reading it was not counted.",
  "note:never_cycles_low_side_above":
    "The low side evaporates at {evaporating}, above a cycling switch's {cutOut} cut-out: a clutch that never switches off was not counted.",
  "note:no_clutch_electric":
    "An electric compressor has no clutch or belt: the answer about {@symptom} was not counted; its speed request and inverter data come from a scan tool.",
  "note:cycling_points_not_cycling":
    "The low side at cut-out and cut-in applies to a cycling clutch only: it was not graded.",
  "note:low_side_in_swing":
    "On a cycling clutch the low side swings between cut-out and cut-in, so one reading counts for half: record it at cut-out and at cut-in.",
  "note:low_side_graded_at_cut_points":
    "The low side was judged at the clutch's cut-out and cut-in, not at a single moment of the swing.",
  "note:identifier_blind_to_sealant":
    "The identifier's pass does not count against contamination here: most identifiers cannot see sealant.",
  "limit:above": "{@what} above {limit} is not plausible",
  "limit:below": "{@what} below {limit} is not plausible",
  "limit:negative": "{@what} cannot be negative",
  "limit:vacuum": "{@what} cannot be below a perfect vacuum ({limit})",
  "gate:mixed":
    "The refrigerant failed identification: it must be dealt with before any other repair, and pressure–temperature checks are not valid on a mix.",
  "gate:sealant":
    "Sealant was found: it must be dealt with before the shop's equipment is connected, whatever else is wrong.",
  "gate:empty": "The system is empty: find and repair the leak before running any test.",
} as const;

function symptomTemplate(symptom: SymptomId): string {
  const label = SYMPTOM_LABELS[symptom];
  if (label.startsWith("Checked: ")) return `${label}.`;
  // Lower-case the first word unless it is an abbreviation ("A/C").
  const first = /^[A-Z][a-z]/.test(label) ? label.charAt(0).toLowerCase() : label.charAt(0);
  return `Reported: ${first}${label.slice(1)}.`;
}

const SYMPTOM_TEMPLATES = Object.fromEntries(
  SYMPTOM_IDS.map((id) => [`symptom:${id}`, symptomTemplate(id)]),
) as Record<`symptom:${SymptomId}`, string>;

export type MessageKey =
  keyof typeof READING_TEMPLATES | keyof typeof NOTE_TEMPLATES | keyof typeof SYMPTOM_TEMPLATES;

export const MESSAGE_TEMPLATES: Readonly<Record<MessageKey, string>> = {
  ...READING_TEMPLATES,
  ...NOTE_TEMPLATES,
  ...SYMPTOM_TEMPLATES,
};
