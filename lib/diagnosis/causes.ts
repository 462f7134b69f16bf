export const CAUSE_IDS = [
  "overcharge",
  "undercharge",
  "non_condensables",
  "moisture",
  "metering_restriction",
  "high_side_restriction",
  "metering_stuck_open",
  "condenser_airflow",
  "weak_compressor",
  "evaporator_icing",
  "contaminated_refrigerant",
  "oil_loss",
  "no_refrigerant_fault",
] as const;

export type CauseId = (typeof CAUSE_IDS)[number];

/** Plain-language names for the UI and the owner summary. */
export const CAUSE_LABELS: Record<CauseId, string> = {
  overcharge: "Too much refrigerant (overcharge)",
  undercharge: "Not enough refrigerant (leak or undercharge)",
  non_condensables: "Air or other non-condensable gas in the system",
  moisture: "Moisture in the system (freezing at the expansion device)",
  metering_restriction: "Blocked or stuck-closed orifice tube or expansion valve",
  high_side_restriction: "Restriction on the high side (condenser, drier or liquid line)",
  metering_stuck_open: "Expansion valve stuck open (evaporator flooding)",
  condenser_airflow: "Poor airflow through the condenser (fan, debris, blockage)",
  weak_compressor: "Compressor not pumping well (internal wear, clutch or control valve)",
  evaporator_icing: "Evaporator icing up (cycling switch, sensor or cabin airflow)",
  contaminated_refrigerant: "Wrong, mixed or contaminated refrigerant",
  oil_loss: "Low or wrong compressor oil",
  no_refrigerant_fault: "Refrigerant circuit working normally",
};

/** Short trade names for sentences ("best separates overcharge from air in the system"). */
export const CAUSE_SHORT_NAMES: Record<CauseId, string> = {
  overcharge: "overcharge",
  undercharge: "undercharge or leak",
  non_condensables: "air in the system",
  moisture: "moisture",
  metering_restriction: "a metering-device restriction",
  high_side_restriction: "a high-side restriction",
  metering_stuck_open: "an expansion valve stuck open",
  condenser_airflow: "poor condenser airflow",
  weak_compressor: "a weak compressor",
  evaporator_icing: "evaporator icing",
  contaminated_refrigerant: "contaminated refrigerant",
  oil_loss: "oil loss",
  no_refrigerant_fault: "no refrigerant-circuit fault",
};

/** One-line titles for the findings' ranking on a phone; the full label says the rest beside the reasons. */
export const CAUSE_TITLES: Record<CauseId, string> = {
  overcharge: "Overcharge",
  undercharge: "Undercharge or leak",
  non_condensables: "Air in the system",
  moisture: "Moisture in the system",
  metering_restriction: "Metering device blocked",
  high_side_restriction: "High-side restriction",
  metering_stuck_open: "Expansion valve stuck open",
  condenser_airflow: "Poor condenser airflow",
  weak_compressor: "Weak compressor",
  evaporator_icing: "Evaporator icing",
  contaminated_refrigerant: "Wrong or mixed refrigerant",
  oil_loss: "Low or wrong oil",
  no_refrigerant_fault: "Refrigerant circuit working",
};
