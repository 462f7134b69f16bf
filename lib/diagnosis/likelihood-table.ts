import type { CauseId } from "./causes";
import type { ObservationId } from "./observations";

/**
 * The scoring model, as data a senior technician can review.
 *
 * Each cause starts from a prior (log-odds that it is behind a cooling complaint
 * brought to a shop). Each observation adds, per cause, a natural-log likelihood
 * ratio: + means "seen more often when this cause is present", − "less often".
 * A cause left out of a row is unaffected by that observation. The weights are
 * our calibration of the published signatures named in `source`; the size of a
 * weight is judgement (`common practice`) unless said otherwise.
 *
 * Gates record the two cases where the trade acts before ranking anything else.
 * Editing anything here changes ENGINE_VERSION (see engine-version.ts).
 */
export interface CausePrior {
  logOdds: number;
  source: string;
}
export interface LikelihoodRow {
  observation: ObservationId;
  weights: Partial<Record<CauseId, number>>;
  source: string;
}
export interface RankingGate {
  when: readonly ObservationId[];
  leader: CauseId;
  marginLogOdds: number;
  /** The sentence shown as the leader's first piece of evidence (message-templates.ts). */
  message: "gate:mixed" | "gate:empty" | "gate:sealant";
  source: string;
}

const PRIOR_SOURCE = "from memory: rough share of cooling complaints seen in a general repair shop";
const PRESSURE_SIGNATURES =
  "Pressure signatures: the trade's four gauge patterns (both low: undercharge; both high: airflow, overcharge or air; low side high with high side low: compressor; low side low with high side high: high-side restriction) (common practice); weights common practice";
const BANDS =
  "Expected bands: US Army TM 5-3805-291-23-1 WP 0018 Table 1 quick-check pressures; weights common practice";
const SC_SH =
  "Subcooling and superheat as defined in a refrigeration textbook; their use to split charge from restriction (common practice); mobile target ranges from memory; weights common practice";
// Air's partial pressure raises the gauge, so subcooling worked out from it reads high with air too.
const AIR_INFLATES_SUBCOOLING =
  "; high subcooling does not count against air: air raises the head, and subcooling worked out from the gauge with it (Dalton's law; common practice)";
// An overcharge alone leaves the static at saturation: liquid's pressure depends on its temperature, not its amount.
const STATIC_SPLITS_OVERCHARGE =
  "; a static above saturation counts against a plain overcharge, which leaves the static at saturation (common practice: the static check separates the two)";
const STATIC_NCG =
  "Static P–T check: Dalton's law of partial pressures (a thermodynamics textbook); container non-condensable check in TM 5-3810-307-24-1-2 ch. 9; in-vehicle use common practice; weights common practice";
const CHARGE =
  "Charge by weight is the only absolute charge check: TM 5-3805-291-23-1; grades shared with the service record (lib/service/charge.ts); recovery may leave 18–30 % behind: SAE J2762; weights common practice";
const IDENTIFIER =
  "Identifier pass mark 98 %: SAE J2099 / J2912; NCG shown as weight %: SAE J2912; air-% grading from memory";
const CYCLING_SWITCH =
  "Cycling switch opens near 22–25 psig and closes near 45–47 psig R-134a (common practice); weights common practice";
const VENT = "Centre-vent 3–8 °C expected (common practice); warm threshold from memory";

export const CAUSE_PRIORS: Record<CauseId, CausePrior> = {
  undercharge: { logOdds: -0.6, source: PRIOR_SOURCE },
  condenser_airflow: { logOdds: -2.0, source: PRIOR_SOURCE },
  no_refrigerant_fault: { logOdds: -2.0, source: PRIOR_SOURCE },
  overcharge: { logOdds: -2.4, source: PRIOR_SOURCE },
  non_condensables: { logOdds: -2.7, source: PRIOR_SOURCE },
  metering_restriction: { logOdds: -2.7, source: PRIOR_SOURCE },
  weak_compressor: { logOdds: -2.7, source: PRIOR_SOURCE },
  evaporator_icing: { logOdds: -2.9, source: PRIOR_SOURCE },
  moisture: { logOdds: -3.2, source: PRIOR_SOURCE },
  contaminated_refrigerant: { logOdds: -3.2, source: PRIOR_SOURCE },
  oil_loss: { logOdds: -3.2, source: PRIOR_SOURCE },
  high_side_restriction: { logOdds: -3.4, source: PRIOR_SOURCE },
  metering_stuck_open: { logOdds: -3.4, source: PRIOR_SOURCE },
};

// prettier-ignore -- one row per observation reads as a table in review
export const LIKELIHOOD_TABLE: readonly LikelihoodRow[] = [
  // High side against the expected band for the ambient
  {
    observation: "high_side:very_low",
    source: PRESSURE_SIGNATURES,
    weights: {
      undercharge: 1.5,
      weak_compressor: 1.3,
      metering_restriction: 0.8,
      metering_stuck_open: 0.3,
      evaporator_icing: 0.3,
      oil_loss: 0.3,
      overcharge: -2.0,
      non_condensables: -2.0,
      condenser_airflow: -2.0,
      high_side_restriction: -0.5,
      no_refrigerant_fault: -1.5,
    },
  },
  {
    observation: "high_side:low",
    source: PRESSURE_SIGNATURES,
    weights: {
      undercharge: 1.0,
      weak_compressor: 0.9,
      metering_restriction: 0.5,
      metering_stuck_open: 0.4,
      evaporator_icing: 0.3,
      overcharge: -1.2,
      non_condensables: -1.2,
      condenser_airflow: -1.2,
      high_side_restriction: -0.3,
      no_refrigerant_fault: -0.6,
    },
  },
  {
    observation: "high_side:normal",
    source: BANDS,
    weights: {
      no_refrigerant_fault: 0.8,
      moisture: 0.3,
      evaporator_icing: 0.2,
      metering_stuck_open: 0.2,
      overcharge: -0.8,
      non_condensables: -0.8,
      condenser_airflow: -0.8,
      undercharge: -0.5,
      weak_compressor: -0.6,
      high_side_restriction: -0.2,
    },
  },
  {
    observation: "high_side:high",
    source: PRESSURE_SIGNATURES,
    weights: {
      overcharge: 1.0,
      non_condensables: 1.0,
      condenser_airflow: 1.0,
      high_side_restriction: 0.7,
      undercharge: -1.5,
      weak_compressor: -1.5,
      metering_stuck_open: -0.3,
      no_refrigerant_fault: -1.0,
    },
  },
  {
    observation: "high_side:very_high",
    source: PRESSURE_SIGNATURES,
    weights: {
      overcharge: 1.5,
      non_condensables: 1.6,
      condenser_airflow: 1.6,
      high_side_restriction: 1.0,
      undercharge: -2.5,
      weak_compressor: -2.0,
      metering_stuck_open: -0.5,
      evaporator_icing: -1.0,
      moisture: -0.5,
      no_refrigerant_fault: -2.0,
    },
  },

  // Low side against the expected band
  {
    observation: "low_side:vacuum",
    source:
      "Low side near vacuum → metering restriction; moisture freezing at the metering device pulls it toward vacuum (common practice); weights common practice",
    weights: {
      metering_restriction: 2.0,
      moisture: 1.2,
      high_side_restriction: 1.0,
      undercharge: 0.6,
      evaporator_icing: 0.3,
      overcharge: -2.0,
      non_condensables: -1.5,
      condenser_airflow: -1.5,
      weak_compressor: -2.0,
      metering_stuck_open: -2.5,
      no_refrigerant_fault: -2.5,
    },
  },
  {
    observation: "low_side:very_low",
    source: PRESSURE_SIGNATURES,
    weights: {
      metering_restriction: 1.3,
      undercharge: 1.0,
      high_side_restriction: 0.8,
      evaporator_icing: 1.0,
      moisture: 0.6,
      overcharge: -1.5,
      non_condensables: -1.0,
      condenser_airflow: -1.0,
      weak_compressor: -1.5,
      metering_stuck_open: -2.0,
      no_refrigerant_fault: -1.5,
    },
  },
  {
    observation: "low_side:low",
    source: PRESSURE_SIGNATURES,
    weights: {
      undercharge: 0.8,
      evaporator_icing: 0.6,
      metering_restriction: 0.5,
      high_side_restriction: 0.5,
      moisture: 0.3,
      overcharge: -1.0,
      non_condensables: -0.5,
      condenser_airflow: -0.5,
      weak_compressor: -1.0,
      metering_stuck_open: -1.5,
      no_refrigerant_fault: -0.5,
    },
  },
  {
    observation: "low_side:normal",
    source: BANDS,
    weights: {
      no_refrigerant_fault: 0.8,
      non_condensables: 0.2,
      condenser_airflow: 0.1,
      moisture: 0.2,
      undercharge: -0.5,
      metering_restriction: -1.0,
      high_side_restriction: -0.5,
      metering_stuck_open: -0.8,
      weak_compressor: -0.8,
      evaporator_icing: -0.5,
    },
  },
  {
    observation: "low_side:high",
    source:
      "Low side high with overcharge, a weak compressor, or an expansion valve stuck open with the high side near normal (common practice); weights common practice",
    weights: {
      overcharge: 1.0,
      metering_stuck_open: 1.4,
      weak_compressor: 1.2,
      non_condensables: 0.6,
      condenser_airflow: 0.7,
      undercharge: -2.0,
      metering_restriction: -2.0,
      high_side_restriction: -1.5,
      evaporator_icing: -1.5,
      moisture: -0.5,
      no_refrigerant_fault: -1.0,
    },
  },

  // Physics before priors: readings no amount of prior can explain for some causes
  {
    observation: "pattern:compressor_not_pumping",
    source:
      "Four gauge patterns: low side high with high side low is a compressor not pumping; a short charge lowers both sides and a restriction lowers the low side (common practice); −4 (about 1 in 55) is 'all but excludes'",
    weights: {
      undercharge: -4.0,
      metering_restriction: -4.0,
      high_side_restriction: -4.0,
      weak_compressor: 0.5,
    },
  },

  // Absolute compression ratio while running
  {
    observation: "lift:close",
    source: "Weak compressor: high and low side close together (common practice); threshold from memory",
    weights: {
      weak_compressor: 1.5,
      metering_stuck_open: 0.3,
      overcharge: -0.3,
      undercharge: -0.3,
      no_refrigerant_fault: -1.0,
    },
  },
  { observation: "lift:normal", source: "common practice", weights: { weak_compressor: -0.6 } },

  // Subcooling at the condenser outlet
  {
    observation: "subcooling:none",
    source: SC_SH,
    weights: {
      undercharge: 1.5,
      weak_compressor: 0.3,
      overcharge: -2.0,
      high_side_restriction: -1.5,
      metering_restriction: -1.5,
      non_condensables: -0.5,
      condenser_airflow: -0.3,
      no_refrigerant_fault: -1.0,
    },
  },
  {
    observation: "subcooling:low",
    source: SC_SH,
    weights: {
      undercharge: 0.8,
      weak_compressor: 0.4,
      non_condensables: 0.3,
      condenser_airflow: 0.3,
      overcharge: -1.0,
      high_side_restriction: -1.0,
      metering_restriction: -1.0,
      no_refrigerant_fault: -0.3,
    },
  },
  {
    observation: "subcooling:normal",
    source: SC_SH + "; air gives a high head with subcooling not raised to match (common practice)",
    weights: {
      no_refrigerant_fault: 0.6,
      non_condensables: 0.4,
      condenser_airflow: 0.2,
      undercharge: -0.8,
      overcharge: -0.5,
      high_side_restriction: -0.6,
      metering_restriction: -0.6,
    },
  },
  {
    observation: "subcooling:high",
    source: SC_SH + AIR_INFLATES_SUBCOOLING,
    weights: {
      overcharge: 1.0,
      high_side_restriction: 1.0,
      metering_restriction: 1.0,
      undercharge: -1.5,
      condenser_airflow: -0.2,
      no_refrigerant_fault: -0.8,
    },
  },
  {
    observation: "subcooling:very_high",
    source: SC_SH + AIR_INFLATES_SUBCOOLING,
    weights: {
      overcharge: 1.4,
      high_side_restriction: 1.5,
      metering_restriction: 1.4,
      undercharge: -2.5,
      condenser_airflow: -0.5,
      weak_compressor: -0.5,
      no_refrigerant_fault: -1.5,
    },
  },

  // Superheat at the evaporator outlet (grades already account for the expansion device)
  {
    observation: "superheat:near_zero",
    source:
      "Expansion valve flooding: superheat near zero, suction line cold (common practice); weights common practice",
    weights: {
      metering_stuck_open: 1.8,
      overcharge: 0.8,
      evaporator_icing: 0.3,
      undercharge: -1.5,
      metering_restriction: -1.5,
      high_side_restriction: -1.0,
      moisture: -0.5,
      no_refrigerant_fault: -0.5,
    },
  },
  {
    observation: "superheat:normal",
    source: SC_SH,
    weights: {
      no_refrigerant_fault: 0.6,
      undercharge: -0.5,
      metering_restriction: -0.8,
      high_side_restriction: -0.5,
      metering_stuck_open: -0.8,
    },
  },
  {
    observation: "superheat:high",
    source:
      SC_SH +
      "; orifice tube: accumulator outlet warmer than inlet suggests undercharge (TM 5-3805-291-23-1)",
    weights: {
      undercharge: 1.0,
      metering_restriction: 1.0,
      high_side_restriction: 0.8,
      moisture: 0.6,
      overcharge: -1.2,
      metering_stuck_open: -2.0,
      evaporator_icing: -0.3,
      no_refrigerant_fault: -0.8,
    },
  },
  {
    observation: "superheat:very_high",
    source: SC_SH,
    weights: {
      undercharge: 1.4,
      metering_restriction: 1.6,
      high_side_restriction: 1.2,
      moisture: 0.8,
      overcharge: -2.0,
      metering_stuck_open: -2.5,
      evaporator_icing: -0.8,
      no_refrigerant_fault: -1.5,
    },
  },

  // Static pressure against saturation at ambient. Non-condensables must rise monotonically down this list.
  {
    observation: "static:empty",
    source:
      "Static near 0 kPa gauge: no refrigerant, find the leak before running (common practice); EU F-gas rule: no refill before repair (Directive 2006/40/EC Art. 7)",
    weights: {
      undercharge: 3.0,
      oil_loss: 0.8,
      non_condensables: -2.0,
      overcharge: -3.0,
      metering_restriction: -1.5,
      high_side_restriction: -1.5,
      metering_stuck_open: -1.5,
      condenser_airflow: -1.5,
      weak_compressor: -1.5,
      evaporator_icing: -1.5,
      no_refrigerant_fault: -3.0,
    },
  },
  {
    observation: "static:no_liquid",
    source: STATIC_NCG + "; below saturation means no liquid left (common practice)",
    weights: {
      undercharge: 2.0,
      oil_loss: 0.3,
      non_condensables: -1.5,
      overcharge: -2.5,
      metering_restriction: -0.8,
      high_side_restriction: -0.8,
      metering_stuck_open: -0.8,
      condenser_airflow: -0.5,
      evaporator_icing: -0.8,
      no_refrigerant_fault: -2.0,
    },
  },
  {
    observation: "static:normal",
    source: STATIC_NCG + STATIC_SPLITS_OVERCHARGE,
    weights: {
      non_condensables: -1.5,
      contaminated_refrigerant: -0.8,
      undercharge: -0.3,
      no_refrigerant_fault: 0.3,
    },
  },
  {
    observation: "static:slightly_high",
    source: STATIC_NCG + STATIC_SPLITS_OVERCHARGE,
    weights: {
      overcharge: -0.4,
      non_condensables: 0.9,
      contaminated_refrigerant: 0.4,
      undercharge: -0.3,
      no_refrigerant_fault: -0.3,
    },
  },
  {
    observation: "static:high",
    source: STATIC_NCG + STATIC_SPLITS_OVERCHARGE,
    weights: {
      overcharge: -0.8,
      non_condensables: 2.0,
      contaminated_refrigerant: 0.8,
      undercharge: -0.3,
      no_refrigerant_fault: -1.0,
    },
  },
  {
    observation: "static:very_high",
    source: STATIC_NCG + STATIC_SPLITS_OVERCHARGE,
    weights: {
      overcharge: -1.2,
      non_condensables: 2.6,
      contaminated_refrigerant: 1.2,
      undercharge: -0.3,
      no_refrigerant_fault: -1.5,
    },
  },

  // Recovered mass against the label charge. Overcharge must rise and undercharge fall monotonically down this list.
  {
    observation: "charge:empty",
    source: CHARGE,
    weights: {
      undercharge: 3.0,
      oil_loss: 0.8,
      overcharge: -3.5,
      non_condensables: -1.0,
      weak_compressor: -2.0,
      evaporator_icing: -1.5,
      condenser_airflow: -1.5,
      high_side_restriction: -1.0,
      metering_restriction: -1.0,
      metering_stuck_open: -1.0,
      no_refrigerant_fault: -3.0,
    },
  },
  {
    observation: "charge:very_low",
    source: CHARGE + "; weigh the charge before condemning a compressor (common practice)",
    weights: {
      undercharge: 2.2,
      oil_loss: 0.5,
      overcharge: -3.0,
      weak_compressor: -1.5,
      non_condensables: -0.3,
      metering_restriction: -1.0,
      high_side_restriction: -1.0,
      metering_stuck_open: -1.0,
      evaporator_icing: -1.0,
      condenser_airflow: -0.8,
      no_refrigerant_fault: -2.0,
    },
  },
  {
    observation: "charge:low",
    source: CHARGE,
    weights: {
      undercharge: 1.0,
      oil_loss: 0.2,
      overcharge: -2.5,
      weak_compressor: -0.3,
      metering_restriction: -0.3,
      no_refrigerant_fault: -0.8,
    },
  },
  {
    observation: "charge:slightly_low",
    source:
      CHARGE + "; 5–12 % short is a possible slow leak to test for, not a certain one (common practice)",
    weights: {
      undercharge: 0.5,
      oil_loss: 0.1,
      overcharge: -2.0,
      no_refrigerant_fault: -0.3,
    },
  },
  {
    observation: "charge:ok",
    source: CHARGE,
    weights: {
      no_refrigerant_fault: 0.8,
      weak_compressor: 0.8,
      metering_restriction: 0.5,
      high_side_restriction: 0.5,
      metering_stuck_open: 0.4,
      condenser_airflow: 0.4,
      evaporator_icing: 0.4,
      moisture: 0.3,
      non_condensables: 0.3,
      undercharge: -2.0,
      overcharge: -2.0,
    },
  },
  {
    observation: "charge:high",
    source: CHARGE,
    weights: { overcharge: 1.3, undercharge: -2.5, no_refrigerant_fault: -0.8 },
  },
  {
    observation: "charge:very_high",
    source: CHARGE + "; overcharge often follows a top-off (common practice)",
    weights: { overcharge: 2.5, undercharge: -3.0, no_refrigerant_fault: -1.5 },
  },

  // Refrigerant identifier
  {
    observation: "purity:fail",
    source: IDENTIFIER + "; do not recover into shop equipment, use SAE J2851-type equipment",
    weights: { contaminated_refrigerant: 4.0, no_refrigerant_fault: -2.0 },
  },
  { observation: "purity:pass", source: IDENTIFIER, weights: { contaminated_refrigerant: -2.5 } },
  {
    observation: "air:none",
    source: IDENTIFIER,
    weights: { non_condensables: -3.5, contaminated_refrigerant: -0.3 },
  },
  { observation: "air:some", source: IDENTIFIER, weights: { non_condensables: 1.2 } },
  {
    observation: "air:high",
    source: IDENTIFIER,
    weights: { non_condensables: 2.5, no_refrigerant_fault: -1.0 },
  },

  // Centre-vent temperature
  {
    observation: "vent:freezing",
    source: VENT + "; below about 3 °C the evaporator can freeze (common practice)",
    weights: {
      evaporator_icing: 1.2,
      moisture: 0.3,
      undercharge: -1.0,
      metering_stuck_open: -1.0,
      no_refrigerant_fault: -0.3,
    },
  },
  {
    observation: "vent:cold",
    source: VENT,
    weights: {
      no_refrigerant_fault: 1.5,
      evaporator_icing: 0.2,
      undercharge: -1.0,
      metering_restriction: -1.0,
      high_side_restriction: -1.0,
      weak_compressor: -1.5,
      metering_stuck_open: -1.0,
      overcharge: -0.8,
      non_condensables: -0.8,
      condenser_airflow: -0.8,
      contaminated_refrigerant: -0.5,
      moisture: -0.3,
    },
  },
  {
    observation: "vent:cool",
    source: VENT,
    weights: {
      undercharge: 0.3,
      overcharge: 0.2,
      condenser_airflow: 0.2,
      non_condensables: 0.2,
      moisture: 0.2,
      no_refrigerant_fault: -0.3,
    },
  },
  {
    observation: "vent:warm",
    source: VENT,
    weights: {
      undercharge: 0.6,
      metering_restriction: 0.8,
      high_side_restriction: 0.6,
      weak_compressor: 0.8,
      metering_stuck_open: 0.5,
      overcharge: 0.4,
      non_condensables: 0.4,
      condenser_airflow: 0.4,
      contaminated_refrigerant: 0.3,
      no_refrigerant_fault: -2.0,
    },
  },

  // Cycling clutch: the low side at cut-out and cut-in against a switch's usual points
  {
    observation: "cycling:opens_late",
    source: CYCLING_SWITCH + "; a switch that opens late lets the evaporator ice",
    weights: { evaporator_icing: 2.0, no_refrigerant_fault: -1.0 },
  },
  {
    observation: "cycling:normal",
    source: CYCLING_SWITCH,
    weights: { evaporator_icing: -1.0, no_refrigerant_fault: 0.2 },
  },
  {
    observation: "cycling:opens_early",
    source: CYCLING_SWITCH + "; a switch that opens early cuts cooling short (cycling-control fault)",
    weights: { evaporator_icing: 1.0, no_refrigerant_fault: -0.8 },
  },
  {
    observation: "cycling:closes_late",
    source: CYCLING_SWITCH + "; a switch that closes late leaves long warm pauses (cycling-control fault)",
    weights: { evaporator_icing: 1.0, no_refrigerant_fault: -0.8 },
  },

  // System design
  {
    observation: "device:orifice_tube",
    source:
      "An orifice tube has no moving part to stick open; cycling-clutch orifice systems depend on the cycling switch to stop icing (common practice)",
    weights: { metering_stuck_open: -1.5, evaporator_icing: 0.3 },
  },
  { observation: "device:txv", source: "common practice", weights: { evaporator_icing: -0.2 } },

  // Behaviour reported at the interview
  {
    observation: "symptom:high_pressure_cutout",
    source: PRESSURE_SIGNATURES + "; high-pressure cut-out on overcharge, air, airflow or restriction",
    weights: {
      overcharge: 1.0,
      non_condensables: 1.0,
      condenser_airflow: 1.2,
      high_side_restriction: 0.8,
      undercharge: -1.5,
      weak_compressor: -1.5,
      evaporator_icing: -0.5,
      metering_stuck_open: -0.5,
      no_refrigerant_fault: -1.5,
    },
  },
  {
    observation: "symptom:clutch_rapid_cycling",
    source: "Orifice-tube undercharge: rapid short cycling (TM 5-3805-291-23-1; common practice)",
    weights: {
      undercharge: 1.3,
      metering_restriction: 0.5,
      high_side_restriction: 0.3,
      evaporator_icing: -1.0,
      overcharge: -0.5,
      no_refrigerant_fault: -0.5,
    },
  },
  {
    observation: "symptom:clutch_not_cycling",
    source:
      "Evaporator icing: the clutch fails to cycle off (common practice); counted only on a cycling clutch in mild weather with the low side below its cut-out",
    weights: { evaporator_icing: 1.5, undercharge: -0.5 },
  },
  {
    observation: "symptom:cooling_fades_then_returns",
    source:
      "Moisture: cools for 5–15 min, then warms, and repeats; icing cools again after a melt (common practice)",
    weights: { moisture: 1.8, evaporator_icing: 1.3, undercharge: 0.2, no_refrigerant_fault: -1.5 },
  },
  {
    observation: "symptom:low_side_swings_to_vacuum",
    source: "Moisture freezing and thawing at the metering device (common practice)",
    weights: { moisture: 2.0, metering_restriction: 0.6, evaporator_icing: -0.3, no_refrigerant_fault: -2.0 },
  },
  {
    observation: "symptom:worse_at_idle",
    source: "Weak cooling at idle, better at road speed → condenser airflow (common practice)",
    weights: {
      condenser_airflow: 1.5,
      overcharge: 0.5,
      non_condensables: 0.3,
      undercharge: 0.3,
      no_refrigerant_fault: -0.5,
    },
  },
  {
    observation: "symptom:condenser_fan_not_running",
    source: "Fan not running → condenser airflow (common practice)",
    weights: { condenser_airflow: 3.0, overcharge: -0.3, non_condensables: -0.3, no_refrigerant_fault: -2.0 },
  },
  {
    observation: "symptom:frost_at_metering_device",
    source:
      "Frost at the metering device: a restriction or moisture ice; frost at the evaporator inlet only with a low charge (common practice)",
    weights: {
      metering_restriction: 1.3,
      moisture: 1.0,
      undercharge: 0.5,
      evaporator_icing: 0.3,
      high_side_restriction: 0.3,
      no_refrigerant_fault: -1.0,
    },
  },
  {
    observation: "symptom:frost_on_liquid_line",
    source: "Frosted high-pressure liquid line at a restriction (common practice)",
    weights: {
      high_side_restriction: 2.5,
      metering_restriction: 0.3,
      undercharge: -0.5,
      no_refrigerant_fault: -1.5,
    },
  },
  {
    observation: "symptom:suction_line_frosted",
    source: "Flooding evaporator: suction line frosted back toward the compressor (common practice)",
    weights: {
      metering_stuck_open: 1.5,
      overcharge: 0.8,
      evaporator_icing: 0.8,
      undercharge: -1.5,
      metering_restriction: -1.0,
      no_refrigerant_fault: -0.5,
    },
  },
  {
    observation: "symptom:gauge_needle_flutter",
    source: "High-side flutter with air; low-side flutter with compressor valve damage (common practice)",
    weights: { non_condensables: 0.8, weak_compressor: 1.0, moisture: 0.3, no_refrigerant_fault: -0.5 },
  },
  {
    observation: "symptom:compressor_noise",
    source:
      "About a third of compressor failures are lubrication failures (from memory); liquid slugging when flooded (common practice)",
    weights: {
      weak_compressor: 1.2,
      oil_loss: 1.3,
      overcharge: 0.4,
      metering_stuck_open: 0.3,
      no_refrigerant_fault: -0.8,
    },
  },
  {
    observation: "symptom:moisture_indicator_wet",
    source: "Moisture indicator colour on the receiver-drier (common practice)",
    weights: { moisture: 2.5, no_refrigerant_fault: -1.0 },
  },
  {
    observation: "symptom:bubbles_in_sight_glass",
    source:
      "Sight glass streams of bubbles with low charge (TM 5-3805-291-23-1); occasional bubbles with air (common practice)",
    weights: { undercharge: 1.3, non_condensables: 0.5, overcharge: -1.0, no_refrigerant_fault: -0.8 },
  },
  {
    observation: "symptom:oil_residue_at_fitting",
    source: "Oily residue or dye at the leak point (common practice)",
    weights: { undercharge: 1.2, oil_loss: 1.0, no_refrigerant_fault: -0.5 },
  },
  {
    observation: "symptom:oil_pulled_during_recovery",
    source:
      "Oil removed at recovery must be added back (TM 5-3810-307-24-1-2 ch. 9); accumulator systems lose oil on fast recovery (common practice)",
    weights: { oil_loss: 2.0 },
  },
  {
    observation: "symptom:recent_service_elsewhere",
    source: "Most repeat failures are installer-controllable (from memory); common practice",
    weights: {
      overcharge: 0.6,
      non_condensables: 0.6,
      contaminated_refrigerant: 0.8,
      moisture: 0.5,
      oil_loss: 0.4,
    },
  },
  {
    observation: "symptom:evaporator_airflow_drops",
    source: "Icing: very cold at first, then the airflow falls (common practice)",
    weights: { evaporator_icing: 2.0, moisture: 0.8, no_refrigerant_fault: -1.0 },
  },
  {
    observation: "symptom:pressures_equalise_fast",
    source: "Weak compressor: pressures equalise very fast at shut-off (common practice)",
    weights: { weak_compressor: 1.5 },
  },
  {
    observation: "symptom:clutch_or_belt_slipping",
    source: "Slipping clutch or belt: compressor not pumping (common practice)",
    weights: { weak_compressor: 1.5, oil_loss: 0.5 },
  },
  {
    observation: "symptom:identifier_flags_hydrocarbon",
    source: "Identifier must flag hydrocarbons (SAE J2912)",
    weights: { contaminated_refrigerant: 3.0 },
  },
  {
    observation: "symptom:condenser_fan_running",
    source: "common practice",
    weights: { condenser_airflow: -1.0 },
  },
  {
    observation: "symptom:water_spray_drops_head_pressure",
    source: "Water spray on the condenser drops an airflow-starved head sharply (common practice)",
    weights: { condenser_airflow: 2.0, overcharge: -0.3, high_side_restriction: -0.5 },
  },
  {
    observation: "symptom:water_spray_no_change",
    source: "common practice",
    weights: { condenser_airflow: -2.0, overcharge: 0.5, non_condensables: 0.5, high_side_restriction: 0.8 },
  },
  {
    observation: "symptom:low_side_steady",
    source: "Moisture makes the low side swing; icing keeps it steadily low (common practice)",
    weights: { moisture: -2.0, evaporator_icing: 0.5 },
  },
  {
    observation: "symptom:txv_bulb_test_responds",
    source: "Expansion-valve bulb warm/chill test (common practice)",
    weights: { metering_stuck_open: -2.0, metering_restriction: -1.5 },
  },
  {
    observation: "symptom:txv_bulb_test_no_response",
    source: "Expansion-valve bulb warm/chill test (common practice)",
    weights: { metering_stuck_open: 1.5, metering_restriction: 1.5 },
  },
  {
    observation: "symptom:liquid_line_temperature_drop",
    source: "Sharp temperature drop at a high-side restriction (common practice)",
    weights: { high_side_restriction: 2.5, metering_restriction: -0.3, undercharge: -0.5 },
  },
  {
    observation: "symptom:liquid_line_even_temperature",
    source: "common practice",
    weights: { high_side_restriction: -2.0 },
  },
  {
    observation: "symptom:leak_found",
    source:
      "Leak detection per SAE J2791/J2913 (electronic), J2297 (dye), J2970 (tracer gas); air enters through low-side leaks in vacuum (common practice)",
    weights: {
      undercharge: 2.0,
      oil_loss: 0.5,
      non_condensables: 0.3,
      moisture: 0.3,
      no_refrigerant_fault: -1.5,
    },
  },
  {
    observation: "symptom:no_leak_found",
    source: "Leak detection at 4 g/yr sensitivity (SAE J2791/J2913); common practice",
    weights: { undercharge: -1.0 },
  },
  // Oil has evidence of its own: oil that left with a part or at the drain and was not put back.
  {
    observation: "symptom:part_replaced_no_oil_added",
    source:
      "A replaced part takes its oil with it and the same must go back (TM 5-3810-307-24-1-2 ch. 9 for oil removed; part allowances common practice); weights common practice",
    weights: { oil_loss: 2.0, weak_compressor: 0.3, no_refrigerant_fault: -0.8 },
  },
  {
    observation: "symptom:part_replaced_oil_added",
    source: "Oil put back with the part (common practice)",
    weights: { oil_loss: -0.8 },
  },
  {
    observation: "symptom:oil_short_at_drain",
    source:
      "Drain and measure the compressor's oil and restore the total to the maker's figure (common practice); weights common practice",
    weights: { oil_loss: 2.5, weak_compressor: 0.3, no_refrigerant_fault: -1.0 },
  },
  {
    observation: "symptom:oil_normal_at_drain",
    source: "Drain and measure the compressor's oil (common practice)",
    weights: { oil_loss: -2.0 },
  },
  // Sealant: contaminates the charge and the shop's equipment, and clumps into restrictions.
  {
    observation: "symptom:sealant_found",
    source:
      "Contaminated refrigerant includes sealant, which can clump with moisture and restrict flow; most identifiers cannot detect it (common practice); weights common practice",
    weights: { contaminated_refrigerant: 3.5, metering_restriction: 0.5, no_refrigerant_fault: -1.0 },
  },
  {
    observation: "symptom:no_sealant_found",
    source: "A clean service port is weak evidence: sealant may sit further in (common practice)",
    weights: { contaminated_refrigerant: -0.3 },
  },
];

export const RANKING_GATES: readonly RankingGate[] = [
  {
    when: ["purity:fail", "symptom:identifier_flags_hydrocarbon"],
    leader: "contaminated_refrigerant",
    marginLogOdds: 0.5,
    message: "gate:mixed",
    source:
      "SAE J2099 (≥98 % pure to recycle), SAE J2912 identifiers; identify before recovery (SAE J2843 equipment rules)",
  },
  {
    when: ["symptom:sealant_found"],
    leader: "contaminated_refrigerant",
    marginLogOdds: 0.5,
    message: "gate:sealant",
    source:
      "Sealant is refused or handled separately before any shop equipment is connected (common practice; SAE J2843 equipment rules for contaminated refrigerant)",
  },
  {
    when: ["static:empty", "charge:empty"],
    leader: "undercharge",
    marginLogOdds: 0.5,
    message: "gate:empty",
    source:
      "common practice; EU: no refill after an abnormal leak until repaired (Directive 2006/40/EC Art. 7)",
  },
];
