import { SERVICE_REFRIGERANT_OPTIONS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_OPTIONS } from "@/lib/vehicles/expansion-devices";
import type { GroupFields } from "./field-defs";
import { METHOD_OPTIONS, OIL_OPTIONS, PLACE_OPTIONS, SYMPTOM_OPTIONS } from "./labels";

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
    { name: "electricCompressor", label: "Electric (high-voltage) compressor?", kind: "yesno" },
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
  static: [{ name: "staticKpaGauge", label: "Static pressure (either gauge)", kind: "pressure" }],
  running: [
    { name: "highKpaGauge", label: "High side", kind: "pressure" },
    { name: "lowKpaGauge", label: "Low side", kind: "pressure" },
    { name: "liquidLineC", label: "Liquid line at the condenser outlet", kind: "temperature" },
    { name: "suctionLineC", label: "Suction line at the evaporator outlet", kind: "temperature" },
    { name: "ventC", label: "Centre vent", kind: "temperature" },
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
  ],
  leakFinding: [
    { name: "method", label: "How you searched", kind: "choice", options: METHOD_OPTIONS },
    { name: "whereFound", label: "Where it leaks", kind: "choice", options: PLACE_OPTIONS, optional: true },
    { name: "notes", label: "Notes", kind: "text", multiline: true },
  ],
};
