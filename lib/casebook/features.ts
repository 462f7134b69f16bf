import type { CaseFeatureValues } from "@/lib/contracts/casebook";
import { runningPhysics, type RunningPhysics, type RunningReadings } from "@/lib/refrigerants/readings";

export const FEATURE_KEYS = [
  "condensingC",
  "evaporatingC",
  "subcoolingK",
  "superheatK",
  "approachK",
  "ambientC",
  "chargeDeviationPct",
] as const;
export type FeatureKey = (typeof FEATURE_KEYS)[number];

/** Column of case_features that holds each reading. */
export const FEATURE_COLUMNS: Record<FeatureKey, string> = {
  condensingC: "condensing_c",
  evaporatingC: "evaporating_c",
  subcoolingK: "subcooling_k",
  superheatK: "superheat_k",
  approachK: "approach_k",
  ambientC: "ambient_c",
  chargeDeviationPct: "charge_deviation_pct",
};

/**
 * How far apart two cases must be on one reading to count as one step of distance: roughly the spread
 * of that reading between systems with the same fault (from memory; our choice, not a published figure).
 * Dividing by it lets a kelvin of subcooling and a percent of charge be added up.
 */
export const FEATURE_SCALES: Record<FeatureKey, number> = {
  condensingC: 6,
  evaporatingC: 4,
  subcoolingK: 4,
  superheatK: 6,
  approachK: 6,
  ambientC: 8,
  chargeDeviationPct: 15,
};

/** A neighbour that lacks a reading the case has counts as this many steps apart on it. */
export const MISSING_FEATURE_PENALTY = 1;

/** The pre-filter keeps neighbours within this many steps on condensing and evaporating temperature. */
export const BOUNDING_STEPS = 3;

const finite = (v: unknown): number | null => (typeof v === "number" && Number.isFinite(v) ? v : null);
const round = (v: number | null, decimals = 2) =>
  v === null ? null : Math.round(v * 10 ** decimals) / 10 ** decimals;

/**
 * The readings a case is compared on, from its stored findings snapshot: the engine's computed values
 * (findings.computed: saturation temperatures, subcooling, superheat, approach, charge deviation) and the
 * ambient it was given (findings.input).
 */
export function caseFeaturesFrom(findings: unknown): CaseFeatureValues {
  const snapshot = (findings ?? {}) as {
    computed?: Record<string, unknown>;
    input?: Record<string, unknown>;
  };
  const c = snapshot.computed ?? {};
  const input = snapshot.input ?? {};
  // A transcritical R-744 high side has no condensing temperature; the engine leaves it out.
  return {
    condensingC: round(finite(c.condensingC)),
    evaporatingC: round(finite(c.evaporatingC)),
    subcoolingK: round(finite(c.subcoolingK)),
    superheatK: round(finite(c.superheatK)),
    approachK: round(finite(c.condensingApproachK)),
    ambientC: round(finite(input.ambientC)),
    chargeDeviationPct: round(finite(c.chargeDeltaPct), 1),
  };
}

/**
 * The readings of a case not yet submitted (no findings snapshot), from its running readings through the
 * same physics the interview's readouts and the engine use. No charge deviation: that needs the charge audit
 * the engine does at submit. Readings off the tables, or an altitude outside the standard atmosphere, give
 * nothing rather than an error.
 */
export function draftFeaturesFrom(readings: RunningReadings | null): CaseFeatureValues {
  const none = caseFeaturesFrom(null);
  if (!readings) return none;
  let physics: RunningPhysics;
  try {
    physics = runningPhysics(readings);
  } catch (error) {
    if (error instanceof RangeError) return none;
    throw error;
  }
  return caseFeaturesFrom({ computed: physics, input: { ambientC: readings.ambientC } });
}

export function presentFeatures(features: CaseFeatureValues): FeatureKey[] {
  return FEATURE_KEYS.filter((key) => features[key] !== null);
}

/**
 * The distance the SQL computes, for tests and for explaining a result: root mean square over the case's
 * present readings of (difference / scale), a missing neighbour reading counting as the penalty.
 */
export function featureDistance(from: CaseFeatureValues, to: CaseFeatureValues): number {
  const keys = presentFeatures(from);
  if (keys.length === 0) return Number.POSITIVE_INFINITY;
  let sum = 0;
  for (const key of keys) {
    const a = from[key] as number;
    const b = to[key];
    sum += b === null ? MISSING_FEATURE_PENALTY ** 2 : ((a - b) / FEATURE_SCALES[key]) ** 2;
  }
  return Math.sqrt(sum / keys.length);
}
