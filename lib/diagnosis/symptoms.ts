import { BEHAVIOUR_SYMPTOM_IDS, BEHAVIOUR_SYMPTOM_LABELS } from "./behaviour-symptoms";

export { BEHAVIOUR_SYMPTOM_IDS } from "./behaviour-symptoms";

/** What the technician saw, heard or found: the behaviour questions, then the results of next checks. */
export const SYMPTOM_IDS = [
  ...BEHAVIOUR_SYMPTOM_IDS,
  "evaporator_airflow_drops",
  "pressures_equalise_fast",
  "clutch_or_belt_slipping",
  "identifier_flags_hydrocarbon",
  "condenser_fan_running",
  "water_spray_drops_head_pressure",
  "water_spray_no_change",
  "low_side_steady",
  "txv_bulb_test_responds",
  "txv_bulb_test_no_response",
  "liquid_line_temperature_drop",
  "liquid_line_even_temperature",
  "leak_found",
  "no_leak_found",
  "no_sealant_found",
  "oil_short_at_drain",
  "oil_normal_at_drain",
] as const;

export type SymptomId = (typeof SYMPTOM_IDS)[number];

export const SYMPTOM_LABELS: Record<SymptomId, string> = {
  ...BEHAVIOUR_SYMPTOM_LABELS,
  evaporator_airflow_drops: "Vent air very cold at first, then airflow weakens",
  pressures_equalise_fast: "Pressures equalise very fast at shut-off",
  clutch_or_belt_slipping: "Compressor clutch or drive belt slipping",
  identifier_flags_hydrocarbon: "Identifier flags hydrocarbon (flammable)",
  condenser_fan_running: "Checked: condenser fan runs with A/C on",
  water_spray_drops_head_pressure: "Checked: water spray on the condenser drops the high side sharply",
  water_spray_no_change: "Checked: water spray on the condenser barely changes the high side",
  low_side_steady: "Checked: low side steady over 15 minutes",
  txv_bulb_test_responds: "Checked: low side responds when the expansion-valve bulb is warmed or chilled",
  txv_bulb_test_no_response:
    "Checked: low side does not respond to warming or chilling the expansion-valve bulb",
  liquid_line_temperature_drop: "Checked: sharp temperature drop along the liquid line",
  liquid_line_even_temperature: "Checked: liquid line temperature even from condenser to expansion device",
  leak_found: "Checked: leak found",
  no_leak_found: "Checked: no leak found at the detector's most sensitive setting",
  no_sealant_found: "Checked: no sealant at the service ports",
  oil_short_at_drain: "Checked: compressor oil drained and measured well short of its quantity",
  oil_normal_at_drain: "Checked: compressor oil drained and measured at about its quantity",
};
