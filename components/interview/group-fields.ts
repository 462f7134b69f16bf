import { SERVICE_REFRIGERANT_OPTIONS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_OPTIONS } from "@/lib/vehicles/expansion-devices";
import type { InterviewAnswers } from "@/lib/interview/answers";
import type { GroupId } from "@/lib/interview/steps";
import type { FieldDef, GroupFields } from "./field-defs";
import {
  COMPRESSOR_OIL_OPTIONS,
  COMPRESSOR_OPTIONS,
  METHOD_OPTIONS,
  OIL_OPTIONS,
  PART_REPLACED_OPTIONS,
  PLACE_OPTIONS,
  SYMPTOM_OPTIONS,
} from "./labels";

const cyclingClutch = (answers: InterviewAnswers) => answers.system?.compressorType === "cycling_clutch";

/** The questions of each group, in the order asked. Names are the answer schemas' field names. */
export const GROUP_FIELDS: GroupFields = {
  complaint: [
    { name: "ownerWords", label: "The complaint, in the owner's words", kind: "text", multiline: true },
  ],
  system: [
    {
      name: "refrigerant",
      label: "Refrigerant on the label",
      kind: "choice",
      options: SERVICE_REFRIGERANT_OPTIONS,
    },
    {
      name: "expansionDevice",
      label: "Expansion device",
      kind: "choice",
      options: EXPANSION_DEVICE_OPTIONS,
    },
    {
      name: "compressorType",
      label: "Compressor",
      kind: "choice",
      options: COMPRESSOR_OPTIONS,
      hint: "From the vehicle record or the spec table; a hybrid or electric car has an electric one.",
    },
    {
      name: "labelChargeG",
      label: "Label charge",
      kind: "mass",
      hint: "From the under-hood label or the spec table.",
    },
    { name: "oilType", label: "Oil type on the label", kind: "choice", options: OIL_OPTIONS, optional: true },
  ],
  conditions: [
    { name: "ambientC", label: "Air temperature at the condenser", kind: "temperature" },
    { name: "relativeHumidityPct", label: "Relative humidity", kind: "plain", unit: "%" },
    {
      name: "altitudeM",
      label: "Altitude",
      kind: "plain",
      unit: "m",
      hint: "Leave empty to use the shop's altitude.",
    },
    { name: "engineRpm", label: "Engine speed", kind: "plain", unit: "rpm" },
  ],
  static: [
    { name: "sealantSeen", label: "Sealant seen at the ports (before any hose goes on)?", kind: "yesno" },
    { name: "staticKpaGauge", label: "Static pressure (either gauge)", kind: "pressure" },
    {
      name: "staticSoakC",
      label: "Temperature of the parts, beside the lines",
      kind: "temperature",
      hint: "A contact thermometer on a line; the static is judged at this temperature.",
    },
    { name: "staticSoakMin", label: "Engine off for", kind: "plain", unit: "min", placeholder: "60" },
  ],
  running: [
    { name: "highKpaGauge", label: "High side", kind: "pressure" },
    { name: "lowKpaGauge", label: "Low side", kind: "pressure" },
    { name: "liquidLineC", label: "Liquid line at the condenser outlet", kind: "temperature" },
    { name: "suctionLineC", label: "Suction line at the evaporator outlet", kind: "temperature" },
    { name: "ventC", label: "Centre vent", kind: "temperature" },
    {
      name: "lowCutOutKpaGauge",
      label: "Pressure at clutch cut-out (low-side gauge)",
      kind: "pressure",
      showWhen: cyclingClutch,
    },
    {
      name: "lowCutInKpaGauge",
      label: "Pressure at clutch cut-in (low-side gauge)",
      kind: "pressure",
      showWhen: cyclingClutch,
    },
  ],
  behaviour: [{ name: "symptoms", label: "What you noticed", kind: "multi", options: SYMPTOM_OPTIONS }],
  identification: [
    { name: "purityPct", label: "Purity", kind: "plain", unit: "%" },
    { name: "airPct", label: "Air (non-condensables)", kind: "plain", unit: "%" },
    { name: "hydrocarbonFlagged", label: "Did the identifier flag hydrocarbon?", kind: "yesno" },
  ],
  chargeAudit: [
    { name: "recovered", label: "Did you recover the charge?", kind: "yesno" },
    { name: "recoveredChargeG", label: "Mass recovered", kind: "mass" },
    { name: "oilRemovedMl", label: "Oil drained with it", kind: "volume" },
    {
      name: "chargedG",
      label: "Mass charged after the repair",
      kind: "mass",
      hint: "Weighed in from the cylinder; leave empty until the system is recharged.",
    },
    {
      name: "partReplaced",
      label: "A part replaced recently?",
      kind: "choice",
      options: PART_REPLACED_OPTIONS,
      optional: true,
    },
    {
      name: "compressorOil",
      label: "Compressor oil, drained and measured",
      kind: "choice",
      options: COMPRESSOR_OIL_OPTIONS,
      optional: true,
    },
  ],
  leakFinding: [
    { name: "method", label: "How you searched", kind: "choice", options: METHOD_OPTIONS },
    { name: "whereFound", label: "Where it leaks", kind: "choice", options: PLACE_OPTIONS, optional: true },
    { name: "notes", label: "Notes", kind: "text", multiline: true },
  ],
};

/** The questions of a group that apply to this system, given the answers so far. */
export function fieldsFor(group: GroupId, answers: InterviewAnswers): FieldDef[] {
  const fields = GROUP_FIELDS[group];
  return fields.some((f) => f.showWhen)
    ? fields.filter((f) => f.showWhen === undefined || f.showWhen(answers))
    : fields;
}
