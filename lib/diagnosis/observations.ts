import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";
import type { SymptomId } from "./symptoms";

/**
 * Graded observations. A reading group yields at most one grade per case; the
 * order of each grade list runs from low to high so tables read naturally.
 */
export const READING_GRADES = {
  high_side: ["very_low", "low", "normal", "high", "very_high"],
  low_side: ["vacuum", "very_low", "low", "normal", "high"],
  lift: ["close", "normal"],
  subcooling: ["none", "low", "normal", "high", "very_high"],
  superheat: ["near_zero", "normal", "high", "very_high"],
  static: ["empty", "no_liquid", "normal", "slightly_high", "high", "very_high"],
  charge: ["empty", "very_low", "low", "slightly_low", "ok", "high", "very_high"],
  purity: ["fail", "pass"],
  air: ["none", "some", "high"],
  vent: ["freezing", "cold", "cool", "warm"],
  device: EXPANSION_DEVICE_IDS,
  cycling: ["opens_late", "normal", "opens_early", "closes_late"],
  /** Combinations of readings the physics allows only for some causes. */
  pattern: ["compressor_not_pumping"],
} as const;

export type ReadingGroup = keyof typeof READING_GRADES;
export type ReadingObservationId = {
  [G in ReadingGroup]: `${G}:${(typeof READING_GRADES)[G][number]}`;
}[ReadingGroup];
export type ObservationId = ReadingObservationId | `symptom:${SymptomId}`;

/** The key readings: the statement of what was measured counts these. */
export const KEY_READING_GROUPS: readonly ReadingGroup[] = [
  "high_side",
  "low_side",
  "subcooling",
  "superheat",
  "static",
  "charge",
  "purity",
  "air",
  "vent",
];

export function groupOf(observation: ObservationId): string {
  return observation.slice(0, observation.indexOf(":"));
}

export function readingObservation<G extends ReadingGroup>(
  group: G,
  grade: (typeof READING_GRADES)[G][number],
): ReadingObservationId {
  return `${group}:${grade}` as ReadingObservationId;
}
