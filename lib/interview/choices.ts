import { COMPRESSOR_TYPES } from "@/lib/vehicles/compressor-types";
import { BEHAVIOUR_SYMPTOM_IDS } from "@/lib/diagnosis/behaviour-symptoms";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";

/** The refrigerants offered everywhere (lib/refrigerants/catalog.ts says why R-12 is not among them). */
export const refrigerantChoices = SERVICE_REFRIGERANT_IDS;
export const expansionDeviceChoices = EXPANSION_DEVICE_IDS;
export const oilTypeChoices = ["pag", "poe", "pao", "mineral", "other"] as const;
/** The engine's compressor types, or "unknown" when the technician cannot tell. */
export const compressorTypeChoices = [...COMPRESSOR_TYPES, "unknown"] as const;
/** Was a part replaced recently, and was its oil put back? */
export const partReplacedChoices = ["none", "with_oil", "without_oil"] as const;
/** The compressor's oil, drained and measured against the maker's quantity. */
export const compressorOilChoices = ["not_drained", "about_right", "short"] as const;

/** The behaviour step asks for these; the rest of the engine's symptom list records next-check results. */
export const behaviourSymptomIds = BEHAVIOUR_SYMPTOM_IDS;

export const leakMethodChoices = [
  "electronic_detector",
  "uv_dye",
  "tracer_gas",
  "bubble_solution",
  "nitrogen_pressure_hold",
  "visual_oil_trace",
] as const;
export const leakPlaceChoices = [
  "compressor_shaft_seal",
  "compressor_body",
  "condenser",
  "evaporator",
  "hose",
  "line_joint",
  "service_port",
  "accumulator_or_receiver_drier",
  "expansion_device",
  "pressure_switch_or_sensor",
  "not_found_yet",
] as const;
export type BehaviourSymptomId = (typeof behaviourSymptomIds)[number];
