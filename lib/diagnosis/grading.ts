import { REFRIGERANT_IDS } from "@/lib/refrigerants";
import {
  CONDENSING_ABOVE_AMBIENT_K,
  EVAPORATING_C,
  EVAPORATING_RISE,
  HUMIDITY_SHIFT_MAX_K,
} from "@/lib/refrigerants/expected-bands";
import { STATIC_SOAK_SPREAD_K } from "@/lib/refrigerants/derived";
import { NEARLY_EMPTY_STATIC } from "@/lib/refrigerants/static-charge";
import { CHARGE_DEVIATION_LIMITS, chargeToleranceG } from "@/lib/service/charge-verdict";
import { PURITY_PASS_PCT } from "@/lib/service/identifier";

/**
 * Where each reading's grades begin. Part of the model: these are hashed into ENGINE_VERSION together
 * with the likelihood table, so moving a threshold changes the version stored with each case.
 */

// Grading margins beyond the expected band, K of saturation temperature (common practice: a few kelvin
// is within gauge and thermometer error; ten is a clear fault).
export const HIGH_SIDE_FAR_K = { below: 10, above: 8 } as const;
export const LOW_SIDE_FAR_BELOW_K = 8;
// The compressor's lift is "close together" this far under the smallest lift the bands allow (from memory).
export const LIFT_CLOSE_MARGIN_K = 5;
// Fallback when the physics core has no band: condensing 14–30 K over ambient (TM 5-3805-291-23-1
// quick-check table as converted by the physics core), evaporating −4…8 °C (common practice).
export const FALLBACK_CONDENSING_OVER_AMBIENT_K = { min: 14, max: 30 } as const;
export const FALLBACK_EVAPORATING_C = { min: -4, max: 8 } as const;

// Typical ranges, K (from memory; the vehicle maker's figures win). Valve systems subcool about 4–12 K: wider
// than the 3–8 K often quoted, since 10 K on a healthy valve system is common (stationary valve systems run
// 10–15 °F, common practice); they hold superheat 2–10 K. Orifice-tube systems subcool modestly, and their
// evaporators flood into the accumulator, so near-zero superheat is normal there (nearZero null: no grade).
export const SUBCOOLING_K = {
  txv: { none: 1, low: 4, high: 12, veryHigh: 18 },
  orifice_tube: { none: 0.5, low: 2, high: 8, veryHigh: 14 },
} as const;
export const SUPERHEAT_K = {
  txv: { nearZero: 2, high: 10, veryHigh: 20 },
  orifice_tube: { nearZero: null, high: 4, veryHigh: 12 },
} as const;
// At high load a fixed orifice cannot keep the evaporator fed and its outlet superheats: the orifice-tube
// superheat grades rise 0.5 K per K of ambient above 30 °C (common practice for the rise, from memory for
// the figures).
export const SUPERHEAT_LOAD = { fromC: 30, kPerK: 0.5 } as const;

// Next to no refrigerant left (the "empty" grade): the shared empty-system module's line, under about
// 70 kPa gauge or under half the saturation pressure at the soak temperature (lib/refrigerants/static-charge.ts).
export { NEARLY_EMPTY_STATIC as STATIC_EMPTY };
// Static excess as a temperature difference: Tsat(static) − the temperature the parts soaked to, K. Within
// 2 K is gauge and thermometer error (about ±1 K each way, from memory); 2/4/7 K are the former 35/70/140 kPa
// grades at 25 °C, where R-134a saturation rises about 20 kPa per kelvin (Tillner-Roth & Baehr 1994).
// More than 5 K below saturation no liquid can be left: a soaked system's coldest part is within a few
// kelvin of the soak temperature (common practice; the physics core's STATIC_SOAK_SPREAD_K, the same line
// the interview's empty-system test draws). Below −5 °C a static reading says too little (judgement).
export const STATIC_CHECK = {
  normalUpToK: 2,
  highAboveK: 4,
  veryHighAboveK: 7,
  noLiquidBelowK: STATIC_SOAK_SPREAD_K,
  minReferenceC: -5,
} as const;
// A soak of an hour or more with the parts' temperature measured counts in full; a shorter or unmeasured
// soak counts for half (from memory: an engine bay takes about an hour to settle in a shop).
export const STATIC_SOAK = { minMinutes: 60, weakFactor: 0.5 } as const;

// The "do not run" state (do-not-run.ts): a mass charged back counts as a recharge from half the label up
// (judgement: a partial charge for a leak test is not a recharge); an electric compressor waits for a static
// reading within 2 K of saturation, the gauge and thermometer tolerance above (from memory).
export const DO_NOT_RUN = { rechargedFromFractionOfLabel: 0.5, electricStaticBelowK: 2 } as const;

// Cycling-clutch switch points as evaporating temperature, °C: opens near 22–25 psig and closes near
// 45–47 psig R-134a, −4…−2 °C and 9.5…11 °C (common practice; R-1234yf at the same evaporator temperatures).
// A reading more than 3 K outside is a switch or sensor fault (from memory). A clutch that never cycles
// points to icing only up to 30 °C ambient (from memory: above it the load keeps the clutch in). On a cycling
// clutch a single low-side reading is a point in the swing and counts for half (judgement).
export const CYCLING = {
  cutOutC: { min: -4, max: -2 },
  cutInC: { min: 9.5, max: 11 },
  marginK: 3,
  mildAmbientMaxC: 30,
  snapshotStrength: 0.5,
  /** a variable-displacement compressor cycles its clutch only for protection: rapid cycling counts half */
  variableRapidCyclingStrength: 0.5,
} as const;

// Next check: stop testing and confirm once the leader holds 80 % of the likelihood; leaders within a
// likelihood ratio of 3 (ln 3 ≈ 1.0986) are "close"; a check expected to tell less than 0.01 nats is not
// worth doing (judgement, all three). Written as a decimal, not Math.log(3): the last bit of Math.log differs
// between JavaScript engines (Node and Chromium), and that would give the browser another engine version.
export const NEXT_CHECK = {
  leaderClearShare: 0.8,
  closePairLogOdds: 1.0986,
  minUsefulGainNats: 0.01,
} as const;
// Repair cautions and repair steps follow the leader, or a cause holding at least this share (judgement).
export const REAL_SHARE = 0.2;

// SAE J2099 / J2912: below 98 % the refrigerant is not "pure" and must not be recycled (the identifier's
// one pass mark, lib/service/identifier.ts).
export { PURITY_PASS_PCT };
// Identifier air (NCG) grading, weight % (from memory).
export const AIR_PCT = { some: 1, high: 3 } as const;
// Charge deviation: the service record's own table (lib/service/charge.ts), so both say the same about one
// weighing; the machine's charge accuracy per refrigerant is part of it.
export const CHARGE = {
  limits: CHARGE_DEVIATION_LIMITS,
  accuracyG: Object.fromEntries(REFRIGERANT_IDS.map((id) => [id, chargeToleranceG(id)])),
} as const;
// Centre vent, °C. 3–8 °C is expected in mild weather (common practice); the target rises with the
// evaporator's load, humid air's latent load included, which the inlet air's wet-bulb temperature tracks
// (psychrometrics: ASHRAE Handbook—Fundamentals ch. 1; the coil's load follows the air's enthalpy, a
// refrigeration textbook): 0.4 K per K of wet bulb above 15 °C, about 21 °C at 50 % (from memory). Humidity
// unknown counts as 50 %. Warm is 7 K past the cold limit (from memory); below 2 °C the coil can freeze.
export const VENT_C = {
  freezing: 2,
  coldBaseC: 8,
  wetBulbRefC: 15,
  riseKPerKWetBulb: 0.4,
  warmAboveColdK: 7,
  unknownHumidityPct: 50,
} as const;

export const GRADING = {
  HIGH_SIDE_FAR_K,
  LOW_SIDE_FAR_BELOW_K,
  LIFT_CLOSE_MARGIN_K,
  FALLBACK_CONDENSING_OVER_AMBIENT_K,
  FALLBACK_EVAPORATING_C,
  SUBCOOLING_K,
  SUPERHEAT_K,
  SUPERHEAT_LOAD,
  EXPECTED_BANDS: { CONDENSING_ABOVE_AMBIENT_K, EVAPORATING_C, EVAPORATING_RISE, HUMIDITY_SHIFT_MAX_K },
  STATIC_EMPTY: NEARLY_EMPTY_STATIC,
  STATIC_CHECK,
  STATIC_SOAK,
  DO_NOT_RUN,
  CYCLING,
  NEXT_CHECK,
  REAL_SHARE,
  PURITY_PASS_PCT,
  AIR_PCT,
  CHARGE,
  VENT_C,
} as const;
