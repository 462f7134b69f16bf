import type { SymptomId } from "@/lib/diagnosis";

export const refrigerantChoices = ["R-134a", "R-1234yf", "R-744"] as const;
export const expansionDeviceChoices = ["orifice_tube", "txv"] as const;
export const oilTypeChoices = ["pag", "poe", "pao", "mineral", "other"] as const;

/** The behaviour step asks for these; the rest of the engine's symptom list records next-check results. */
export const behaviourSymptomIds = [
  "high_pressure_cutout",
  "clutch_rapid_cycling",
  "clutch_not_cycling",
  "cooling_fades_then_returns",
  "low_side_swings_to_vacuum",
  "worse_at_idle",
  "condenser_fan_not_running",
  "frost_at_metering_device",
  "frost_on_liquid_line",
  "suction_line_frosted",
  "gauge_needle_flutter",
  "compressor_noise",
  "moisture_indicator_wet",
  "bubbles_in_sight_glass",
  "oil_residue_at_fitting",
  "oil_pulled_during_recovery",
  "recent_service_elsewhere",
] as const satisfies readonly SymptomId[];

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
