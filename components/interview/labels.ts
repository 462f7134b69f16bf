import { BEHAVIOUR_SYMPTOM_LABELS } from "@/lib/diagnosis/behaviour-symptoms";
import { COMPRESSOR_TYPE_LABELS } from "@/lib/vehicles/compressor-types";
import {
  behaviourSymptomIds,
  compressorOilChoices,
  compressorTypeChoices,
  leakMethodChoices,
  leakPlaceChoices,
  oilTypeChoices,
  partReplacedChoices,
} from "@/lib/interview/choices";
import { PERFORMANCE_TEST_CONDITIONS } from "@/lib/interview/performance-test";
import type { StepId } from "@/lib/interview/steps";
import type { ChoiceOption } from "./field-defs";

/** One line under each step's heading (the heading itself is the step's one name, STEP_LABELS). */
export const STEP_LEADS: Readonly<Record<StepId, string>> = {
  complaint: "What the owner says, in their words.",
  system: "From the under-hood label and what you can see.",
  conditions: "Where and how the readings are taken.",
  static:
    "Look for sealant before any hose goes on. Engine off for an hour or more, pressures equalised: read the static and the parts' temperature beside the lines.",
  running: `${PERFORMANCE_TEST_CONDITIONS}.`,
  behaviour: "Tick everything you noticed. Leave it empty if nothing stood out.",
  leakFinding: "The system has lost its charge: find the leak before anything is run or charged.",
  identification: "Run the identifier before anything goes into the recovery machine.",
  chargeAudit:
    "If you recovered the charge, what came out and how much oil with it; and what you know of the oil.",
  recoveryHeld: "This refrigerant must not go into the shop's recovery machine.",
  // The findings open with their own ranking under the step's name: no lead line above it.
  findings: "",
};

const OIL_LABELS: Record<(typeof oilTypeChoices)[number], string> = {
  pag: "PAG",
  poe: "POE (dielectric)",
  pao: "PAO",
  mineral: "Mineral",
  other: "Other",
};
const METHOD_LABELS: Record<(typeof leakMethodChoices)[number], string> = {
  electronic_detector: "Electronic detector",
  uv_dye: "UV dye",
  tracer_gas: "Tracer gas",
  bubble_solution: "Bubble solution",
  nitrogen_pressure_hold: "Nitrogen pressure hold",
  visual_oil_trace: "Oil trace by eye",
};
const PLACE_LABELS: Record<(typeof leakPlaceChoices)[number], string> = {
  compressor_shaft_seal: "Compressor shaft seal",
  compressor_body: "Compressor body",
  condenser: "Condenser",
  evaporator: "Evaporator",
  hose: "Hose",
  line_joint: "Line joint or O-ring",
  service_port: "Service port",
  accumulator_or_receiver_drier: "Accumulator or receiver-drier",
  expansion_device: "Expansion device",
  pressure_switch_or_sensor: "Pressure switch or sensor",
  not_found_yet: "Not found yet",
};

const COMPRESSOR_LABELS: Record<(typeof compressorTypeChoices)[number], string> = {
  ...COMPRESSOR_TYPE_LABELS,
  unknown: "Not known",
};
const PART_REPLACED_LABELS: Record<(typeof partReplacedChoices)[number], string> = {
  none: "No part replaced",
  with_oil: "Replaced, its oil put back",
  without_oil: "Replaced, no oil added",
};
const COMPRESSOR_OIL_LABELS: Record<(typeof compressorOilChoices)[number], string> = {
  not_drained: "Not drained",
  about_right: "About the maker's quantity",
  short: "Well short",
};

const options = <T extends string>(values: readonly T[], labels: Record<T, string>): ChoiceOption[] =>
  values.map((value) => ({ value, label: labels[value] }));

export const OIL_OPTIONS = options(oilTypeChoices, OIL_LABELS);
export const COMPRESSOR_OPTIONS = options(compressorTypeChoices, COMPRESSOR_LABELS);
export const PART_REPLACED_OPTIONS = options(partReplacedChoices, PART_REPLACED_LABELS);
export const COMPRESSOR_OIL_OPTIONS = options(compressorOilChoices, COMPRESSOR_OIL_LABELS);
export const METHOD_OPTIONS = options(leakMethodChoices, METHOD_LABELS);
export const PLACE_OPTIONS = options(leakPlaceChoices, PLACE_LABELS);
export const SYMPTOM_OPTIONS: ChoiceOption[] = behaviourSymptomIds.map((id) => ({
  value: id,
  label: BEHAVIOUR_SYMPTOM_LABELS[id],
}));
